/**
 * Renders a slab illustration to the two WebP renditions the photo store
 * serves (display and thumbnail). Used when a slab has no photograph yet.
 */
import sharp from 'sharp';
import { DISPLAY_HEIGHT, DISPLAY_WIDTH, slabIllustrationSvg, type IllustrationInput } from './illustration-svg';

export type { IllustrationInput } from './illustration-svg';

export const THUMB_WIDTH = 400;

export type RenderedIllustration = { display: Buffer; thumb: Buffer; width: number; height: number };

export async function renderSlabIllustration(input: IllustrationInput): Promise<RenderedIllustration> {
  const svg = Buffer.from(slabIllustrationSvg(input));
  // Rasterise once, then encode both sizes from the same pixels; the fastest WebP effort keeps first start quick.
  const { data, info } = await sharp(svg).removeAlpha().raw().toBuffer({ resolveWithObject: true });
  const raw = { raw: { width: info.width, height: info.height, channels: info.channels } } as const;
  const [display, thumb] = await Promise.all([
    sharp(data, raw).webp({ quality: 80, effort: 0 }).toBuffer(),
    sharp(data, raw).resize({ width: THUMB_WIDTH }).webp({ quality: 76, effort: 0 }).toBuffer(),
  ]);
  return { display, thumb, width: DISPLAY_WIDTH, height: DISPLAY_HEIGHT };
}
