import { and, asc, desc, eq, gte, inArray, lte, ne, or, sql, ilike, type SQL } from 'drizzle-orm';
import type { Tx } from '../../db/client';
import { logs, moistureReadings, slabPhotos, slabs, species } from '../../db/schema/index';
import { shownPriceCents } from '../pricing/sold-price';
import { vouchedFor } from '../readings/reading-visibility';
import { AVAILABILITY, type SlabListQuery, type SlabStatus } from '../../../shared/slabs';

const latestMoisture = sql<number | null>`(
  select ${moistureReadings.mcPercent} from ${moistureReadings}
  where ${moistureReadings.slabId} = ${slabs.id} and ${vouchedFor}
  order by ${moistureReadings.measuredOn} desc, ${moistureReadings.id} desc limit 1)`;

const coverKey = sql<string | null>`(
  select ${slabPhotos.fileKey} from ${slabPhotos}
  where ${slabPhotos.slabId} = ${slabs.id}
  order by ${slabPhotos.isCover} desc, ${slabPhotos.position} asc, ${slabPhotos.id} asc limit 1)`;

function whereFor(q: SlabListQuery): SQL | undefined {
  const statuses: readonly SlabStatus[] = AVAILABILITY[q.availability];
  const parts: (SQL | undefined)[] = [inArray(slabs.status, [...statuses])];
  if (q.species) parts.push(eq(species.slug, q.species));
  if (q.minThicknessIn !== undefined) parts.push(gte(slabs.thicknessIn, q.minThicknessIn));
  if (q.maxThicknessIn !== undefined) parts.push(lte(slabs.thicknessIn, q.maxThicknessIn));
  if (q.minLengthIn !== undefined) parts.push(gte(slabs.lengthIn, q.minLengthIn));
  if (q.minWidthIn !== undefined) parts.push(gte(slabs.widthIn, q.minWidthIn));
  if (q.maxPriceCents !== undefined) parts.push(lte(slabs.priceCents, q.maxPriceCents));
  if (q.liveEdge === 'yes') parts.push(ne(slabs.liveEdge, 'none'));
  else if (q.liveEdge && q.liveEdge !== 'any') parts.push(eq(slabs.liveEdge, q.liveEdge));
  if (q.dryingState) parts.push(eq(slabs.dryingState, q.dryingState));
  if (q.logId) parts.push(eq(slabs.logId, q.logId));
  if (q.q) {
    const like = `%${q.q.replace(/[%_\\]/g, (c) => `\\${c}`)}%`;
    parts.push(or(ilike(slabs.code, like), ilike(species.name, like), ilike(slabs.figureNotes, like)));
  }
  return and(...parts);
}

const orderFor = (sort: SlabListQuery['sort']) => {
  switch (sort) {
    case 'price-asc': return [asc(slabs.priceCents), asc(slabs.id)];
    case 'price-desc': return [desc(slabs.priceCents), asc(slabs.id)];
    case 'board-feet-asc': return [asc(slabs.boardFeet), asc(slabs.id)];
    case 'board-feet-desc': return [desc(slabs.boardFeet), asc(slabs.id)];
    default: return [desc(slabs.createdAt), desc(slabs.id)];
  }
};

/** The columns a catalogue card needs. */
const listColumns = {
  id: slabs.id, code: slabs.code, speciesSlug: species.slug, speciesName: species.name,
  thicknessIn: slabs.thicknessIn, widthIn: slabs.widthIn, lengthIn: slabs.lengthIn,
  boardFeet: slabs.boardFeet, priceCents: shownPriceCents, status: slabs.status,
  dryingState: slabs.dryingState, liveEdge: slabs.liveEdge, figures: slabs.figures,
  logId: slabs.logId, sequenceInLog: slabs.sequenceInLog,
  moisturePercent: latestMoisture, coverKey,
};
export type SlabListRow = Awaited<ReturnType<typeof findListRowsByIds>>[number];

/** Catalogue cards for the given slabs (any status; callers decide what may be shown). */
export function findListRowsByIds(db: Tx, ids: number[]) {
  if (!ids.length) return Promise.resolve([]);
  return db.select(listColumns).from(slabs).innerJoin(species, eq(species.id, slabs.speciesId)).where(inArray(slabs.id, ids));
}

export async function findSlabPage(db: Tx, q: SlabListQuery) {
  const where = whereFor(q);
  const rows = await db
    .select({
      ...listColumns,
      // The total rides along with the page (one query instead of two).
      total: sql<number>`(count(*) over ())::int`,
    })
    .from(slabs)
    .innerJoin(species, eq(species.id, slabs.speciesId))
    .where(where)
    .orderBy(...orderFor(q.sort))
    .limit(q.pageSize)
    .offset((q.page - 1) * q.pageSize);
  if (rows.length > 0 || q.page === 1) return { rows, total: rows[0]?.total ?? 0 };
  // Past the last page there is no row to carry the total: count on its own.
  const [{ count }] = await db
    .select({ count: sql<number>`count(*)::int` })
    .from(slabs)
    .innerJoin(species, eq(species.id, slabs.speciesId))
    .where(where);
  return { rows, total: count };
}

export async function findSlabWithLog(db: Tx, id: number) {
  const [row] = await db
    .select({ slab: slabs, species, log: logs })
    .from(slabs)
    .innerJoin(species, eq(species.id, slabs.speciesId))
    .innerJoin(logs, eq(logs.id, slabs.logId))
    .where(eq(slabs.id, id));
  return row ?? null;
}

export function findPhotos(db: Tx, slabId: number) {
  return db.select().from(slabPhotos).where(eq(slabPhotos.slabId, slabId))
    .orderBy(desc(slabPhotos.isCover), asc(slabPhotos.position), asc(slabPhotos.id));
}

export function findReadings(db: Tx, slabId: number) {
  return db.select().from(moistureReadings).where(and(eq(moistureReadings.slabId, slabId), vouchedFor))
    .orderBy(asc(moistureReadings.measuredOn), asc(moistureReadings.id));
}

export function findLogSequence(db: Tx, logId: number) {
  return db
    .select({ id: slabs.id, code: slabs.code, sequenceInLog: slabs.sequenceInLog, status: slabs.status,
      thicknessIn: slabs.thicknessIn, widthIn: slabs.widthIn, lengthIn: slabs.lengthIn, priceCents: shownPriceCents, coverKey })
    .from(slabs)
    .where(eq(slabs.logId, logId))
    .orderBy(asc(slabs.sequenceInLog));
}

export const distinctSpeciesInStock = (db: Tx) =>
  db.select({ slug: species.slug, name: species.name, ratePerBoardFootCents: species.ratePerBoardFootCents })
    .from(species).orderBy(asc(species.name));
