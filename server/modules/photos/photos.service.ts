import type { Db } from '../../db/client';
import { AppError, notFound, validationError } from '../../lib/errors';
import { recordAudit } from '../../lib/audit';
import type { SessionUser } from '../../lib/session';
import {
  PHOTO_LIMITS, photoUrls, reorderPhotosSchema, updatePhotoSchema, type YardPhotoList, type YardPhotoView,
} from '../../../shared/photos';
import { renderPhoto } from './photo-image';
import { newFileKey, removeRenditions, writeRenditions } from './photo-files';
import * as repo from './photos.repo';

type Actor = Pick<SessionUser, 'id' | 'email'>;
export type IncomingFile = { buffer: Buffer; originalname: string };

export const toView = (p: repo.PhotoRow): YardPhotoView => ({
  id: p.id, ...photoUrls(p.fileKey), width: p.width, height: p.height, position: p.position,
  isCover: p.isCover, isIllustration: p.isIllustration, altText: p.altText, view: (p.view as YardPhotoView['view']) ?? null,
  createdAt: p.createdAt.toISOString(),
});

const overCap = (existing: number) =>
  new AppError(409, 'photo_limit',
    `A slab can have at most ${PHOTO_LIMITS.maxPerSlab} photos; this one has ${existing}. Delete some before adding more.`);

/** "Photo 2 (bench.jpg)": the sender's file name, shortened and without control characters, only for messages. */
const describe = (i: number, name: string) => {
  const clean = name.replace(/[\p{Cc}\p{Cf}]/gu, '').slice(0, 60);
  return clean ? `Photo ${i + 1} (${clean})` : `Photo ${i + 1}`;
};

export async function listSlabPhotos(db: Db, slabId: number): Promise<YardPhotoList> {
  if (!(await repo.slabExists(db, slabId))) throw notFound('That slab');
  return { slabId, items: (await repo.listPhotos(db, slabId)).map(toView), maxPerSlab: PHOTO_LIMITS.maxPerSlab };
}

/**
 * Renders and stores each photo, then records them all in one transaction. Any failure removes
 * every file written for this request, so neither files nor rows are left behind.
 */
export async function uploadPhotos(db: Db, uploadsDir: string, slabId: number, files: IncomingFile[], actor: Pick<SessionUser, 'id' | 'email'> | null = null): Promise<YardPhotoList> {
  if (!files.length) throw validationError({ photos: ['Choose at least one photo to upload.'] }, 'No photos were sent.');
  if (!(await repo.slabExists(db, slabId))) throw notFound('That slab');
  // Early answer before the slow rendering; the binding check is repeated inside the transaction.
  const before = (await repo.listPhotos(db, slabId)).length;
  if (before + files.length > PHOTO_LIMITS.maxPerSlab) throw overCap(before);

  const written: { key: string; width: number; height: number }[] = [];
  try {
    for (const [i, file] of files.entries()) {
      const rendered = await renderPhoto(file.buffer, describe(i, file.originalname));
      const key = newFileKey();
      written.push({ key, width: rendered.width, height: rendered.height });
      await writeRenditions(uploadsDir, key, rendered);
    }
    await db.transaction(async (tx) => {
      if (!(await repo.lockSlab(tx, slabId))) throw notFound('That slab');
      const existing = await repo.listPhotos(tx, slabId);
      if (existing.length + written.length > PHOTO_LIMITS.maxPerSlab) throw overCap(existing.length);
      const hasCover = existing.some((p) => p.isCover);
      const nextPosition = existing.reduce((max, p) => Math.max(max, p.position + 1), 0);
      await repo.insertPhotos(tx, written.map((w, i) => ({
        slabId, fileKey: w.key, width: w.width, height: w.height, position: nextPosition + i, isCover: !hasCover && i === 0,
      })));
      await recordAudit(tx, { actor, action: 'slab-photo.add', entityType: 'slab', entityId: slabId, before: null, after: { count: written.length } });
    });
  } catch (e) {
    await removeRenditions(uploadsDir, written.map((w) => w.key));
    throw e;
  }
  return listSlabPhotos(db, slabId);
}

export async function updateSlabPhoto(db: Db, slabId: number, photoId: number, body: unknown): Promise<YardPhotoView> {
  const input = updatePhotoSchema.parse(body);
  return db.transaction(async (tx) => {
    const photo = await repo.findPhoto(tx, slabId, photoId);
    if (!photo) throw notFound('That photo');
    if (input.isCover) await repo.makeCover(tx, slabId, photoId);
    const { isCover: _ignored, ...rest } = input;
    const row = Object.keys(rest).length ? await repo.updatePhoto(tx, photoId, rest) : await repo.findPhoto(tx, slabId, photoId);
    return toView(row!);
  });
}

/** The new order must list every photo of the slab once; anything else means the page was out of date. */
export async function reorderSlabPhotos(db: Db, slabId: number, body: unknown): Promise<YardPhotoList> {
  const { photoIds } = reorderPhotosSchema.parse(body);
  await db.transaction(async (tx) => {
    if (!(await repo.lockSlab(tx, slabId))) throw notFound('That slab');
    const current = new Set((await repo.listPhotos(tx, slabId)).map((p) => p.id));
    if (current.size !== photoIds.length || photoIds.some((id) => !current.has(id))) {
      throw new AppError(409, 'stale_photos', 'The photos of this slab changed since the page was loaded. Reload and try again.');
    }
    for (const [position, id] of photoIds.entries()) await repo.updatePhoto(tx, id, { position });
  });
  return listSlabPhotos(db, slabId);
}

/** Deleting the cover hands the cover to the next photo in order. Files go after the rows are gone. */
export async function deleteSlabPhoto(db: Db, uploadsDir: string, actor: Actor, slabId: number, photoId: number): Promise<YardPhotoList> {
  const removed = await db.transaction(async (tx) => {
    if (!(await repo.lockSlab(tx, slabId))) throw notFound('That slab');
    const photo = await repo.findPhoto(tx, slabId, photoId);
    if (!photo) throw notFound('That photo');
    await repo.deletePhoto(tx, photoId);
    if (photo.isCover) {
      const [next] = await repo.listPhotos(tx, slabId);
      if (next) await repo.makeCover(tx, slabId, next.id);
    }
    await recordAudit(tx, { actor, action: 'slab-photo.delete', entityType: 'slab', entityId: slabId, before: toView(photo), after: null });
    return photo;
  });
  await removeRenditions(uploadsDir, [removed.fileKey]);
  return listSlabPhotos(db, slabId);
}
