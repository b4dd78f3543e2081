import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { useStickerline } from './harness';
import { journey } from './journey';

const stickerline = useStickerline();

/** Collects everything the page reports as an error: console errors (failed loads included) and uncaught exceptions. */
function errorsOf(page: Page) {
  const errors: string[] = [];
  page.on('console', (m) => { if (m.type() === 'error') errors.push(`${page.url()}: ${m.text()}`); });
  page.on('pageerror', (e) => errors.push(`${page.url()}: ${e.message}`));
  return errors;
}

describe('a visitor who is not signed in', () => {
  it('loads every public page without a single console error', async () => {
    const { page, context } = await stickerline().newPage();
    const errors = errorsOf(page);
    await journey(page, 'signed-out-no-console-errors', async () => {
      await page.goto('/');
      const firstSlab = page.locator('main a[href^="/slabs/"]').first();
      await firstSlab.waitFor();
      const slabHref = await firstSlab.getAttribute('href');
      for (const path of ['/', slabHref!, '/sign-in', '/sign-up', '/forgot-password']) {
        await page.goto(path);
        await page.locator('main h1').first().waitFor();
        await page.waitForLoadState('networkidle');
      }
    });
    expect(errors).toEqual([]);
    await context.close();
  });

  it('sees a reference to quote on an error page', async () => {
    const { page, context } = await stickerline().newPage();
    await journey(page, 'error-page-reference', async () => {
      await page.goto('/slabs/99999999');
      await page.getByRole('heading', { level: 1, name: 'Not found' }).waitFor();
      const note = page.getByText(/quote reference/);
      await note.waitFor();
      expect(await note.textContent()).toMatch(/[0-9A-Z]{4}-[0-9A-Z]{4}-[0-9A-Z]{4}/);
    });
    await context.close();
  });
});
