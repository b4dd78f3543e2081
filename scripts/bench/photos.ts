import sharp from 'sharp';
import { renderPhoto } from '../../server/modules/photos/photo-image';

/** A 12-megapixel JPEG (4240 × 2832) with real detail, so the encoder has work to do. */
async function twelveMegapixelJpeg() {
  const width = 4240;
  const height = 2832;
  const raw = Buffer.alloc(width * height * 3);
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      const i = (y * width + x) * 3;
      const grain = Math.sin(x / 7 + Math.sin(y / 40) * 6) * 40;
      raw[i] = 120 + grain + ((x * y) % 13);
      raw[i + 1] = 80 + grain / 2;
      raw[i + 2] = 50 + ((x + y) % 17);
    }
  }
  return sharp(raw, { raw: { width, height, channels: 3 } }).jpeg({ quality: 90 }).toBuffer();
}

/** Images per second through the photos module's own pipeline (display + thumbnail). */
export async function benchPhotos(count = 6) {
  const jpeg = await twelveMegapixelJpeg();
  await renderPhoto(jpeg, 'warm-up.jpg');
  const t0 = performance.now();
  for (let i = 0; i < count; i++) await renderPhoto(jpeg, `bench-${i}.jpg`);
  const seconds = (performance.now() - t0) / 1000;
  return { imagesPerSecond: count / seconds, msPerImage: (seconds * 1000) / count, inputMb: jpeg.length / 1024 / 1024 };
}
