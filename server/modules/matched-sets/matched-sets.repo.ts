import { and, asc, eq, inArray } from 'drizzle-orm';
import type { Tx } from '../../db/client';
import { matchedSetSlabs, matchedSets, slabs } from '../../db/schema/index';

const memberColumns = { setId: matchedSetSlabs.setId, id: slabs.id, code: slabs.code, sequenceInLog: slabs.sequenceInLog, status: slabs.status, logId: slabs.logId };

export function findSlabs(tx: Tx, ids: number[]) {
  return tx.select({ id: slabs.id, code: slabs.code, logId: slabs.logId, sequenceInLog: slabs.sequenceInLog, status: slabs.status })
    .from(slabs).where(inArray(slabs.id, ids)).for('update');
}

/** Members of every set that holds one of these slabs. */
export function membersOfSetsWith(tx: Tx, slabIds: number[]) {
  if (!slabIds.length) return Promise.resolve([]);
  const sets = tx.select({ id: matchedSetSlabs.setId }).from(matchedSetSlabs).where(inArray(matchedSetSlabs.slabId, slabIds));
  return tx.select(memberColumns).from(matchedSetSlabs).innerJoin(slabs, eq(slabs.id, matchedSetSlabs.slabId))
    .where(inArray(matchedSetSlabs.setId, sets)).orderBy(asc(matchedSetSlabs.setId), asc(slabs.sequenceInLog));
}

export function membersInLog(tx: Tx, logId: number) {
  return tx.select(memberColumns).from(matchedSetSlabs).innerJoin(slabs, eq(slabs.id, matchedSetSlabs.slabId))
    .where(eq(slabs.logId, logId)).orderBy(asc(matchedSetSlabs.setId), asc(slabs.sequenceInLog));
}

export function slabsInLog(tx: Tx, logId: number) {
  return tx.select({ id: slabs.id, code: slabs.code, sequenceInLog: slabs.sequenceInLog, status: slabs.status })
    .from(slabs).where(eq(slabs.logId, logId)).orderBy(asc(slabs.sequenceInLog));
}

export async function insertSet(tx: Tx, logId: number, slabIds: number[], markedBy: string) {
  const [set] = await tx.insert(matchedSets).values({ logId, markedBy }).returning();
  await tx.insert(matchedSetSlabs).values(slabIds.map((slabId) => ({ setId: set.id, slabId })));
  return set;
}

export async function findSet(tx: Tx, id: number) {
  const [row] = await tx.select().from(matchedSets).where(eq(matchedSets.id, id)).for('update');
  return row ?? null;
}

export async function deleteSet(tx: Tx, id: number) {
  await tx.delete(matchedSets).where(and(eq(matchedSets.id, id)));
}
