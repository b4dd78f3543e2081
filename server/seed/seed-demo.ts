/**
 * First-start demo content: fills an empty database with Varrow Creek Slab
 * Mill's yard (species, logs, slabs with moisture histories and illustration
 * photos, pickup hours, closed days) and its demo accounts.
 */
import { count } from 'drizzle-orm';
import type { Db } from '../db/client';
import {
  closedDays, figureKinds, logs, matchedSetSlabs, matchedSets, millSettings, moistureReadings, pickupWindows, slabPhotos, slabs, species,
} from '../db/schema/index';
import type { Auth } from '../lib/auth';
import { loadPricingRules } from '../modules/pricing/pricing.service';
import { derivedSlabColumns } from '../modules/slabs/slab-derived';
import { SPECIES } from '../../shared/wood/index';
import { buildDemoData, DEMO_FIGURE_KINDS, DEMO_MILL_SETTINGS, DEMO_PICKUP_WINDOWS } from './demo-data';
import { removeIllustrations, writeDemoIllustrations } from './seed-photos';
import { seedDemoUsers } from './seed-users';

export type SeedDemoOptions = { db: Db; auth: Auth; uploadsDir: string; log?: (msg: string) => void; now?: Date };

const CHUNK = 500;

async function insertInChunks<T>(rows: T[], insert: (chunk: T[]) => Promise<unknown>) {
  for (let i = 0; i < rows.length; i += CHUNK) await insert(rows.slice(i, i + CHUNK));
}

export async function seedDemo({ db, auth, uploadsDir, log = () => {}, now = new Date() }: SeedDemoOptions): Promise<{ seeded: boolean }> {
  const [{ n }] = await db.select({ n: count() }).from(species);
  if (n > 0) return { seeded: false };
  const started = performance.now();
  const data = buildDemoData(now);

  // Accounts go first, outside the transaction (the auth library writes them itself), while the
  // illustrations render on sharp's worker threads.
  const [usersResult, photosResult] = await Promise.allSettled([
    seedDemoUsers(db, auth), writeDemoIllustrations(data.slabs, uploadsDir),
  ]);
  if (usersResult.status === 'rejected' || photosResult.status === 'rejected') {
    if (photosResult.status === 'fulfilled') await removeIllustrations(photosResult.value);
    throw usersResult.status === 'rejected' ? usersResult.reason : (photosResult as PromiseRejectedResult).reason;
  }
  const people = usersResult.value;
  const illustrations = photosResult.value;
  const recordedBy = people.seller[0] ?? people.admin[0] ?? null;
  const photoByCode = new Map(illustrations.map((p) => [p.code, p]));

  try {
    await db.transaction(async (tx) => {
      const speciesRows = await tx.insert(species).values(SPECIES.map((s) => ({
        slug: s.slug, name: s.name, botanicalName: s.botanicalName, ratePerBoardFootCents: s.defaultRatePerBoardFootCents,
        radialCoefficient: s.radialCoefficient, tangentialCoefficient: s.tangentialCoefficient,
        basicSpecificGravity: s.basicSpecificGravity, specificGravity12: s.specificGravity12,
      }))).returning({ id: species.id, slug: species.slug, rate: species.ratePerBoardFootCents });
      const speciesBySlug = new Map(speciesRows.map((r) => [r.slug, r]));

      await tx.insert(millSettings).values({ ...DEMO_MILL_SETTINGS, updatedAt: now });
      await tx.insert(figureKinds).values(DEMO_FIGURE_KINDS);
      await tx.insert(pickupWindows).values(DEMO_PICKUP_WINDOWS);
      await tx.insert(closedDays).values(data.closedDays);
      // Prices are computed with the rules exactly as the server reads them back.
      const rules = await loadPricingRules(tx);

      const logRows = await tx.insert(logs).values(data.logs.map(({ speciesSlug, ...l }) => ({
        ...l, speciesId: speciesBySlug.get(speciesSlug)!.id,
      }))).returning({ id: logs.id, code: logs.code });
      const logIdByCode = new Map(logRows.map((r) => [r.code, r.id]));

      const slabRows = await tx.insert(slabs).values(data.slabs.map((s) => {
        const sp = speciesBySlug.get(s.speciesSlug)!;
        const derived = derivedSlabColumns(s, sp.rate, rules);
        return {
          code: s.code, logId: logIdByCode.get(s.logCode)!, speciesId: sp.id, sequenceInLog: s.sequenceInLog,
          thicknessIn: s.thicknessIn, widthsIn: s.widthsIn, lengthIn: s.lengthIn, ...derived,
          liveEdge: s.liveEdge, figures: s.figures, figureNotes: s.figureNotes, defects: s.defects,
          dryingState: s.dryingState, status: s.status, yardStack: s.yardStack, yardPosition: s.yardPosition,
          description: s.description, createdAt: s.createdAt, updatedAt: s.createdAt, listedAt: s.listedAt,
        };
      })).returning({ id: slabs.id, code: slabs.code });
      const slabIdByCode = new Map(slabRows.map((r) => [r.code, r.id]));

      // The demo yard's book-matched pairs, recorded the way the yard marks them.
      for (const s of data.slabs.filter((x) => x.bookMatchedWith)) {
        const [set] = await tx.insert(matchedSets).values({ logId: logIdByCode.get(s.logCode)!, markedBy: recordedBy, createdAt: s.createdAt }).returning();
        await tx.insert(matchedSetSlabs).values([s.bookMatchedWith!, s.code].map((code) => ({ setId: set.id, slabId: slabIdByCode.get(code)! })));
      }

      const readings = data.slabs.flatMap((s) => s.readings.map((r) => ({
        ...r, slabId: slabIdByCode.get(s.code)!, recordedBy,
        createdAt: new Date(`${r.measuredOn}T15:00:00Z`),
      })));
      await insertInChunks(readings, (chunk) => tx.insert(moistureReadings).values(chunk));

      await tx.insert(slabPhotos).values(data.slabs.map((s) => {
        const photo = photoByCode.get(s.code)!;
        return {
          slabId: slabIdByCode.get(s.code)!, fileKey: photo.fileKey, width: photo.width, height: photo.height,
          position: 0, isCover: true, isIllustration: true, altText: `Illustration of slab ${s.code}`, createdAt: s.createdAt,
        };
      }));
    });
  } catch (error) {
    await removeIllustrations(illustrations);
    throw error;
  }
  const readingCount = data.slabs.reduce((total, s) => total + s.readings.length, 0);
  log(`Demo data: ${data.logs.length} logs, ${data.slabs.length} slabs, ${readingCount} moisture readings, `
    + `${illustrations.length} illustrations, ${Object.values(people).flat().length} accounts `
    + `(${Math.round(performance.now() - started)} ms)`);
  return { seeded: true };
}
