import type { Db, Tx } from '../../db/client';
import { AppError, notFound, validationError } from '../../lib/errors';
import { recordAudit } from '../../lib/audit';
import type { SessionUser } from '../../lib/session';
import {
  airDryReadyDate, dryingStateFor, equilibriumMoistureContent, maxMoistureContentPercent, WoodMathError, type DryingState,
} from '../../../shared/wood/index';
import {
  batchReadingsSchema, createReadingSchema, READING_JUMP_CODE, readingJump, type CreateReading, type MeterKind,
  type ReadingReview, type ReadingSaved, type ReadingView, type SlabReadings,
} from '../../../shared/readings';
import * as repo from './readings.repo';
import { forecastAirDry } from '../slabs/drying-forecast';

type Actor = Pick<SessionUser, 'id' | 'email'>;
const round1 = (n: number) => Math.round(n * 10) / 10;

export function parseId(raw: string, what: string): number {
  const id = Number(raw);
  if (!Number.isInteger(id) || id <= 0 || id > 2_147_483_647) throw notFound(what);
  return id;
}

export const toView = (r: repo.ReadingRow): ReadingView => ({
  id: r.id, slabId: r.slabId, measuredOn: r.measuredOn, mcPercent: r.mcPercent, meterKind: r.meterKind as MeterKind,
  location: r.location, depthIn: r.depthIn, ambientTempF: r.ambientTempF, ambientRhPercent: r.ambientRhPercent,
  recordedBy: r.recordedBy, createdAt: r.createdAt.toISOString(), review: r.review as ReadingReview,
});

/** EMC of the air at the reading; null when the fit's published range does not cover the weather. */
function emcFor(input: CreateReading): number | null {
  if (input.ambientTempF === undefined || input.ambientRhPercent === undefined) return null;
  try {
    return round1(equilibriumMoistureContent({ temperatureF: input.ambientTempF, relativeHumidityPercent: input.ambientRhPercent }));
  } catch (e) {
    if (e instanceof WoodMathError) return null;
    throw e;
  }
}

/**
 * The slab's drying state follows its latest reading by date, so a back-dated reading is kept
 * in the history without overriding a newer one. Audited because buyers see the drying state.
 */
async function refreshDryingState(tx: Tx, actor: Actor, slab: { id: number; dryingState: string }, targetMcPercent: number) {
  const latest = await repo.latestReading(tx, slab.id);
  if (!latest) return slab.dryingState;
  const next: DryingState = dryingStateFor({ mcPercent: latest.mcPercent, targetMcPercent });
  if (next !== slab.dryingState) {
    await repo.setDryingState(tx, slab.id, next);
    await recordAudit(tx, {
      actor, action: 'slab.drying-state', entityType: 'slab', entityId: slab.id,
      before: { dryingState: slab.dryingState }, after: { dryingState: next, fromReadingId: latest.id, mcPercent: latest.mcPercent },
    });
  }
  return next;
}

/** Field errors keyed like the request: "mcPercent" for one reading, "readings.2.mcPercent" in a round. */
type Problems = { invalid: Record<string, string[]>; jumps: Record<string, string[]> };
const fieldKey = (row: number | null, field: string) => (row === null ? field : `readings.${row}.${field}`);

/**
 * What the meter and the species allow, and whether the reading jumps from the slab's previous one.
 * An oven-dry result above the species' maximum moisture content (every cell cavity full of water,
 * Wood Handbook FPL-GTR-190 ch. 4) cannot be real, so it is refused; a jump only needs confirming.
 */
async function reviewReading(tx: Tx, slabId: number, input: CreateReading, row: number | null, problems: Problems): Promise<ReadingReview> {
  if (input.meterKind === 'oven-dry') {
    const sp = await repo.speciesOfSlab(tx, slabId);
    const max = sp ? Math.floor(maxMoistureContentPercent(sp.basicSpecificGravity)) : null;
    if (sp && max !== null && input.mcPercent > max) {
      problems.invalid[fieldKey(row, 'mcPercent')] = [`${sp.name} can hold at most about ${max} % water even when every cell is full — check the weighing`];
      return 'in-line';
    }
  }
  const jump = readingJump(await repo.readingBefore(tx, slabId, input.measuredOn), input);
  if (!jump) return 'in-line';
  if (!input.confirmed) problems.jumps[fieldKey(row, 'mcPercent')] = [jump];
  return 'confirmed';
}

function throwProblems({ invalid, jumps }: Problems) {
  if (Object.keys(invalid).length) throw validationError(invalid, 'Some readings are not possible. Nothing was saved.');
  if (Object.keys(jumps).length) {
    throw new AppError(409, READING_JUMP_CODE, 'A reading jumps a long way from the slab\'s previous one. Check it, then confirm to save.', jumps);
  }
}

