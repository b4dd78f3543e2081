import crypto from 'node:crypto';
import fs from 'node:fs/promises';
import path from 'node:path';
import type { RenderedPhoto } from './photo-image';
import { getLogger } from '../../lib/logger';

/** 128 random bits in hex: unguessable and safe in a URL and a file name. */
export const newFileKey = () => crypto.randomBytes(16).toString('hex');

const renditionNames = (key: string) => [`${key}-display.webp`, `${key}-thumb.webp`];

/**
 * Writes under a dot-prefixed temporary name (never served: /uploads denies dotfiles), then renames,
 * so a reader never sees half a file.
 */
async function writeAtomically(dir: string, name: string, data: Buffer) {
  const temp = path.join(dir, `.partial-${crypto.randomBytes(6).toString('hex')}-${name}`);
  try {
    await fs.writeFile(temp, data, { flag: 'wx' });
    await fs.rename(temp, path.join(dir, name));
  } catch (e) {
    await fs.rm(temp, { force: true });
    throw e;
  }
}

export async function writeRenditions(dir: string, key: string, photo: RenderedPhoto) {
  await fs.mkdir(dir, { recursive: true });
  const [displayName, thumbName] = renditionNames(key);
  await writeAtomically(dir, displayName, photo.display);
  await writeAtomically(dir, thumbName, photo.thumb);
}

/** Removes both renditions of each key; missing files are fine (the write may have stopped half-way). */
export async function removeRenditions(dir: string, keys: string[]) {
  const results = await Promise.allSettled(
    keys.flatMap((key) => renditionNames(key).map((name) => fs.rm(path.join(dir, name), { force: true }))),
  );
  // Cleanup runs while another error is on its way out: log, never replace that error.
  for (const r of results) if (r.status === 'rejected') getLogger().error({ part: 'photos', err: r.reason }, 'could not remove a photo rendition');
}
