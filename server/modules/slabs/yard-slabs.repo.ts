import { and, asc, desc, eq, ilike, inArray, ne, or, sql, type SQL } from 'drizzle-orm';
import type { Tx } from '../../db/client';
import { vouchedFor } from '../readings/reading-visibility';
import { figureKinds, holds, logs, moistureReadings, orderLines, slabPhotos, slabs, species } from '../../db/schema/index';
import type { YardSlabQuery, YardSort } from '../../../shared/slab-input';

const latestReading = <T>(col: typeof moistureReadings.mcPercent | typeof moistureReadings.measuredOn) => sql<T>`(
  select ${col} from ${moistureReadings} where ${moistureReadings.slabId} = ${slabs.id}
  order by ${moistureReadings.measuredOn} desc, ${moistureReadings.id} desc limit 1)`;

const moisturePercent = latestReading<number | null>(moistureReadings.mcPercent);
const lastReadingOn = sql<string | null>`${latestReading(moistureReadings.measuredOn)}::text`;
const photoCount = sql<number>`(select count(*)::int from ${slabPhotos} where ${slabPhotos.slabId} = ${slabs.id})`;

const rowColumns = {
  slab: slabs, speciesSlug: species.slug, speciesName: species.name, rate: species.ratePerBoardFootCents,
  logCode: logs.code, milledOn: logs.milledOn, moisturePercent, lastReadingOn, photoCount,
};

const selectRows = (db: Tx) =>
  db.select(rowColumns).from(slabs)
    .innerJoin(species, eq(species.id, slabs.speciesId))
    .innerJoin(logs, eq(logs.id, slabs.logId));

export type YardRow = Awaited<ReturnType<typeof findYardRow>> & object;

export async function findYardRow(db: Tx, id: number) {
  const [row] = await selectRows(db).where(eq(slabs.id, id));
  return row ?? null;
}

function whereFor(q: YardSlabQuery): SQL | undefined {
  const parts: (SQL | undefined)[] = [];
  if (q.status?.length) parts.push(inArray(slabs.status, q.status));
  if (q.species) parts.push(eq(species.slug, q.species));
  if (q.log) parts.push(eq(slabs.logId, q.log));
  if (q.stack) parts.push(eq(slabs.yardStack, q.stack));
  if (q.q) {
    const like = `%${q.q.replace(/[%_\\]/g, (c) => `\\${c}`)}%`;
    parts.push(or(ilike(slabs.code, like), ilike(species.name, like), ilike(logs.code, like),
      ilike(slabs.figureNotes, like), ilike(slabs.description, like), ilike(slabs.yardStack, like)));
  }
  return parts.length ? and(...parts) : undefined;
}

const sortColumn: Record<YardSort, SQL> = {
  code: sql`${slabs.code}`, species: sql`${species.name}`, log: sql`${logs.code}`, sequenceInLog: sql`${slabs.sequenceInLog}`,
  status: sql`${slabs.status}`, dryingState: sql`${slabs.dryingState}`, thicknessIn: sql`${slabs.thicknessIn}`,
  widthIn: sql`${slabs.widthIn}`, lengthIn: sql`${slabs.lengthIn}`, boardFeet: sql`${slabs.boardFeet}`,
  priceCents: sql`${slabs.priceCents}`, yardStack: sql`${slabs.yardStack}`, moisturePercent,
  photoCount, createdAt: sql`${slabs.createdAt}`, updatedAt: sql`${slabs.updatedAt}`, listedAt: sql`${slabs.listedAt}`,
  // worked out from each slab's readings in the service, which sorts on it; the database keeps code order
  airDryExpectedOn: sql`${slabs.code}`,
};

/** The readings someone stands behind (not unconfirmed ones) of the given slabs, oldest first, for the drying forecasts. */
export function readingsForSlabs(db: Tx, ids: number[]) {
  if (!ids.length) return Promise.resolve([]);
  return db.select({ slabId: moistureReadings.slabId, measuredOn: moistureReadings.measuredOn, mcPercent: moistureReadings.mcPercent })
    .from(moistureReadings).where(and(inArray(moistureReadings.slabId, ids), vouchedFor)).orderBy(asc(moistureReadings.measuredOn), asc(moistureReadings.id));
}

export async function findYardPage(db: Tx, q: YardSlabQuery, { all = false } = {}) {
  const where = whereFor(q);
  const col = sortColumn[q.sort];
  const order = q.dir === 'desc' ? sql`${col} desc nulls last` : sql`${col} asc nulls last`;
  const base = selectRows(db).where(where).orderBy(order, asc(slabs.id)).$dynamic();
  const rows = all ? await base.limit(10_000) : await base.limit(q.pageSize).offset((q.page - 1) * q.pageSize);
  const [{ count }] = await db.select({ count: sql<number>`count(*)::int` }).from(slabs)
    .innerJoin(species, eq(species.id, slabs.speciesId)).innerJoin(logs, eq(logs.id, slabs.logId)).where(where);
  return { rows, total: Number(count) };
}

