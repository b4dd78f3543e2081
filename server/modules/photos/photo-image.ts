import sharp, { type Metadata } from 'sharp';
import { PHOTO_LIMITS } from '../../../shared/photos';
import { AppError } from '../../lib/errors';

export type PhotoFormat = 'jpeg' | 'png' | 'webp' | 'heic';
export type RenderedPhoto = { display: Buffer; thumb: Buffer; width: number; height: number };

const HEIC_BRANDS = new Set(['heic', 'heix', 'hevc', 'hevx', 'heim', 'heis', 'hevm', 'hevs']);
const GENERIC_HEIF_BRANDS = new Set(['mif1', 'msf1']);
/** Beyond a 100-megapixel camera: refuse rather than let a tiny file expand into gigabytes of pixels. */
const MAX_INPUT_PIXELS = 120_000_000;

const ascii = (buf: Buffer, start: number, end: number) => buf.subarray(start, end).toString('latin1');

/** The ISO-BMFF brands (major + compatible) of an `ftyp` box at the start of the file. */
function ftypBrands(buf: Buffer): string[] {
  if (buf.length < 16 || ascii(buf, 4, 8) !== 'ftyp') return [];
  const boxSize = Math.min(buf.readUInt32BE(0), buf.length, 256);
  const brands = [ascii(buf, 8, 12)];
  for (let at = 16; at + 4 <= boxSize; at += 4) brands.push(ascii(buf, at, at + 4));
  return brands;
}

/**
 * Decides the format from the file's first bytes only: the name and the browser's MIME type are
 * the sender's claims. SVG, AVIF, GIF, TIFF, PDF and everything else come back null.
 */
export function detectPhotoFormat(buf: Buffer): PhotoFormat | null {
  if (buf.length >= 3 && buf[0] === 0xff && buf[1] === 0xd8 && buf[2] === 0xff) return 'jpeg';
  if (buf.length >= 8 && buf.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]))) return 'png';
  if (buf.length >= 12 && ascii(buf, 0, 4) === 'RIFF' && ascii(buf, 8, 12) === 'WEBP') return 'webp';
  const brands = ftypBrands(buf);
  if (brands.some((b) => HEIC_BRANDS.has(b))) return 'heic';
  if (GENERIC_HEIF_BRANDS.has(brands[0] ?? '') && !brands.some((b) => b === 'avif' || b === 'avis')) return 'heic';
  return null;
}

const SHARP_FORMAT: Record<PhotoFormat, string> = { jpeg: 'jpeg', png: 'png', webp: 'webp', heic: 'heif' };

export const unsupported = (label: string) =>
  new AppError(415, 'unsupported_photo', `${label} is not a JPEG, PNG, WebP or HEIC photo, so it was not accepted.`);
const heicUnsupported = (label: string) =>
  new AppError(415, 'heic_unsupported', `${label}: HEIC photos can't be converted here yet — export it as JPEG and upload that.`);
const unreadable = (label: string) =>
  new AppError(400, 'unreadable_photo', `${label} looks damaged or incomplete and could not be read.`);

/**
 * Two WebP renditions, upright (EXIF orientation applied) and stripped of all metadata:
 * sharp writes none unless asked, so camera details and GPS positions never reach the yard's site.
 */
export async function renderPhoto(buf: Buffer, label: string): Promise<RenderedPhoto> {
  const format = detectPhotoFormat(buf);
  if (!format) throw unsupported(label);
  const failed = () => (format === 'heic' ? heicUnsupported(label) : unreadable(label));
  const input = () => sharp(buf, { limitInputPixels: MAX_INPUT_PIXELS, failOn: 'error' });
  let meta: Metadata;
  try {
    meta = await input().metadata();
  } catch {
    throw failed();
  }
  if (meta.format !== SHARP_FORMAT[format]) throw unsupported(label);
  try {
    const display = await input()
      .rotate()
      .resize({ width: PHOTO_LIMITS.displayPx, height: PHOTO_LIMITS.displayPx, fit: 'inside', withoutEnlargement: true })
      .webp({ quality: 82 })
      .toBuffer({ resolveWithObject: true });
    const thumb = await sharp(display.data)
      .resize({ width: PHOTO_LIMITS.thumbPx, height: PHOTO_LIMITS.thumbPx, fit: 'inside', withoutEnlargement: true })
      .webp({ quality: 78 })
      .toBuffer();
    return { display: display.data, thumb, width: display.info.width, height: display.info.height };
  } catch {
    throw failed();
  }
}
