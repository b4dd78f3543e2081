import { describe, expect, it } from 'vitest';
import type { APIRequestContext } from 'playwright-core';
import { useStickerline } from './harness';
import { journey } from './journey';
import { describeViolations, seriousViolations } from './axe';
import { mailText, waitForMail } from './mail-catcher';
import { newBuyer, signUpThroughForm } from './steps/session';
import { COMPARE_FULL_MESSAGE } from '../../shared/buyer-lists';

const stickerline = useStickerline();

/** Slabs for sale of one species, straight from the public catalogue API (the journeys then use the screens). */
async function slabsForSale(request: APIRequestContext, species: string, count: number) {
  const res = await request.get(`/api/slabs?species=${species}&availability=available&pageSize=50&sort=price-desc`);
  const items = ((await res.json()).items as { id: number; code: string; status: string }[]).filter((s) => s.status === 'listed');
  expect(items.length).toBeGreaterThanOrEqual(count);
  return items.slice(0, count);
}

describe('a buyer weighing up slabs', () => {
  it('compares four slabs side by side; a fifth is refused with a plain message', async () => {
    const { page, context } = await stickerline().newPage({ bypassCSP: true });
    await journey(page, 'compare-four', async () => {
      const five = await slabsForSale(context.request, 'northern-red-oak', 5);
      for (const s of five.slice(0, 4)) {
        await page.goto(`/slabs/${s.id}`);
        await page.getByText(`Slab ${s.code}`).waitFor();
        await page.getByRole('button', { name: 'Add to compare' }).click();
        await page.getByRole('button', { name: 'Take off compare list' }).waitFor();
      }
      await page.goto(`/slabs/${five[4].id}`);
      await page.getByRole('button', { name: 'Add to compare' }).click();
      await page.getByRole('alert').filter({ hasText: COMPARE_FULL_MESSAGE }).waitFor();

      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Compare (4)' }).click();
      await page.getByRole('heading', { level: 1, name: 'Compare slabs' }).waitFor();
      const table = page.getByRole('table', { name: 'Slabs side by side' });
      await table.waitFor();
      const columns = table.getByRole('columnheader');
      await expect.poll(() => columns.count()).toBe(4);
      for (const s of five.slice(0, 4)) expect(await columns.filter({ hasText: s.code }).count()).toBe(1);
      for (const row of ['Price', 'Board feet', 'Weight (estimate)', 'Moisture content']) await table.getByRole('rowheader', { name: row, exact: true }).waitFor();
      expect(describeViolations('/compare', await seriousViolations(page))).toBe('');

      // Taking one off makes room for the fifth.
      await table.getByRole('button', { name: `Take off the compare list: slab ${five[0].code}` }).click();
      await expect.poll(() => columns.count()).toBe(3);
      await page.goto(`/slabs/${five[4].id}`);
      await page.getByRole('button', { name: 'Add to compare' }).click();
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Compare (4)' }).waitFor();
    });
    await context.close();
  });

  it('saves a slab for later, finds it on the saved list, and removes it', async () => {
    const { page, context } = await stickerline().newPage({ bypassCSP: true });
    await journey(page, 'saved-slabs', async () => {
      const [slab] = await slabsForSale(context.request, 'douglas-fir', 1);
      await page.goto(`/sign-up?next=${encodeURIComponent(`/slabs/${slab.id}`)}`);
      await signUpThroughForm(page, newBuyer('Idris'));
      await page.getByText(`Slab ${slab.code}`).waitFor();
      await page.getByRole('button', { name: '☆ Save for later' }).click();
      await page.getByRole('button', { name: '★ Saved', pressed: true }).waitFor();

      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Saved' }).click();
      await page.getByRole('heading', { level: 1, name: 'Saved slabs' }).waitFor();
      const list = page.getByRole('list', { name: 'Saved slabs' });
      await list.getByRole('link', { name: new RegExp(`slab ${slab.code}$`) }).waitFor();
      expect(describeViolations('/saved', await seriousViolations(page))).toBe('');
      await list.getByRole('button', { name: `Remove slab ${slab.code} from saved slabs` }).click();
      await page.getByText('You have not saved any slabs yet.').waitFor();
    });
    await context.close();
  });

  it('asks to hear when a held slab comes free, and gets the e-mail when the holder lets it go', async () => {
    const app = stickerline();
    const holder = await app.newPage();
    const watcher = await app.newPage({ bypassCSP: true });
    const waiting = newBuyer('Juno');
    await journey(watcher.page, 'notify-when-free', async () => {
      const [, slab] = await slabsForSale(holder.context.request, 'douglas-fir', 2);
      // The first buyer holds it.
      await holder.page.goto(`/sign-up?next=${encodeURIComponent(`/slabs/${slab.id}`)}`);
      await signUpThroughForm(holder.page, newBuyer('Hollis'));
      await holder.page.getByRole('button', { name: 'Reserve this slab' }).click();
      await holder.page.getByRole('status').filter({ hasText: `Slab ${slab.code} is held for you.` }).waitFor();

      // The second buyer finds it on hold and asks to be told.
      await watcher.page.goto(`/sign-up?next=${encodeURIComponent(`/slabs/${slab.id}`)}`);
      await signUpThroughForm(watcher.page, waiting);
      await watcher.page.getByText('Someone is holding this slab.').waitFor();
      expect(describeViolations(`/slabs/${slab.id} (held)`, await seriousViolations(watcher.page))).toBe('');
      await watcher.page.getByRole('button', { name: 'E-mail me if it comes free' }).click();
      await watcher.page.getByRole('status').filter({ hasText: `We will e-mail you once if slab ${slab.code} comes free.` }).waitFor();

      // The holder changes their mind.
      await holder.page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'My holds' }).click();
      await holder.page.getByRole('button', { name: `Release slab ${slab.code}` }).click();
      await holder.page.getByText('Nothing on hold.').waitFor();

      const mail = await waitForMail(app.mailWebPort, waiting.email, (m) => m.subject === `Slab ${slab.code} is for sale again`);
      expect(mailText(mail)).toContain(`/slabs/${slab.id}`);
      // The link in the e-mail leads to a slab that can be reserved now.
      await watcher.page.goto(new URL(/http:\/\/\S+\/slabs\/\d+/.exec(mailText(mail))![0]).pathname);
      await watcher.page.getByRole('button', { name: 'Reserve this slab' }).waitFor();
    });
    await holder.context.close();
    await watcher.context.close();
  });
});
