import type { Db } from '../../db/client';
import { AppError, notFound, validationError } from '../../lib/errors';
import type { SessionUser } from '../../lib/session';
import { recordAudit } from '../../lib/audit';
import {
  createLogSchema, logCodeYear, logDateProblems, logFitsSlabs, nextLogCodeIn, updateLogSchema,
  type FieldProblems, type LogDetail, type LogSummary, type NextLogCode,
} from '../../../shared/logs';
import { millDay } from '../pickups/slot-calendar';
import * as repo from './logs.repo';
import { readMillSettings } from '../pricing/pricing.repo';

type LogRow = NonNullable<Awaited<ReturnType<typeof repo.findLog>>>;

const toSummary = ({ log, speciesSlug, speciesName, slabCount }: LogRow): LogSummary => ({
  id: log.id, code: log.code, species: { slug: speciesSlug, name: speciesName }, originNote: log.originNote,
  felledOn: log.felledOn, milledOn: log.milledOn, lengthIn: log.lengthIn, buttDiameterIn: log.buttDiameterIn,
  topDiameterIn: log.topDiameterIn, sawingMethod: log.sawingMethod as LogSummary['sawingMethod'], notes: log.notes,
  createdAt: log.createdAt.toISOString(), slabCount: Number(slabCount),
});

export function parseLogId(raw: string): number {
  const id = Number(raw);
  if (!Number.isInteger(id) || id <= 0 || id > 2_147_483_647) throw notFound('That log');
  return id;
}

export async function listLogs(db: Db): Promise<LogSummary[]> {
  return (await repo.findLogs(db)).map(toSummary);
}

export async function getLog(db: Db, id: number): Promise<LogDetail> {
  const row = await repo.findLog(db, id);
  if (!row) throw notFound('That log');
  const [slabs, settings] = await Promise.all([repo.findLogSlabs(db, id), readMillSettings(db)]);
  return { ...toSummary(row), targetMcPercent: settings?.targetMcPercent ?? 8, slabs: slabs.map((s) => ({ ...s, status: s.status as LogDetail['slabs'][number]['status'] })) };
}

/**
 * The code a new log gets when none is typed: the next in its felling year's series (this year at
 * the mill when the felling date is unknown). The log form's preview and createLog both ask this.
 */
export async function nextLogCode(db: Db, felledOn: string | null | undefined, now = new Date()): Promise<NextLogCode> {
  const millToday = millDay(now);
  const year = logCodeYear(felledOn, millToday);
  return { code: nextLogCodeIn(year, await repo.codesWithPrefix(db, `L-${year}-`)), millToday };
}

const refuse = (problems: FieldProblems) => {
  if (Object.keys(problems).length) throw validationError(problems);
};

async function speciesIdFor(db: Db, slug: string) {
  const sp = await repo.findSpeciesBySlug(db, slug);
  if (!sp) throw validationError({ speciesSlug: ['This species is not in the mill’s list'] });
  return sp.id;
}

const codeTaken = (code: string) =>
  new AppError(409, 'conflict', `Log code ${code} is already used.`, { code: [`${code} is already used by another log`] });

export async function createLog(db: Db, raw: unknown, actor: SessionUser, now = new Date()): Promise<LogDetail> {
  const input = createLogSchema.parse(raw);
  refuse(logDateProblems(input, millDay(now)));
  const speciesId = await speciesIdFor(db, input.speciesSlug);
  if (input.code && (await repo.logCodeTaken(db, input.code))) throw codeTaken(input.code);
  const { speciesSlug: _s, ...rest } = input;
  // Two staff recording logs at once may pick the same generated code: the unique key decides, we retry.
  for (let attempt = 0; ; attempt++) {
    const code = input.code ?? (await nextLogCode(db, input.felledOn, now)).code;
    try {
      const row = await db.transaction(async (tx) => {
        const inserted = await repo.insertLog(tx, {
          ...rest, code, speciesId, originNote: rest.originNote ?? '', notes: rest.notes ?? '',
          felledOn: rest.felledOn ?? null, milledOn: rest.milledOn ?? null,
        });
        await recordAudit(tx, { actor, action: 'log.create', entityType: 'log', entityId: inserted.id, before: null, after: { code: inserted.code, speciesSlug: input.speciesSlug } });
        return inserted;
      });
      return getLog(db, row.id);
    } catch (err) {
      if (!repo.isUniqueViolation(err)) throw err;
      if (input.code || attempt >= 4) throw codeTaken(code);
    }
  }
}

export async function updateLog(db: Db, id: number, raw: unknown, actor: SessionUser | null = null, now = new Date()): Promise<LogDetail> {
  const input = updateLogSchema.parse(raw);
  refuse(logDateProblems(input, millDay(now)));
  const existing = await repo.findLog(db, id);
  if (!existing) throw notFound('That log');
  // The slabs already recorded from this log must still fit it.
  refuse(logFitsSlabs(input, await repo.slabExtremes(db, id)));
  // Check the diameters and dates against the stored values too, not only against each other.
  const merged = { ...existing.log, ...input };
  if (merged.topDiameterIn > merged.buttDiameterIn) {
    throw validationError({ topDiameterIn: ['The top (small end) cannot be wider than the butt'] });
  }
  if (merged.felledOn && merged.milledOn && merged.milledOn < merged.felledOn) {
    throw validationError({ milledOn: ['A log cannot be milled before it was felled'] });
  }
  const { speciesSlug, ...rest } = input;
  const values: Parameters<typeof repo.updateLog>[2] = { ...rest };
  if (speciesSlug && speciesSlug !== existing.speciesSlug) {
    // Slabs copy their species (and price rate) from the log when recorded; a silent change would split them.
    if (Number(existing.slabCount) > 0) {
      throw new AppError(409, 'conflict', 'This log already has slabs, so its species cannot change here.', { speciesSlug: ['The log already has slabs'] });
    }
    values.speciesId = await speciesIdFor(db, speciesSlug);
  }
  if (input.code && input.code !== existing.log.code) {
    const other = await repo.logCodeTaken(db, input.code);
    if (other && other !== id) throw codeTaken(input.code);
  }
  if (Object.keys(values).length) {
    await db.transaction(async (tx) => {
      await repo.updateLog(tx, id, values);
      const changed = Object.keys(input).filter((k) => (input as Record<string, unknown>)[k] !== (existing.log as Record<string, unknown>)[k]);
      await recordAudit(tx, { actor, action: 'log.update', entityType: 'log', entityId: id, before: null, after: { fields: changed } });
    });
  }
  return getLog(db, id);
}

/** A log recorded by mistake can go while no slab has been recorded from it; the audit log keeps it. */
export async function deleteLog(db: Db, actor: SessionUser, id: number) {
  return db.transaction(async (tx) => {
    const row = await repo.findLog(tx, id);
    if (!row) throw notFound('That log');
    const n = Number(row.slabCount);
    if (n > 0) {
      throw new AppError(409, 'not_deletable',
        `Log ${row.log.code} cannot be deleted: ${n === 1 ? 'a slab was' : `${n} slabs were`} recorded from it. Delete ${n === 1 ? 'that slab' : 'those slabs'} first (only slabs never put on sale can be deleted).`);
    }
    await repo.deleteLogRow(tx, id);
    await recordAudit(tx, {
      actor, action: 'log.delete', entityType: 'log', entityId: id, after: null,
      before: { code: row.log.code, species: row.speciesSlug, lengthIn: row.log.lengthIn, felledOn: row.log.felledOn, milledOn: row.log.milledOn },
    });
    return { deleted: row.log.code };
  });
}
