import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { useStickerline } from './harness';
import { journey, skippedStep } from './journey';
import { describeViolations, seriousViolations } from './axe';
import { browseToSlab } from './steps/browse';
import { reserveOpenSlab } from './steps/buying';
import { demoAccount, newBuyer, screenExists, signInQuietly } from './steps/session';

const stickerline = useStickerline();
// The app's content security policy forbids inline scripts; axe is injected as one, so these
// scan-only pages let the test's own script through. Nothing else about the page changes.
const AXE_PAGE = { bypassCSP: true };

// A guard page instead of the screen means the sign-in behind the scan did not work.
const GUARD_HEADINGS = ['Sign in', 'Please sign in', 'Not for this account', 'Something went wrong'];

/** Scans the page at `path` once its main heading shows; returns a report line, empty when clean. */
async function scan(page: Page, path: string, { guarded = false } = {}): Promise<string> {
  if (!(await screenExists(page, path))) {
    skippedStep('accessibility', `${path} has no screen yet`);
    return '';
  }
  const heading = (await page.locator('main h1').first().textContent())?.trim() ?? '';
  if (guarded && GUARD_HEADINGS.includes(heading)) return `${path}: shows "${heading}" instead of the screen`;
  await page.waitForLoadState('networkidle');
  return describeViolations(path, await seriousViolations(page));
}

describe('accessibility of the main pages (axe-core, serious and critical only)', () => {
  it('the catalogue, a slab page and the sign-in page have no serious problems', async () => {
    const { page, context } = await stickerline().newPage(AXE_PAGE);
    const reports: string[] = [];
    await journey(page, 'accessibility-public', async () => {
      reports.push(await scan(page, '/'));
      const firstSlab = page.getByRole('list', { name: 'Slabs' }).getByRole('link').first();
      const href = await firstSlab.getAttribute('href');
      expect(href).toMatch(/^\/slabs\/\d+$/);
      reports.push(await scan(page, href!));
      reports.push(await scan(page, '/sign-in'));
      reports.push(await scan(page, '/sign-up'));
      reports.push(await scan(page, '/forgot-password'));
    });
    await context.close();
    expect(reports.filter(Boolean).join('\n\n')).toBe('');
  });

  it('a buyer\'s holds, checkout, orders and account pages have no serious problems', async () => {
    const app = stickerline();
    const { page, context } = await app.newPage(AXE_PAGE);
    const buyer = newBuyer('Tamsin');
    const signUp = await context.request.post(`${app.url}/api/auth/sign-up/email`, { headers: { Origin: app.url }, data: buyer });
    expect(signUp.ok()).toBe(true);
    const reports: string[] = [];
    await journey(page, 'accessibility-buyer', async () => {
      // A held slab, so the holds and checkout pages show their full forms rather than an empty notice.
      const slab = await browseToSlab(page, { species: 'Red maple', minThicknessIn: '1', forSale: true });
      await reserveOpenSlab(page, slab.code);
      for (const path of ['/reservations', '/checkout', '/orders', '/account']) reports.push(await scan(page, path, { guarded: true }));
    });
    await context.close();
    expect(reports.filter(Boolean).join('\n\n')).toBe('');
  });

  it('the yard desk pages a seller uses have no serious problems', async () => {
    const app = stickerline();
    const { page, context } = await app.newPage(AXE_PAGE);
    await signInQuietly(context, app.url, demoAccount('seller'));
    const reports: string[] = [];
    await journey(page, 'accessibility-yard', async () => {
      for (const path of ['/yard', '/yard/logs', '/yard/logs/new', '/yard/slabs/new', '/yard/readings']) reports.push(await scan(page, path, { guarded: true }));
      // One slab's own record, photo and moisture pages, reached from the yard's slab list.
      await page.goto('/yard');
      const record = page.getByRole('main').getByRole('link', { name: /^L-\d{4}-\d{2}-\d{2}$/ }).first();
      const href = await record.getAttribute('href');
      expect(href).toMatch(/^\/yard\/slabs\/\d+$/);
      for (const path of [href!, `${href}/photos`, `${href}/readings`]) reports.push(await scan(page, path, { guarded: true }));
    });
    await context.close();
    expect(reports.filter(Boolean).join('\n\n')).toBe('');
  });

  it('the office pages an admin uses have no serious problems', async () => {
    const app = stickerline();
    const { page, context } = await app.newPage(AXE_PAGE);
    await signInQuietly(context, app.url, demoAccount('admin'));
    const reports: string[] = [];
    await journey(page, 'accessibility-office', async () => {
      for (const path of ['/office', '/office/pickups', '/office/orders', '/office/holds', '/office/users', '/office/audit', '/office/settings', '/office/rules']) {
        reports.push(await scan(page, path, { guarded: true }));
      }
    });
    await context.close();
    expect(reports.filter(Boolean).join('\n\n')).toBe('');
  });
});
