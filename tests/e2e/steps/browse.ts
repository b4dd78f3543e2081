import { expect } from 'vitest';
import type { Page } from 'playwright-core';
import { parseInches } from '../../../shared/wood/index';

export type OpenedSlab = { code: string; url: string; id: number };

/**
 * From the catalogue: choose a species and a minimum thickness the way a buyer would, check every
 * card left matches, then open the first slab (the first one for sale, if asked). Returns the
 * slab's code and address.
 */
export async function browseToSlab(page: Page, filter: { species: string; minThicknessIn: string; forSale?: boolean }): Promise<OpenedSlab> {
  await page.goto('/');
  const slabs = page.getByRole('list', { name: 'Slabs' });
  await slabs.getByRole('listitem').first().waitFor();

  const filters = page.getByRole('search', { name: 'Filter slabs' });
  // On a phone the filters sit behind a disclosure; open it when it is the visible one.
  const disclosure = page.getByText(/^Filters and sort/);
  if (await disclosure.isVisible()) await disclosure.click();
  await filters.getByRole('combobox', { name: 'Species' }).selectOption({ label: filter.species });
  await page.waitForURL(/species=/);
  const thickness = filters.getByRole('textbox', { name: 'Thickness from (in)' });
  await thickness.fill(filter.minThicknessIn);
  await thickness.press('Enter');
  await page.waitForURL(/minThicknessIn=/);

  const cards = slabs.getByRole('listitem');
  await expect.poll(async () => {
    const texts = await cards.allTextContents();
    return texts.length > 0 && texts.every((t) => t.includes(filter.species));
  }, { timeout: 10_000 }).toBe(true);
  // Every card's stated thickness honours the filter (the card labels its measures in inches).
  const labels = await slabs.locator('[aria-label^="thickness "]').evaluateAll((els) => els.map((e) => e.getAttribute('aria-label') ?? ''));
  for (const label of labels) expect(Number(/thickness ([\d.]+) inches/.exec(label)?.[1])).toBeGreaterThanOrEqual(parseInches(filter.minThicknessIn, { thickness: true }));

  // A buyer about to reserve skips cards already on hold for someone else.
  const card = filter.forSale ? cards.filter({ has: page.getByText('For sale', { exact: true }) }).first() : cards.first();
  const code = (await card.textContent())?.match(/L-\d{4}-\d{2}-\d{2}/)?.[0] ?? '';
  await card.getByRole('link').click();
  await page.waitForURL(/\/slabs\/\d+/);
  await page.getByRole('heading', { level: 1, name: new RegExp(`${filter.species} slab`, 'i') }).waitFor();
  await expect.poll(() => page.getByText(`Slab ${code}`).count()).toBeGreaterThan(0);
  const id = Number(/\/slabs\/(\d+)/.exec(page.url())?.[1]);
  return { code, url: page.url(), id };
}
