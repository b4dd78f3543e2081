import { and, asc, count, desc, eq, inArray, lte } from 'drizzle-orm';
import type { Tx } from '../../db/client';
import { vouchedFor } from '../readings/reading-visibility';
import { holds, moistureReadings, slabPhotos, slabs, species, user } from '../../db/schema/index';

export async function findSlab(tx: Tx, slabId: number) {
  const [row] = await tx.select().from(slabs).where(eq(slabs.id, slabId));
  return row ?? null;
}

export async function insertHold(tx: Tx, values: typeof holds.$inferInsert) {
  const [row] = await tx.insert(holds).values(values).returning();
  return row;
}

export async function countActiveHolds(tx: Tx, buyerId: string) {
  const [row] = await tx.select({ n: count() }).from(holds).where(and(eq(holds.buyerId, buyerId), eq(holds.status, 'active')));
  return row?.n ?? 0;
}

export async function findActiveHoldOnSlab(tx: Tx, slabId: number) {
  const [row] = await tx.select().from(holds).where(and(eq(holds.slabId, slabId), eq(holds.status, 'active')));
  return row ?? null;
}

export async function findHold(tx: Tx, id: number) {
  const [row] = await tx.select().from(holds).where(eq(holds.id, id));
  return row ?? null;
}

/** Closes holds that are still active; returns the ones this call closed. */
export function closeHolds(tx: Tx, ids: number[], status: 'released' | 'expired' | 'converted', closedBy: string, now = new Date()) {
  return tx.update(holds).set({ status, closedAt: now, closedBy })
    .where(and(inArray(holds.id, ids), eq(holds.status, 'active'))).returning();
}

/** The buyer's active holds with their slab, species, latest reading and cover photo key. */
export async function findActiveHoldsWithSlabs(tx: Tx, buyerId: string) {
  const rows = await tx.select({ hold: holds, slab: slabs, species }).from(holds)
    .innerJoin(slabs, eq(slabs.id, holds.slabId)).innerJoin(species, eq(species.id, slabs.speciesId))
    .where(and(eq(holds.buyerId, buyerId), eq(holds.status, 'active'))).orderBy(asc(holds.expiresAt), asc(holds.id));
  return withReadingsAndCovers(tx, rows);
}

export async function withReadingsAndCovers<T extends { slab: typeof slabs.$inferSelect }>(tx: Tx, rows: T[]) {
  const ids = rows.map((r) => r.slab.id);
  if (!ids.length) return [];
  const [readings, photos] = await Promise.all([
    tx.select({ slabId: moistureReadings.slabId, mc: moistureReadings.mcPercent }).from(moistureReadings)
      .where(and(inArray(moistureReadings.slabId, ids), vouchedFor)).orderBy(asc(moistureReadings.measuredOn), asc(moistureReadings.id)),
    tx.select({ slabId: slabPhotos.slabId, key: slabPhotos.fileKey }).from(slabPhotos)
      .where(inArray(slabPhotos.slabId, ids)).orderBy(desc(slabPhotos.isCover), asc(slabPhotos.position), asc(slabPhotos.id)),
  ]);
  const latestMc = new Map<number, number>();
  for (const r of readings) latestMc.set(r.slabId, r.mc); // ordered oldest → newest, so the last one wins
  const cover = new Map<number, string>();
  for (const p of photos) if (!cover.has(p.slabId)) cover.set(p.slabId, p.key);
  return rows.map((r) => ({ ...r, latestMc: latestMc.get(r.slab.id) ?? null, coverKey: cover.get(r.slab.id) ?? null }));
}

/** Active holds past their expiry, locked so a concurrent checkout or sweep waits. */
export function findExpiredHolds(tx: Tx, now: Date) {
  return tx.select({ hold: holds, slabCode: slabs.code, speciesName: species.name, buyerEmail: user.email, buyerName: user.name })
    .from(holds).innerJoin(slabs, eq(slabs.id, holds.slabId)).innerJoin(species, eq(species.id, slabs.speciesId))
    .innerJoin(user, eq(user.id, holds.buyerId))
    .where(and(eq(holds.status, 'active'), lte(holds.expiresAt, now)))
    .orderBy(asc(holds.id)).limit(200).for('update', { of: holds });
}

export function findLogNeighbours(tx: Tx, ids: number[]) {
  return tx.select().from(slabs).where(inArray(slabs.id, ids));
}

/** Code and species of each slab, for messages about them. */
export function slabLabels(tx: Tx, ids: number[]) {
  return tx.select({ code: slabs.code, speciesName: species.name }).from(slabs)
    .innerJoin(species, eq(species.id, slabs.speciesId)).where(inArray(slabs.id, ids)).orderBy(asc(slabs.code));
}
