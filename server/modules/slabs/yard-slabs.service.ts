import type { Db, Tx } from '../../db/client';
import { AppError, notFound, validationError } from '../../lib/errors';
import { recordAudit } from '../../lib/audit';
import type { SessionUser } from '../../lib/session';
import { dryingStateFor, roundBoardFeet } from '../../../shared/wood/index';
import { createSlabSchema, defectsOffTheSlab, updateSlabSchema, type YardSlabDetail, type YardSlabRow } from '../../../shared/slab-input';
import { isSold, type SlabStatus } from '../../../shared/slabs';
import { loadPricingRules } from '../pricing/pricing.service';
import { readMillSettings } from '../pricing/pricing.repo';
import { isUniqueViolation } from '../logs/logs.repo';
import { derivedSlabColumns } from './slab-derived';
import { assertDryEnoughOrConfirmed, assertPublishable, assertStaffMove } from './yard-slabs.workflow';
import * as repo from './yard-slabs.repo';
import { forecastAirDry } from './drying-forecast';
import { moveEverySlab, startingStatus } from './slab-state';
import { slabFitsLog } from '../../../shared/logs';

/** A slab cannot be wider than its log's butt (plus flare) or longer than the log: refused at the field. */
function assertFitsLog(slab: { widthsIn?: number[]; lengthIn?: number }, log: Parameters<typeof slabFitsLog>[1]) {
  const problems = slabFitsLog(slab, log);
  if (Object.keys(problems).length) throw validationError(problems);
}

type Row = NonNullable<Awaited<ReturnType<typeof repo.findYardRow>>>;

export function toYardRow({ slab, speciesSlug, speciesName, logCode, moisturePercent, lastReadingOn, photoCount }: Row): YardSlabRow {
  return {
    id: slab.id, code: slab.code, species: { slug: speciesSlug, name: speciesName }, logId: slab.logId, logCode,
    sequenceInLog: slab.sequenceInLog, status: slab.status as SlabStatus, dryingState: slab.dryingState,
    thicknessIn: slab.thicknessIn, widthIn: Math.round(slab.widthIn * 100) / 100, widthsIn: slab.widthsIn, lengthIn: slab.lengthIn,
    boardFeet: roundBoardFeet(slab.boardFeet), priceCents: slab.priceCents, priceOverrideCents: slab.priceOverrideCents,
    yardStack: slab.yardStack, yardPosition: slab.yardPosition, liveEdge: slab.liveEdge, figures: slab.figures,
    moisturePercent: moisturePercent === null ? null : Number(moisturePercent), lastReadingOn, photoCount: Number(photoCount),
    createdAt: slab.createdAt.toISOString(), updatedAt: slab.updatedAt.toISOString(), listedAt: slab.listedAt?.toISOString() ?? null,
    airDry: null,
  };
}

/** Yard rows with their air-dry forecasts, from each slab's own readings. */
export async function withForecasts(db: Tx, rows: Row[]): Promise<YardSlabRow[]> {
  const readings = await repo.readingsForSlabs(db, rows.map((r) => r.slab.id));
  const bySlab = new Map<number, { measuredOn: string; mcPercent: number }[]>();
  for (const r of readings) bySlab.set(r.slabId, [...(bySlab.get(r.slabId) ?? []), r]);
  return rows.map((row) => {
    const f = forecastAirDry({ readings: bySlab.get(row.slab.id) ?? [], thicknessIn: row.slab.thicknessIn, milledOn: row.milledOn });
    return { ...toYardRow(row), airDry: { expectedOn: f.expectedOn, earliestOn: f.earliestOn, latestOn: f.latestOn, basis: f.basis, method: f.method } };
  });
}

export async function getYardSlab(db: Tx, id: number): Promise<YardSlabDetail> {
  const row = await repo.findYardRow(db, id);
  if (!row) throw notFound('That slab');
  const [withForecast] = await withForecasts(db, [row]);
  return {
    ...withForecast, figureNotes: row.slab.figureNotes, defects: row.slab.defects as YardSlabDetail['defects'],
    description: row.slab.description, priceOverrideReason: row.slab.priceOverrideReason, speciesRatePerBoardFootCents: row.rate,
  };
}

