import { describe, expect, it } from 'vitest';
import sharp from 'sharp';
import { detectPhotoFormat, renderPhoto } from '../../../server/modules/photos/photo-image';
import { HEIC_LIKE, SVG, TEXT, exifHasGpsIfd, phoneJpegWithGps, solid } from './photo-samples';

describe('detectPhotoFormat', () => {
  it('names JPEG, PNG, WebP and HEIC by their first bytes', async () => {
    expect(detectPhotoFormat(await solid('jpeg'))).toBe('jpeg');
    expect(detectPhotoFormat(await solid('png'))).toBe('png');
    expect(detectPhotoFormat(await solid('webp'))).toBe('webp');
    expect(detectPhotoFormat(HEIC_LIKE)).toBe('heic');
  });

  it('refuses SVG, plain text, AVIF and empty input', async () => {
    const avif = await sharp({ create: { width: 32, height: 32, channels: 3, background: '#804020' } }).avif().toBuffer();
    for (const buf of [SVG, TEXT, avif, Buffer.alloc(0)]) expect(detectPhotoFormat(buf)).toBeNull();
  });
});

describe('renderPhoto', () => {
  it('the sample really carries EXIF with a GPS block and orientation 6 (guards the test below)', async () => {
    const meta = await sharp(await phoneJpegWithGps()).metadata();
    expect(meta.orientation).toBe(6);
    expect(exifHasGpsIfd(meta.exif)).toBe(true);
  });

  it('turns the photo upright and writes WebP renditions without any EXIF, GPS or camera details', async () => {
    const out = await renderPhoto(await phoneJpegWithGps(), 'Photo 1');
    expect([out.width, out.height]).toEqual([400, 800]);
    for (const buf of [out.display, out.thumb]) {
      const meta = await sharp(buf).metadata();
      expect(meta.format).toBe('webp');
      expect(meta.exif).toBeUndefined();
      expect(meta.xmp).toBeUndefined();
      expect(buf.toString('latin1')).not.toMatch(/EXIF|Quillfield|Yardcam/);
    }
    expect((await sharp(out.thumb).metadata()).height).toBe(480);
  });

  it('shrinks large photos to 1600 px on the long side and never enlarges small ones', async () => {
    const big = await renderPhoto(await solid('png', 3200, 1200), 'Photo 1');
    expect([big.width, big.height]).toEqual([1600, 600]);
    const small = await renderPhoto(await solid('webp', 300, 200), 'Photo 1');
    expect([small.width, small.height]).toEqual([300, 200]);
  });

  it('answers 415 with a HEIC-specific message when the HEIC cannot be decoded here', async () => {
    await expect(renderPhoto(HEIC_LIKE, 'Photo 1')).rejects.toMatchObject({ status: 415, code: 'heic_unsupported', message: expect.stringMatching(/export it as JPEG/) });
  });

  it('answers 400 for a JPEG that starts right but is cut short', async () => {
    const jpeg = await solid('jpeg');
    await expect(renderPhoto(jpeg.subarray(0, 200), 'Photo 1')).rejects.toMatchObject({ status: 400, code: 'unreadable_photo' });
  });
});
