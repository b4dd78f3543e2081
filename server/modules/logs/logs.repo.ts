import { asc, desc, eq, like, sql } from 'drizzle-orm';
import { yardPriceCents } from '../pricing/sold-price';
import type { Tx } from '../../db/client';
import { logs, slabs, species } from '../../db/schema/index';

const slabCount = sql<number>`(select count(*)::int from ${slabs} where ${slabs.logId} = ${logs.id})`;

const logColumns = { log: logs, speciesSlug: species.slug, speciesName: species.name, slabCount };

export function findLogs(db: Tx) {
  return db.select(logColumns).from(logs).innerJoin(species, eq(species.id, logs.speciesId))
    .orderBy(desc(logs.createdAt), desc(logs.id));
}

export async function findLog(db: Tx, id: number) {
  const [row] = await db.select(logColumns).from(logs).innerJoin(species, eq(species.id, logs.speciesId)).where(eq(logs.id, id));
  return row ?? null;
}

export function findLogSlabs(db: Tx, logId: number) {
  return db.select({
    id: slabs.id, code: slabs.code, sequenceInLog: slabs.sequenceInLog, status: slabs.status, thicknessIn: slabs.thicknessIn,
    widthIn: slabs.widthIn, lengthIn: slabs.lengthIn, boardFeet: slabs.boardFeet, priceCents: yardPriceCents, yardStack: slabs.yardStack,
  }).from(slabs).where(eq(slabs.logId, logId)).orderBy(asc(slabs.sequenceInLog));
}

/** The widest station and the longest slab recorded from a log (nulls when it has none). */
export async function slabExtremes(db: Tx, logId: number) {
  const [row] = await db.select({
    widestIn: sql<number | null>`max((select max(w::float8) from jsonb_array_elements_text(${slabs.widthsIn}) w))`,
    longestIn: sql<number | null>`max(${slabs.lengthIn})`,
  }).from(slabs).where(eq(slabs.logId, logId));
  return { widestIn: row?.widestIn === null || row?.widestIn === undefined ? null : Number(row.widestIn), longestIn: row?.longestIn == null ? null : Number(row.longestIn) };
}

export async function findSpeciesBySlug(db: Tx, slug: string) {
  const [row] = await db.select().from(species).where(eq(species.slug, slug));
  return row ?? null;
}

export async function logCodeTaken(db: Tx, code: string) {
  const [row] = await db.select({ id: logs.id }).from(logs).where(eq(logs.code, code));
  return row?.id ?? null;
}

export async function codesWithPrefix(db: Tx, prefix: string) {
  const rows = await db.select({ code: logs.code }).from(logs).where(like(logs.code, `${prefix}%`));
  return rows.map((r) => r.code);
}

export async function insertLog(db: Tx, values: typeof logs.$inferInsert) {
  const [row] = await db.insert(logs).values(values).returning();
  return row;
}

export async function updateLog(db: Tx, id: number, values: Partial<typeof logs.$inferInsert>) {
  const [row] = await db.update(logs).set(values).where(eq(logs.id, id)).returning();
  return row ?? null;
}

/** A Postgres unique-key clash (23505), whether the driver error arrives bare or wrapped by Drizzle. */
export function isUniqueViolation(err: unknown, constraint?: string): boolean {
  for (let e = err as { code?: string; constraint?: string; cause?: unknown; message?: string } | undefined; e; e = e.cause as typeof e) {
    if (e.code === '23505') return !constraint || e.constraint === constraint || !!e.message?.includes(constraint);
  }
  return false;
}

export async function deleteLogRow(db: Tx, id: number) {
  await db.delete(logs).where(eq(logs.id, id));
}
