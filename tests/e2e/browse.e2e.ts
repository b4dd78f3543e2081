import { describe, expect, it } from 'vitest';
import { useStickerline } from './harness';
import { journey } from './journey';
import { browseToSlab } from './steps/browse';
import { runFitCheck } from './steps/fit-check';

const stickerline = useStickerline();

describe('a visitor browsing the yard', () => {
  it('filters by species and thickness, opens a slab and runs the fit check for their shop', async () => {
    const { page, context } = await stickerline().newPage();
    await journey(page, 'browse-and-fit-check', async () => {
      const slab = await browseToSlab(page, { species: 'Black walnut', minThicknessIn: '2' });
      expect(slab.code).toMatch(/^L-\d{4}-\d{2}-\d{2}$/);
      await runFitCheck(page, 'browse');
    });
    await context.close();
  });
});
