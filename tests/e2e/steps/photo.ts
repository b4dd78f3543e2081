import sharp from 'sharp';

/**
 * A small but not tiny JPEG (grainy brown noise, a few hundred kB) made on the spot, so the upload
 * takes long enough to show its progress when the network is slowed.
 */
export async function grainyJpeg(width = 900, height = 600): Promise<Buffer> {
  const pixels = Buffer.alloc(width * height * 3);
  let seed = 2417;
  for (let i = 0; i < pixels.length; i += 3) {
    seed = (seed * 1103515245 + 12345) & 0x7fffffff;
    const grain = (seed >> 16) % 60;
    pixels[i] = 120 + grain; pixels[i + 1] = 80 + grain * 0.7; pixels[i + 2] = 45 + grain * 0.4;
  }
  return sharp(pixels, { raw: { width, height, channels: 3 } }).jpeg({ quality: 92 }).toBuffer();
}
