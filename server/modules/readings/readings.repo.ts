import { and, asc, desc, eq, inArray, lte, ne, sql } from 'drizzle-orm';
import type { Tx } from '../../db/client';
import { logs, millSettings, moistureReadings, slabs, species } from '../../db/schema/index';
import { vouchedFor } from './reading-visibility';

export type ReadingRow = typeof moistureReadings.$inferSelect;
export type NewReading = typeof moistureReadings.$inferInsert;

/** The slab row, locked for the rest of the transaction so two readings cannot race its drying state. */
export async function lockSlab(tx: Tx, id: number) {
  const [row] = await tx.select({ id: slabs.id, code: slabs.code, dryingState: slabs.dryingState })
    .from(slabs).where(eq(slabs.id, id)).for('update');
  return row ?? null;
}

export async function findSlabWithMilling(db: Tx, id: number) {
  const [row] = await db
    .select({ id: slabs.id, code: slabs.code, dryingState: slabs.dryingState, thicknessIn: slabs.thicknessIn, milledOn: logs.milledOn })
    .from(slabs).innerJoin(logs, eq(logs.id, slabs.logId)).where(eq(slabs.id, id));
  return row ?? null;
}

export function findSlabsByIds(db: Tx, ids: number[]) {
  if (!ids.length) return Promise.resolve([]);
  return db.select({ id: slabs.id, code: slabs.code }).from(slabs).where(inArray(slabs.id, ids));
}

export function findSlabsByCodes(db: Tx, codes: string[]) {
  if (!codes.length) return Promise.resolve([]);
  return db.select({ id: slabs.id, code: slabs.code }).from(slabs).where(inArray(slabs.code, codes));
}

export async function insertReading(tx: Tx, values: NewReading) {
  const [row] = await tx.insert(moistureReadings).values(values).returning();
  return row;
}

export function listReadings(db: Tx, slabId: number) {
  return db.select().from(moistureReadings).where(eq(moistureReadings.slabId, slabId))
    .orderBy(asc(moistureReadings.measuredOn), asc(moistureReadings.id));
}

/** The reading that decides the drying state: the latest vouched-for one by date, then the last entered that day. */
export async function latestReading(tx: Tx, slabId: number) {
  const [row] = await tx.select().from(moistureReadings).where(and(eq(moistureReadings.slabId, slabId), vouchedFor))
    .orderBy(desc(moistureReadings.measuredOn), desc(moistureReadings.id)).limit(1);
  return row ?? null;
}

/** The vouched-for reading a new one taken on `measuredOn` follows: the latest on or before that day. */
export async function readingBefore(tx: Tx, slabId: number, measuredOn: string) {
  const [row] = await tx.select({ measuredOn: moistureReadings.measuredOn, mcPercent: moistureReadings.mcPercent }).from(moistureReadings)
    .where(and(eq(moistureReadings.slabId, slabId), lte(moistureReadings.measuredOn, measuredOn), vouchedFor))
    .orderBy(desc(moistureReadings.measuredOn), desc(moistureReadings.id)).limit(1);
  return row ?? null;
}

/** The basic specific gravity of the slab's species: it caps what an oven-dry sample can show. */
export async function speciesOfSlab(tx: Tx, slabId: number) {
  const [row] = await tx.select({ name: species.name, basicSpecificGravity: species.basicSpecificGravity })
    .from(slabs).innerJoin(species, eq(species.id, slabs.speciesId)).where(eq(slabs.id, slabId));
  return row ?? null;
}

export async function findReading(tx: Tx, id: number) {
  const [row] = await tx.select().from(moistureReadings).where(eq(moistureReadings.id, id));
  return row ?? null;
}

export async function deleteReading(tx: Tx, id: number, slabId: number) {
  await tx.delete(moistureReadings).where(and(eq(moistureReadings.id, id), eq(moistureReadings.slabId, slabId)));
}

export async function setDryingState(tx: Tx, slabId: number, dryingState: string) {
  await tx.update(slabs).set({ dryingState, updatedAt: new Date() }).where(eq(slabs.id, slabId));
}

/** The mill's target MC for indoor work (settings row 1); the schema default when no row exists yet. */
export async function readTargetMcPercent(db: Tx): Promise<number> {
  const [row] = await db.select({ target: millSettings.targetMcPercent }).from(millSettings).where(eq(millSettings.id, 1));
  return row?.target ?? 8;
}

const lastReading = <T>(col: typeof moistureReadings.mcPercent | typeof moistureReadings.measuredOn) => sql<T>`(
  select ${col} from ${moistureReadings} where ${moistureReadings.slabId} = ${slabs.id} and ${vouchedFor}
  order by ${moistureReadings.measuredOn} desc, ${moistureReadings.id} desc limit 1)`;

/** Slabs still in a stack, with their latest reading; `stack` narrows to one stack. */
export function slabsInStacks(db: Tx, statuses: readonly string[], stack?: string) {
  return db.select({
    id: slabs.id, code: slabs.code, speciesName: species.name, yardStack: slabs.yardStack, yardPosition: slabs.yardPosition,
    lastMcPercent: lastReading<number | null>(moistureReadings.mcPercent),
    lastReadingOn: sql<string | null>`${lastReading(moistureReadings.measuredOn)}::text`,
  }).from(slabs).innerJoin(species, eq(species.id, slabs.speciesId))
    .where(and(inArray(slabs.status, [...statuses]), stack === undefined ? ne(slabs.yardStack, '') : eq(slabs.yardStack, stack)));
}
