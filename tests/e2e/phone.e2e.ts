import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { useStickerline } from './harness';
import { journey } from './journey';
import { browseToSlab } from './steps/browse';

const stickerline = useStickerline();

/** Wider content than the screen means a sideways scroll: the page must fit 390 px. */
const overflow = (page: Page) => page.evaluate(() => ({
  scrollWidth: document.documentElement.scrollWidth, innerWidth: window.innerWidth,
}));

describe('a buyer on a phone in the yard (390 × 844)', () => {
  it('reaches the filters, opens a slab, and never has to scroll sideways', async () => {
    const { page, context } = await stickerline().newPage({ width: 390, height: 844 });
    await journey(page, 'phone-width', async () => {
      await page.goto('/');
      await page.getByRole('list', { name: 'Slabs' }).getByRole('listitem').first().waitFor();
      const catalogue = await overflow(page);
      expect(catalogue.scrollWidth, 'catalogue is wider than the phone').toBeLessThanOrEqual(catalogue.innerWidth);

      // The same filter-and-open path a desktop buyer takes, through the phone's filter disclosure.
      const slab = await browseToSlab(page, { species: 'White oak', minThicknessIn: '1.5' });
      expect(slab.id).toBeGreaterThan(0);
      await page.getByRole('heading', { name: 'Measurements' }).scrollIntoViewIfNeeded();
      const slabPage = await overflow(page);
      expect(slabPage.scrollWidth, 'slab page is wider than the phone').toBeLessThanOrEqual(slabPage.innerWidth);

      // The main navigation stays within reach at phone width.
      await expect.poll(() => page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Slabs' }).isVisible()).toBe(true);
    });
    await context.close();
  });
});