async function saveOne(tx: Tx, actor: Actor, slabId: number, input: CreateReading, targetMcPercent: number, row: number | null, problems: Problems): Promise<ReadingSaved> {
  const slab = await repo.lockSlab(tx, slabId);
  if (!slab) throw notFound('That slab');
  const review = await reviewReading(tx, slabId, input, row, problems);
  const row_ = await repo.insertReading(tx, {
    slabId, measuredOn: input.measuredOn, mcPercent: input.mcPercent, meterKind: input.meterKind, location: input.location,
    depthIn: input.depthIn ?? null, ambientTempF: input.ambientTempF ?? null, ambientRhPercent: input.ambientRhPercent ?? null,
    recordedBy: actor.id, review,
  });
  await recordAudit(tx, { actor, action: 'moisture-reading.create', entityType: 'slab', entityId: slab.id, before: null, after: toView(row_) });
  const dryingState = (await refreshDryingState(tx, actor, slab, targetMcPercent)) as DryingState;
  return {
    reading: toView(row_), slab: { id: slab.id, code: slab.code, dryingState, previousDryingState: slab.dryingState },
    targetMcPercent, emcPercent: emcFor(input),
  };
}

export async function addReading(db: Db, actor: Actor, slabId: number, body: unknown): Promise<ReadingSaved> {
  const input = createReadingSchema.parse(body);
  return db.transaction(async (tx) => {
    const problems: Problems = { invalid: {}, jumps: {} };
    const saved = await saveOne(tx, actor, slabId, input, await repo.readTargetMcPercent(tx), null, problems);
    throwProblems(problems); // rolls the insert back
    return saved;
  });
}

/** Several slabs at once from the yard: every row is saved, or none is. */
export async function addBatch(db: Db, actor: Actor, body: unknown): Promise<{ items: ReadingSaved[] }> {
  const { readings } = batchReadingsSchema.parse(body);
  return db.transaction(async (tx) => {
    const [byId, byCode] = await Promise.all([
      repo.findSlabsByIds(tx, [...new Set(readings.flatMap((r) => (r.slabId !== undefined ? [r.slabId] : [])))]),
      repo.findSlabsByCodes(tx, [...new Set(readings.flatMap((r) => (r.slabId === undefined && r.slabCode ? [r.slabCode] : [])))]),
    ]);
    const ids = new Set(byId.map((s) => s.id));
    const codes = new Map(byCode.map((s) => [s.code, s.id]));
    const fieldErrors: Record<string, string[]> = {};
    const resolved = readings.map((r, i) => {
      if (r.slabId !== undefined) {
        if (!ids.has(r.slabId)) fieldErrors[`readings.${i}.slabId`] = ['No slab has this id'];
        return r.slabId;
      }
      const id = codes.get(r.slabCode!);
      if (id === undefined) fieldErrors[`readings.${i}.slabCode`] = [`No slab has the code ${r.slabCode}`];
      return id ?? 0;
    });
    if (Object.keys(fieldErrors).length) throw validationError(fieldErrors, 'Some rows name a slab we do not have. Nothing was saved.');
    const target = await repo.readTargetMcPercent(tx);
    const items: ReadingSaved[] = [];
    const problems: Problems = { invalid: {}, jumps: {} };
    // One at a time: rows for the same slab must see each other (jump check, drying state). Every row is
    // checked before anything is refused, so the person sees all rows that need a look at once.
    for (const [i, r] of readings.entries()) items.push(await saveOne(tx, actor, resolved[i], r, target, i, problems));
    throwProblems(problems); // rolls every row back
    return { items };
  });
}

export async function listForSlab(db: Db, slabId: number): Promise<SlabReadings> {
  const slab = await repo.findSlabWithMilling(db, slabId);
  if (!slab) throw notFound('That slab');
  const [rows, targetMcPercent] = await Promise.all([repo.listReadings(db, slabId), repo.readTargetMcPercent(db)]);
  const airDryReadyOn = slab.milledOn ? airDryReadyDate({ milledOn: slab.milledOn, thicknessIn: slab.thicknessIn }).toISOString().slice(0, 10) : null;
  const vouched = rows.filter((r) => r.review !== 'unconfirmed');
  const dryingForecast = forecastAirDry({ readings: vouched, thicknessIn: slab.thicknessIn, milledOn: slab.milledOn });
  return { slab, items: rows.map(toView), targetMcPercent, airDryReadyOn, dryingForecast };
}

export async function removeReading(db: Db, actor: Actor, id: number) {
  return db.transaction(async (tx) => {
    const reading = await repo.findReading(tx, id);
    if (!reading) throw notFound('That reading');
    const slab = await repo.lockSlab(tx, reading.slabId);
    if (!slab) throw new AppError(409, 'conflict', 'The slab of this reading is gone.');
    await repo.deleteReading(tx, id, reading.slabId);
    await recordAudit(tx, { actor, action: 'moisture-reading.delete', entityType: 'moisture-reading', entityId: id, before: toView(reading), after: null });
    const dryingState = await refreshDryingState(tx, actor, slab, await repo.readTargetMcPercent(tx));
    return { slab: { id: slab.id, code: slab.code, dryingState } };
  });
}