async function assertFiguresExist(tx: Tx, figures: string[] | undefined) {
  if (!figures?.length) return;
  const known = await repo.existingFigureSlugs(tx, figures);
  const unknown = figures.filter((f) => !known.includes(f));
  if (unknown.length) throw validationError({ figures: [`Unknown figure: ${unknown.join(', ')}. Add it to the figure list first.`] });
}

const sequenceTaken = (seq: number, code: string) =>
  new AppError(409, 'conflict', `Sequence ${seq} in this log is already slab ${code}.`, { sequenceInLog: [`Already used by slab ${code}`] });

/** Slab codes follow the log: L-2026-07-03. A renumbered neighbour may hold the plain code, so add a letter. */
async function freeSlabCode(tx: Tx, logCode: string, seq: number) {
  const base = `${logCode}-${String(seq).padStart(2, '0')}`;
  for (const suffix of ['', ...'BCDEFGHJK']) {
    const code = suffix ? `${base}${suffix}` : base;
    if (!(await repo.codeTaken(tx, code))) return code;
  }
  return `${base}-${Date.now().toString(36).toUpperCase()}`;
}

async function dryingStateOf(tx: Tx, slabId: number | null) {
  const reading = slabId ? await repo.latestReadingOf(tx, slabId) : null;
  if (!reading) return 'green';
  const settings = await readMillSettings(tx);
  return dryingStateFor({ mcPercent: reading.mcPercent, targetMcPercent: settings?.targetMcPercent ?? 8 });
}

const money = (s: { priceCents: number; priceOverrideCents: number | null; priceOverrideReason: string | null }) =>
  ({ priceCents: s.priceCents, priceOverrideCents: s.priceOverrideCents, priceOverrideReason: s.priceOverrideReason });

export async function createSlab(db: Db, raw: unknown, actor: SessionUser): Promise<YardSlabDetail> {
  const input = createSlabSchema.parse(raw);
  const id = await db.transaction(async (tx) => {
    const found = await repo.findLogWithRate(tx, input.logId);
    if (!found) throw validationError({ logId: ['No log with this id. Record the log first.'] });
    await assertFiguresExist(tx, input.figures);
    const offSlab = defectsOffTheSlab(input.defects, input.lengthIn);
    if (Object.keys(offSlab).length) throw validationError(offSlab);
    const seq = input.sequenceInLog ?? (await repo.nextSequence(tx, input.logId));
    const owner = await repo.sequenceOwner(tx, input.logId, seq);
    if (owner) throw sequenceTaken(seq, owner.code);
    const overrideCents = input.priceOverrideCents ?? null;
    const overrideReason = overrideCents === null ? null : input.priceOverrideReason?.trim() ?? null;
    const measures = { thicknessIn: input.thicknessIn, widthsIn: input.widthsIn, lengthIn: input.lengthIn, figures: input.figures ?? [] };
    assertFitsLog(measures, found.log);
    const derived = derivedSlabColumns({ ...measures, priceOverrideCents: overrideCents, priceOverrideReason: overrideReason }, found.rate, await loadPricingRules(tx));
    const row = await repo.insertSlab(tx, {
      ...measures, ...derived, code: await freeSlabCode(tx, found.log.code, seq), logId: found.log.id,
      speciesId: found.log.speciesId, sequenceInLog: seq, liveEdge: input.liveEdge ?? 'none',
      figureNotes: input.figureNotes ?? '', defects: input.defects ?? [], yardStack: input.yardStack ?? '',
      yardPosition: input.yardPosition ?? '', description: input.description ?? '',
      priceOverrideCents: overrideCents, priceOverrideReason: overrideReason,
      status: startingStatus(input.status), dryingState: await dryingStateOf(tx, null),
    });
    await recordAudit(tx, { actor, action: 'slab.create', entityType: 'slab', entityId: row.id, before: null, after: { status: row.status, ...money(row) } });
    return row.id;
  }).catch(rethrowSequenceClash);
  return getYardSlab(db, id);
}

