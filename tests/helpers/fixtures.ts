import { eq } from 'drizzle-orm';
import type { Db } from '../../server/db/client';
import { logs, matchedSetSlabs, matchedSets, moistureReadings, slabPhotos, slabs, species } from '../../server/db/schema/index';
import { getSpecies } from '../../shared/wood/index';
import { DEFAULT_PRICING_RULES } from '../../shared/wood/index';
import { derivedSlabColumns } from '../../server/modules/slabs/slab-derived';

let seq = 0;

/** Inserts a species row from the shared species data (idempotent per slug). */
export async function speciesRow(db: Db, slug: string, ratePerBoardFootCents = 1200) {
  const [existing] = await db.select().from(species).where(eq(species.slug, slug));
  if (existing) return existing;
  const s = getSpecies(slug);
  const [row] = await db.insert(species).values({
    slug, name: s.name, botanicalName: s.botanicalName, ratePerBoardFootCents,
    radialCoefficient: s.radialCoefficient, tangentialCoefficient: s.tangentialCoefficient,
    basicSpecificGravity: s.basicSpecificGravity, specificGravity12: s.specificGravity12,
  }).returning();
  return row;
}

export async function logRow(db: Db, speciesSlug: string, over: Partial<typeof logs.$inferInsert> = {}) {
  const sp = await speciesRow(db, speciesSlug);
  const [row] = await db.insert(logs).values({
    code: `T-${++seq}`, speciesId: sp.id, originNote: 'Test log', felledOn: '2023-03-01', milledOn: '2023-04-01',
    lengthIn: 120, buttDiameterIn: 30, topDiameterIn: 26, sawingMethod: 'live-edge-slabbing', ...over,
  }).returning();
  return row;
}

type SlabOver = Partial<typeof slabs.$inferInsert> & { widthsIn?: number[]; mc?: number | null; photo?: boolean };

/** Inserts a slab with derived columns from the shared wood math, a reading and (optionally) a photo row. */
export async function slabRow(db: Db, log: typeof logs.$inferSelect, over: SlabOver = {}) {
  const [sp] = await db.select().from(species).where(eq(species.id, log.speciesId));
  const measures = { thicknessIn: over.thicknessIn ?? 2, widthsIn: over.widthsIn ?? [20, 22, 24], lengthIn: over.lengthIn ?? 96, figures: over.figures ?? [] };
  const derived = derivedSlabColumns({ ...measures, priceOverrideCents: over.priceOverrideCents, priceOverrideReason: over.priceOverrideReason }, sp.ratePerBoardFootCents, DEFAULT_PRICING_RULES);
  const existing = await db.select({ id: slabs.id }).from(slabs).where(eq(slabs.logId, log.id));
  const { mc = 9, photo = true, ...cols } = over;
  const [row] = await db.insert(slabs).values({
    code: `${log.code}-${existing.length + 1}`, logId: log.id, speciesId: log.speciesId, sequenceInLog: existing.length + 1,
    dryingState: 'air-dry', status: 'listed', ...measures, ...derived, ...cols,
  }).returning();
  if (mc !== null) {
    await db.insert(moistureReadings).values({ slabId: row.id, measuredOn: new Date().toISOString().slice(0, 10), mcPercent: mc, meterKind: 'pin', location: 'middle' });
  }
  if (photo) await db.insert(slabPhotos).values({ slabId: row.id, fileKey: `test${row.id}x${++seq}`, width: 1200, height: 400, isCover: true });
  return row;
}

/** Marks slabs of one log as a book-matched set, as the yard does on the log page. */
export async function matchedSetRow(db: Db, slabList: Array<typeof slabs.$inferSelect>) {
  const [set] = await db.insert(matchedSets).values({ logId: slabList[0].logId }).returning();
  await db.insert(matchedSetSlabs).values(slabList.map((s) => ({ setId: set.id, slabId: s.id })));
  return set;
}
