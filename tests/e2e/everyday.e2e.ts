import { describe, expect, it } from 'vitest';
import { useStickerline } from './harness';
import { journey } from './journey';
import { newBuyer, signInThroughForm, signUpThroughForm } from './steps/session';

const stickerline = useStickerline();

/** Every card's thickness in inches, read from the card's spoken label. */
const cardThicknesses = (page: import('playwright-core').Page) =>
  page.getByRole('list', { name: 'Slabs' }).locator('[aria-label^="thickness "]')
    .evaluateAll((els) => els.map((e) => Number(/thickness ([\d.]+) inches/.exec(e.getAttribute('aria-label') ?? '')?.[1])));

describe('everyday use of the shop', () => {
  it('a visitor filters the catalogue with fractions and quarter sizes, and a muddled range is named at its box', async () => {
    const { page, context } = await stickerline().newPage();
    await journey(page, 'catalogue-fractions', async () => {
      await page.goto('/?availability=all');
      const filters = page.getByRole('search', { name: 'Filter slabs' });
      await page.getByRole('list', { name: 'Slabs' }).getByRole('listitem').first().waitFor();

      const from = filters.getByRole('textbox', { name: 'Thickness from (in)' });
      const to = filters.getByRole('textbox', { name: 'Thickness to (in)' });
      await from.fill('1 1/2');
      await from.press('Enter');
      await page.waitForURL(/minThicknessIn=1\.5/);
      await to.fill('8/4');
      await to.press('Enter');
      await page.waitForURL(/maxThicknessIn=2(&|$)/);
      await expect.poll(async () => {
        const t = await cardThicknesses(page);
        return t.length > 0 && t.every((x) => x >= 1.5 && x <= 2);
      }, { timeout: 10_000 }).toBe(true);
      // The boxes show the sizes back in the shop's fractions.
      expect(await filters.getByRole('textbox', { name: 'Thickness to (in)' }).inputValue()).toBe('2');

      // "From" above "to": the message names the filter and sits at the box.
      const from2 = filters.getByRole('textbox', { name: 'Thickness from (in)' });
      await from2.fill('2 1/4');
      await from2.press('Enter');
      await page.waitForURL(/minThicknessIn=2\.25/);
      const toBox = filters.getByRole('textbox', { name: 'Thickness to (in)' });
      await expect.poll(() => toBox.getAttribute('aria-invalid')).toBe('true');
      const describedBy = (await toBox.getAttribute('aria-describedby')) ?? '';
      const message = await page.locator(`[id="${describedBy.split(' ').find((d) => d.endsWith('-error'))}"]`).textContent();
      expect(message).toBe('Thickness from is more than thickness to');

      // A size that cannot be read stays in its box with the reason; the address keeps the last good value.
      const width = filters.getByRole('textbox', { name: 'Width at least (in)' });
      await width.fill('1/2/');
      await width.press('Enter');
      await filters.getByText('Width at least: "1/2/" is not a size we can read').waitFor();
      expect(page.url()).not.toContain('minWidthIn');
      expect(await width.inputValue()).toBe('1/2/');
      await width.fill('20 ¼');
      await width.press('Enter');
      await page.waitForURL(/minWidthIn=20\.25/);
    });
    await context.close();
  });

  it('a visitor flips the units to metric and the choice stays; a signed-in buyer keeps theirs on the account', async () => {
    const { page, context } = await stickerline().newPage();
    await journey(page, 'units-switch', async () => {
      await page.goto('/');
      const cards = page.getByRole('list', { name: 'Slabs' }).getByRole('listitem');
      await cards.first().waitFor();
      expect(await cards.first().textContent()).toMatch(/\d in/);
      const units = page.getByRole('group', { name: 'Units' });
      await units.getByRole('button', { name: 'Millimetres and kilograms' }).click();
      await expect.poll(() => cards.first().textContent()).toMatch(/\d+ mm × \d+ mm × \d+ cm/);
      expect(await cards.first().textContent()).toMatch(/bd ft \(\d+\.\d+ m³\)/);
      expect(await units.getByRole('button', { name: 'Millimetres and kilograms' }).getAttribute('aria-pressed')).toBe('true');

      // A slab page follows: sizes in millimetres, the weight in kilograms.
      await cards.first().getByRole('link').click();
      await page.waitForURL(/\/slabs\/\d+/);
      await page.getByRole('row', { name: /^Thickness/ }).waitFor();
      expect(await page.getByRole('row', { name: /^Thickness/ }).textContent()).toMatch(/\d+ mm/);
      await page.getByText(/^Heavy: about \d+(\.\d)? kg$/).waitFor();

      // Still metric after a reload (kept in this browser).
      await page.reload();
      await page.getByRole('row', { name: /^Thickness/ }).waitFor();
      expect(await page.getByRole('row', { name: /^Thickness/ }).textContent()).toMatch(/\d+ mm/);

      // A new buyer chooses metric while signed in; a different browser shows metric once they sign in there.
      const buyer = newBuyer('Tamsin');
      await page.goto('/sign-up');
      await signUpThroughForm(page, buyer);
      await page.getByRole('group', { name: 'Units' }).getByRole('button', { name: 'Inches and pounds' }).click();
      await page.getByRole('group', { name: 'Units' }).getByRole('button', { name: 'Millimetres and kilograms' }).click();
      await expect.poll(async () => (await page.request.get('/api/me/preferences')).json()).toEqual({ units: 'metric' });

      const other = await stickerline().newPage();
      await signInThroughForm(other.page, buyer, '/');
      const otherCards = other.page.getByRole('list', { name: 'Slabs' }).getByRole('listitem');
      await otherCards.first().waitFor();
      await expect.poll(() => otherCards.first().textContent()).toMatch(/\d+ mm × /);
      await other.context.close();
    });
    await context.close();
  });
});
