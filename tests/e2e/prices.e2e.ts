import { describe, expect, it } from 'vitest';
import { useStickerline } from './harness';
import { journey } from './journey';
import { demoAccount, signInThroughForm } from './steps/session';
import { browseToSlab } from './steps/browse';
import { centsFrom } from './steps/buying';

const stickerline = useStickerline();

describe('an admin setting the mill\'s prices', () => {
  it('raises the sycamore rate per board foot, is told how many slabs were repriced, and the slab page shows the new price', async () => {
    const { page, context } = await stickerline().newPage();
    await journey(page, 'admin-sets-prices', async () => {
      await signInThroughForm(page, demoAccount('admin'));
      const slab = await browseToSlab(page, { species: 'American sycamore', minThicknessIn: '1' });

      await page.goto('/office/rules');
      await page.getByLabel('American sycamore').fill('7.25');
      await page.getByRole('button', { name: 'Save prices and rules' }).click();
      await expect.poll(() => page.getByRole('status').filter({ hasText: /repriced/ }).count()).toBe(1);

      await page.goto(slab.url);
      const baseLine = (await page.getByRole('row').filter({ hasText: /bd ft ×/ }).textContent()) ?? '';
      expect(baseLine).toContain('$7.25/bd ft');
      // The base line is board feet (T × W × L ÷ 144, the board-foot definition) × the new rate.
      const bf = Number(/([\d.]+) bd ft ×/.exec(baseLine)?.[1]);
      expect(centsFrom(baseLine.split('/bd ft')[1])).toBe(Math.round(bf * 725));
      expect(bf).toBeGreaterThan(0);
    });
    await context.close();
  });
});
