import { and, count, desc, eq, inArray, isNull, sql } from 'drizzle-orm';
import type { Tx } from '../../db/client';
import { holds, savedSlabs, slabs, slabWatches, species, user } from '../../db/schema/index';

export async function findSlabStatus(db: Tx, slabId: number) {
  const [row] = await db.select({ id: slabs.id, code: slabs.code, status: slabs.status }).from(slabs).where(eq(slabs.id, slabId));
  return row ?? null;
}

export async function savedOf(db: Tx, userId: string) {
  return db.select({ slabId: savedSlabs.slabId, createdAt: savedSlabs.createdAt }).from(savedSlabs)
    .where(eq(savedSlabs.userId, userId)).orderBy(desc(savedSlabs.createdAt), desc(savedSlabs.slabId));
}

export async function countSaved(db: Tx, userId: string) {
  const [row] = await db.select({ n: count() }).from(savedSlabs).where(eq(savedSlabs.userId, userId));
  return row?.n ?? 0;
}

export const insertSaved = (db: Tx, userId: string, slabId: number) =>
  db.insert(savedSlabs).values({ userId, slabId }).onConflictDoNothing();

export const deleteSaved = (db: Tx, userId: string, slabId: number) =>
  db.delete(savedSlabs).where(and(eq(savedSlabs.userId, userId), eq(savedSlabs.slabId, slabId)));

export async function openWatchesOf(db: Tx, userId: string) {
  const rows = await db.select({ slabId: slabWatches.slabId }).from(slabWatches)
    .where(and(eq(slabWatches.userId, userId), isNull(slabWatches.notifiedAt)));
  return rows.map((r) => r.slabId);
}

/** The partial unique index keeps one open watch per buyer and slab; a repeat is a no-op. */
export const insertWatch = (db: Tx, userId: string, slabId: number) =>
  db.insert(slabWatches).values({ userId, slabId }).onConflictDoNothing();

export const deleteOpenWatch = (db: Tx, userId: string, slabId: number) =>
  db.delete(slabWatches).where(and(eq(slabWatches.userId, userId), eq(slabWatches.slabId, slabId), isNull(slabWatches.notifiedAt)));

/**
 * Closes the open watches on those slabs that are for sale now and returns who to tell. The
 * conditional update claims each watch once, even when two releases race.
 */
export function claimWatchesOnListedSlabs(tx: Tx, slabIds: number[], now: Date) {
  if (!slabIds.length) return Promise.resolve([]);
  return tx.update(slabWatches).set({ notifiedAt: now })
    .where(and(
      inArray(slabWatches.slabId, slabIds), isNull(slabWatches.notifiedAt),
      sql`exists (select 1 from ${slabs} where ${slabs.id} = ${slabWatches.slabId} and ${slabs.status} = 'listed')`,
    ))
    .returning({ userId: slabWatches.userId, slabId: slabWatches.slabId });
}

export function mailingDetails(tx: Tx, userIds: string[], slabIds: number[]) {
  return Promise.all([
    userIds.length ? tx.select({ id: user.id, name: user.name, email: user.email }).from(user).where(inArray(user.id, userIds)) : Promise.resolve([]),
    slabIds.length ? tx.select({ id: slabs.id, code: slabs.code, speciesName: species.name }).from(slabs)
      .innerJoin(species, eq(species.id, slabs.speciesId)).where(inArray(slabs.id, slabIds)) : Promise.resolve([]),
  ]);
}

export async function activeHoldSlabIds(db: Tx, userId: string) {
  const rows = await db.select({ slabId: holds.slabId }).from(holds).where(and(eq(holds.buyerId, userId), eq(holds.status, 'active')));
  return rows.map((r) => r.slabId);
}
