import sharp from 'sharp';

/** A plain test image built on the spot, so no binary fixtures live in the repository. */
export const solid = (format: 'jpeg' | 'png' | 'webp', width = 640, height = 360) =>
  sharp({ create: { width, height, channels: 3, background: { r: 140, g: 96, b: 52 } } })[format]().toBuffer();

/** A JPEG as a phone writes it: lying on its side (EXIF orientation 6) with the camera model and a GPS position. */
export const phoneJpegWithGps = () =>
  sharp({ create: { width: 800, height: 400, channels: 3, background: { r: 150, g: 110, b: 70 } } })
    .jpeg()
    .withMetadata({ orientation: 6 })
    .withExif({
      IFD0: { Make: 'Quillfield', Model: 'Yardcam 7' },
      IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '45/1 30/1 0/1', GPSLongitudeRef: 'W', GPSLongitude: '122/1 40/1 0/1' },
    })
    .toBuffer();

/** Finds the GPS sub-IFD pointer (tag 0x8825) in IFD0 of an EXIF block as sharp returns it ("Exif\0\0" + TIFF). */
export function exifHasGpsIfd(exif: Buffer | undefined): boolean {
  if (!exif) return false;
  const tiff = exif.subarray(exif.subarray(0, 6).toString('latin1') === 'Exif\0\0' ? 6 : 0);
  const le = tiff.subarray(0, 2).toString('latin1') === 'II';
  const u16 = (at: number) => (le ? tiff.readUInt16LE(at) : tiff.readUInt16BE(at));
  const u32 = (at: number) => (le ? tiff.readUInt32LE(at) : tiff.readUInt32BE(at));
  const ifd0 = u32(4);
  const entries = u16(ifd0);
  for (let i = 0; i < entries; i++) if (u16(ifd0 + 2 + i * 12) === 0x8825) return true;
  return false;
}

export const SVG = Buffer.from('<?xml version="1.0"?><svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><script>alert(1)</script><rect width="10" height="10"/></svg>');
export const TEXT = Buffer.from('This is a yard note, not a photo.\n');
/** The start of a HEIC file (ftyp box, brand heic) followed by data no decoder here can read. */
export const HEIC_LIKE = Buffer.concat([
  Buffer.from([0, 0, 0, 24]), Buffer.from('ftypheic', 'latin1'), Buffer.from([0, 0, 0, 0]), Buffer.from('mif1heic', 'latin1'),
  Buffer.alloc(512, 7),
]);
