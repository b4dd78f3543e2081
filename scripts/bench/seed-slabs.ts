import { sql } from 'drizzle-orm';
import type { Db } from '../../server/db/client';
import { logs, moistureReadings, slabPhotos, slabs, species } from '../../server/db/schema/index';
import { DEFAULT_PRICING_RULES, getSpecies, SPECIES } from '../../shared/wood/index';
import { derivedSlabColumns } from '../../server/modules/slabs/slab-derived';

/** A deterministic stream of numbers in [0, 1) so every run measures the same yard. */
function prng(seed: number) {
  let s = seed >>> 0;
  return () => ((s = (s * 1664525 + 1013904223) >>> 0) / 2 ** 32);
}

/** Writes `count` listed slabs (with a reading and a cover photo row each) across every species. */
export async function seedSlabs(db: Db, count: number) {
  const rand = prng(4242);
  const speciesRows: (typeof species.$inferSelect)[] = [];
  for (const s of SPECIES) {
    const info = getSpecies(s.slug);
    const [row] = await db.insert(species).values({
      slug: s.slug, name: info.name, botanicalName: info.botanicalName, ratePerBoardFootCents: 900 + Math.round(rand() * 1500),
      radialCoefficient: info.radialCoefficient, tangentialCoefficient: info.tangentialCoefficient,
      basicSpecificGravity: info.basicSpecificGravity, specificGravity12: info.specificGravity12,
    }).returning();
    speciesRows.push(row);
  }
  const perLog = 10;
  for (let start = 0; start < count; start += 500) {
    await db.transaction(async (tx) => {
      const batch = Math.min(500, count - start);
      const logRows = await tx.insert(logs).values(Array.from({ length: Math.ceil(batch / perLog) }, (_, i) => {
        const sp = speciesRows[(start / perLog + i) % speciesRows.length];
        return { code: `B-${start / perLog + i}`, speciesId: sp.id, originNote: 'Benchmark log', felledOn: '2022-02-01', milledOn: '2022-03-01',
          lengthIn: 144, buttDiameterIn: 34, topDiameterIn: 28, sawingMethod: 'live-edge-slabbing' };
      })).returning();
      const slabValues = [];
      for (let i = 0; i < batch; i++) {
        const log = logRows[Math.floor(i / perLog)];
        const sp = speciesRows.find((s) => s.id === log.speciesId)!;
        const measures = { thicknessIn: [1.75, 2, 2.5, 3][Math.floor(rand() * 4)], widthsIn: [14 + rand() * 20, 16 + rand() * 20], lengthIn: 60 + Math.round(rand() * 80), figures: [] };
        const derived = derivedSlabColumns({ ...measures }, sp.ratePerBoardFootCents, DEFAULT_PRICING_RULES);
        slabValues.push({ code: `${log.code}-${(i % perLog) + 1}`, logId: log.id, speciesId: log.speciesId, sequenceInLog: (i % perLog) + 1,
          dryingState: 'air-dry', status: rand() < 0.85 ? 'listed' : 'drying', liveEdge: ['none', 'one', 'both'][Math.floor(rand() * 3)],
          ...measures, ...derived });
      }
      const slabRows = await tx.insert(slabs).values(slabValues).returning({ id: slabs.id });
      await tx.insert(moistureReadings).values(slabRows.map((s) => ({ slabId: s.id, measuredOn: '2024-05-01', mcPercent: 8 + rand() * 10, meterKind: 'pin' })));
      await tx.insert(slabPhotos).values(slabRows.map((s) => ({ slabId: s.id, fileKey: `bench${s.id}`, width: 1600, height: 600, isCover: true })));
    });
  }
  await db.execute(sql`analyze`);
}
