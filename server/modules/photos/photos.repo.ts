import { and, asc, eq, ne } from 'drizzle-orm';
import type { Tx } from '../../db/client';
import { slabPhotos, slabs } from '../../db/schema/index';

export type PhotoRow = typeof slabPhotos.$inferSelect;
export type NewPhoto = typeof slabPhotos.$inferInsert;

export async function slabExists(db: Tx, id: number) {
  const [row] = await db.select({ id: slabs.id }).from(slabs).where(eq(slabs.id, id));
  return Boolean(row);
}

/** Locks the slab row so two uploads to one slab queue up behind each other and the cap holds. */
export async function lockSlab(tx: Tx, id: number) {
  const [row] = await tx.select({ id: slabs.id }).from(slabs).where(eq(slabs.id, id)).for('update');
  return Boolean(row);
}

export function listPhotos(db: Tx, slabId: number) {
  return db.select().from(slabPhotos).where(eq(slabPhotos.slabId, slabId)).orderBy(asc(slabPhotos.position), asc(slabPhotos.id));
}

export async function findPhoto(db: Tx, slabId: number, photoId: number) {
  const [row] = await db.select().from(slabPhotos).where(and(eq(slabPhotos.slabId, slabId), eq(slabPhotos.id, photoId)));
  return row ?? null;
}

export function insertPhotos(tx: Tx, rows: NewPhoto[]) {
  return tx.insert(slabPhotos).values(rows).returning();
}

export async function updatePhoto(tx: Tx, photoId: number, values: Partial<Pick<PhotoRow, 'altText' | 'isIllustration' | 'isCover' | 'position' | 'view'>>) {
  const [row] = await tx.update(slabPhotos).set(values).where(eq(slabPhotos.id, photoId)).returning();
  return row;
}

/** Exactly one cover per slab: clear the others, then set this one. */
export async function makeCover(tx: Tx, slabId: number, photoId: number) {
  await tx.update(slabPhotos).set({ isCover: false }).where(and(eq(slabPhotos.slabId, slabId), ne(slabPhotos.id, photoId)));
  await tx.update(slabPhotos).set({ isCover: true }).where(eq(slabPhotos.id, photoId));
}

export async function deletePhoto(tx: Tx, photoId: number) {
  await tx.delete(slabPhotos).where(eq(slabPhotos.id, photoId));
}