export function statusCounts(db: Tx) {
  return db.select({ status: slabs.status, count: sql<number>`count(*)::int` }).from(slabs).groupBy(slabs.status);
}

export async function findLogWithRate(db: Tx, logId: number) {
  const [row] = await db.select({ log: logs, rate: species.ratePerBoardFootCents }).from(logs)
    .innerJoin(species, eq(species.id, logs.speciesId)).where(eq(logs.id, logId));
  return row ?? null;
}

/** The slab row locked for the rest of the transaction, so two edits cannot interleave. */
export async function lockSlab(tx: Tx, id: number) {
  const [row] = await tx.select().from(slabs).where(eq(slabs.id, id)).for('update');
  return row ?? null;
}

export async function speciesRate(tx: Tx, speciesId: number) {
  const [row] = await tx.select({ rate: species.ratePerBoardFootCents }).from(species).where(eq(species.id, speciesId));
  return row?.rate ?? 0;
}

export async function nextSequence(tx: Tx, logId: number) {
  const [row] = await tx.select({ max: sql<number | null>`max(${slabs.sequenceInLog})` }).from(slabs).where(eq(slabs.logId, logId));
  return Number(row?.max ?? 0) + 1;
}

export async function sequenceOwner(tx: Tx, logId: number, seq: number, exceptId?: number) {
  const [row] = await tx.select({ id: slabs.id, code: slabs.code }).from(slabs)
    .where(and(eq(slabs.logId, logId), eq(slabs.sequenceInLog, seq), exceptId ? ne(slabs.id, exceptId) : undefined));
  return row ?? null;
}

export async function codeTaken(tx: Tx, code: string) {
  const [row] = await tx.select({ id: slabs.id }).from(slabs).where(eq(slabs.code, code));
  return !!row;
}

export async function existingFigureSlugs(tx: Tx, slugs: string[]) {
  if (!slugs.length) return [];
  const rows = await tx.select({ slug: figureKinds.slug }).from(figureKinds).where(inArray(figureKinds.slug, slugs));
  return rows.map((r) => r.slug);
}

export async function latestReadingOf(tx: Tx, slabId: number) {
  const [row] = await tx.select({ mcPercent: moistureReadings.mcPercent, measuredOn: moistureReadings.measuredOn })
    .from(moistureReadings).where(and(eq(moistureReadings.slabId, slabId), vouchedFor))
    .orderBy(desc(moistureReadings.measuredOn), desc(moistureReadings.id)).limit(1);
  return row ?? null;
}

export async function photoCountOf(tx: Tx, slabId: number) {
  const [row] = await tx.select({ n: sql<number>`count(*)::int` }).from(slabPhotos).where(eq(slabPhotos.slabId, slabId));
  return Number(row?.n ?? 0);
}

export async function insertSlab(tx: Tx, values: typeof slabs.$inferInsert) {
  const [row] = await tx.insert(slabs).values(values).returning();
  return row;
}

/** Everything but the status, which only slab-state.ts moves. */
export async function updateSlab(tx: Tx, id: number, values: Omit<Partial<typeof slabs.$inferInsert>, 'status' | 'listedAt'>) {
  const [row] = await tx.update(slabs).set({ ...values, updatedAt: new Date() }).where(eq(slabs.id, id)).returning();
  return row;
}

export const listFigureKinds = (db: Tx) => db.select().from(figureKinds).orderBy(asc(figureKinds.label));

export async function insertFigureKind(tx: Tx, values: typeof figureKinds.$inferInsert) {
  const [row] = await tx.insert(figureKinds).values(values).onConflictDoNothing().returning();
  return row ?? null;
}

/** What ties a slab to buyers: any hold ever placed and any order line ever written. */
export async function buyerTraces(tx: Tx, slabId: number) {
  const [row] = await tx.select({
    holds: sql<number>`(select count(*)::int from ${holds} where ${holds.slabId} = ${slabId})`,
    lines: sql<number>`(select count(*)::int from ${orderLines} where ${orderLines.slabId} = ${slabId})`,
  }).from(sql`(select 1) as one`);
  return { holds: Number(row?.holds ?? 0), lines: Number(row?.lines ?? 0) };
}

export async function photoKeysOf(tx: Tx, slabId: number) {
  return (await tx.select({ key: slabPhotos.fileKey }).from(slabPhotos).where(eq(slabPhotos.slabId, slabId))).map((r) => r.key);
}

export async function deleteSlabRow(tx: Tx, id: number) {
  await tx.delete(slabs).where(eq(slabs.id, id));
}