function rethrowSequenceClash(err: unknown): never {
  if (isUniqueViolation(err, 'slabs_log_sequence_uq')) {
    throw new AppError(409, 'conflict', 'That sequence number in this log was just taken.', { sequenceInLog: ['Already used in this log'] });
  }
  throw err;
}

export async function updateSlab(db: Db, id: number, raw: unknown, actor: SessionUser): Promise<YardSlabDetail> {
  const input = updateSlabSchema.parse(raw);
  await db.transaction(async (tx) => {
    const slab = await repo.lockSlab(tx, id);
    if (!slab) throw notFound('That slab');
    const from = slab.status as SlabStatus;
    const to = input.status ?? from;
    assertStaffMove(from, to);
    let confirmedWetMc: number | null = null;
    if (to === 'listed' && from !== 'listed') {
      await assertPublishable(tx, id);
      confirmedWetMc = await assertDryEnoughOrConfirmed(tx, id, input.confirmAboveTargetMc === true);
    }
    await assertFiguresExist(tx, input.figures);
    const offSlab = defectsOffTheSlab(input.defects ?? slab.defects, input.lengthIn ?? slab.lengthIn);
    if (Object.keys(offSlab).length) throw validationError(offSlab);
    if (input.sequenceInLog !== undefined && input.sequenceInLog !== slab.sequenceInLog) {
      const owner = await repo.sequenceOwner(tx, slab.logId, input.sequenceInLog, id);
      if (owner) throw sequenceTaken(input.sequenceInLog, owner.code);
    }
    const overrideCents = input.priceOverrideCents !== undefined ? input.priceOverrideCents : slab.priceOverrideCents;
    const overrideReason = overrideCents === null ? null : (input.priceOverrideReason !== undefined ? input.priceOverrideReason : slab.priceOverrideReason)?.trim() || null;
    if (overrideCents !== null && !overrideReason) throw validationError({ priceOverrideReason: ['Say why the price is set by hand'] });
    const measures = {
      thicknessIn: input.thicknessIn ?? slab.thicknessIn, widthsIn: input.widthsIn ?? slab.widthsIn,
      lengthIn: input.lengthIn ?? slab.lengthIn, figures: input.figures ?? slab.figures,
    };
    if (input.widthsIn !== undefined || input.lengthIn !== undefined) {
      const found = await repo.findLogWithRate(tx, slab.logId);
      if (found) assertFitsLog({ widthsIn: input.widthsIn, lengthIn: input.lengthIn }, found.log);
    }
    const worked = derivedSlabColumns({ ...measures, priceOverrideCents: overrideCents, priceOverrideReason: overrideReason }, await repo.speciesRate(tx, slab.speciesId), await loadPricingRules(tx));
    // A sold slab keeps the price it sold at, whatever is corrected on its record afterwards.
    const derived = isSold(from) ? { ...worked, priceCents: slab.priceCents } : worked;
    const { status: _s, priceOverrideCents: _c, priceOverrideReason: _r, confirmAboveTargetMc: _w, ...rest } = input;
    const after = await repo.updateSlab(tx, id, {
      ...rest, ...measures, ...derived, priceOverrideCents: overrideCents, priceOverrideReason: overrideReason,
      dryingState: await dryingStateOf(tx, id),
    });
    if (from !== to) {
      await moveEverySlab(tx, [id], to, 'yard');
      await recordAudit(tx, {
        actor, action: 'slab.status', entityType: 'slab', entityId: id, before: { status: from },
        after: { status: to, ...(confirmedWetMc !== null ? { listedAboveTargetMcPercent: confirmedWetMc } : {}) },
      });
    }
    if (after.priceCents !== slab.priceCents || after.priceOverrideCents !== slab.priceOverrideCents || after.priceOverrideReason !== slab.priceOverrideReason) {
      await recordAudit(tx, { actor, action: 'slab.price', entityType: 'slab', entityId: id, before: money(slab), after: money(after) });
    }
  }).catch(rethrowSequenceClash);
  return getYardSlab(db, id);
}
