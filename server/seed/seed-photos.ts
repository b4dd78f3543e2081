/** Renders the demo slabs' illustrations and writes them where the photo store serves them from. */
import { randomBytes } from 'node:crypto';
import { mkdir, rm, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import type { DemoSlab } from './demo-data';
import { renderSlabIllustration } from './illustration';

export type WrittenIllustration = { code: string; fileKey: string; width: number; height: number; files: string[] };

const CONCURRENCY = 4;

export async function writeDemoIllustrations(slabs: DemoSlab[], uploadsDir: string): Promise<WrittenIllustration[]> {
  await mkdir(uploadsDir, { recursive: true });
  const written: WrittenIllustration[] = [];
  try {
    for (let i = 0; i < slabs.length; i += CONCURRENCY) {
      const batch = await Promise.all(slabs.slice(i, i + CONCURRENCY).map(async (slab) => {
        const image = await renderSlabIllustration({
          seed: slab.illustrationSeed, widthsIn: slab.widthsIn, lengthIn: slab.lengthIn, liveEdge: slab.liveEdge,
          speciesSlug: slab.speciesSlug, figures: slab.figures, thicknessIn: slab.thicknessIn,
        });
        const fileKey = randomBytes(12).toString('hex');
        const files = [join(uploadsDir, `${fileKey}-display.webp`), join(uploadsDir, `${fileKey}-thumb.webp`)];
        await Promise.all([writeFile(files[0], image.display), writeFile(files[1], image.thumb)]);
        return { code: slab.code, fileKey, width: image.width, height: image.height, files };
      }));
      written.push(...batch);
    }
  } catch (error) {
    await removeIllustrations(written);
    throw error;
  }
  return written;
}

/** Undo for a seed that failed after the files were written. */
export async function removeIllustrations(written: WrittenIllustration[]): Promise<void> {
  await Promise.all(written.flatMap((w) => w.files.map((f) => rm(f, { force: true }))));
}
