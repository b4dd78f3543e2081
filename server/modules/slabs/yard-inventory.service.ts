import type { Db } from '../../db/client';
import { AppError, validationError, zodFieldErrors } from '../../lib/errors';
import { recordAudit } from '../../lib/audit';
import type { SessionUser } from '../../lib/session';
import {
  bulkSlabActionSchema, createFigureKindSchema, yardSlabQuerySchema, type BulkResult, type YardSlabPage, type YardSlabRow,
} from '../../../shared/slab-input';
import { SLAB_STATUSES, type SlabStatus } from '../../../shared/slabs';
import { assertDryEnoughOrConfirmed, assertPublishable, assertStaffMove } from './yard-slabs.workflow';
import { withForecasts } from './yard-slabs.service';
import * as repo from './yard-slabs.repo';
import { moveEverySlab } from './slab-state';

function parseQuery(raw: Record<string, unknown>) {
  const parsed = yardSlabQuerySchema.safeParse(raw);
  if (!parsed.success) throw validationError(zodFieldErrors(parsed.error), 'Some filters are not valid.');
  return parsed.data;
}

export async function listYardSlabs(db: Db, raw: Record<string, unknown>): Promise<YardSlabPage> {
  const q = parseQuery(raw);
  const byForecast = q.sort === 'airDryExpectedOn';
  const [{ rows, total }, counts] = await Promise.all([repo.findYardPage(db, q, { all: byForecast }), repo.statusCounts(db)]);
  const byStatus = Object.fromEntries(SLAB_STATUSES.map((s) => [s, 0])) as Record<SlabStatus, number>;
  for (const c of counts) byStatus[c.status as SlabStatus] = Number(c.count);
  if (!byForecast) return { items: await withForecasts(db, rows), total, page: q.page, pageSize: q.pageSize, counts: byStatus };
  // The expected date comes from each slab's readings, so this sort is done here over the whole filtered stock.
  const sorted = sortByForecast(await withForecasts(db, rows), q.dir);
  return { items: sorted.slice((q.page - 1) * q.pageSize, q.page * q.pageSize), total, page: q.page, pageSize: q.pageSize, counts: byStatus };
}

/** Soonest (or latest) expected air-dry date first; slabs with no date always last, then by code. */
export function sortByForecast(rows: YardSlabRow[], dir: 'asc' | 'desc'): YardSlabRow[] {
  const sign = dir === 'desc' ? -1 : 1;
  return [...rows].sort((a, b) => {
    const x = a.airDry?.expectedOn ?? null;
    const y = b.airDry?.expectedOn ?? null;
    if (x === null || y === null) return x === y ? a.code.localeCompare(b.code) : x === null ? 1 : -1;
    return x === y ? a.code.localeCompare(b.code) : sign * (x < y ? -1 : 1);
  });
}

/** Every row of the current filtered, sorted view (not only the visible page). */
export async function yardSlabsForExport(db: Db, raw: Record<string, unknown>): Promise<YardSlabRow[]> {
  const q = parseQuery(raw);
  const { rows } = await repo.findYardPage(db, q, { all: true });
  const withDates = await withForecasts(db, rows);
  return q.sort === 'airDryExpectedOn' ? sortByForecast(withDates, q.dir) : withDates;
}

/**
 * Applies one action to many slabs. Each slab is its own transaction: the ones the workflow allows
 * are saved, the others are reported with the reason, and one failure never undoes another slab.
 */
export async function bulkSlabAction(db: Db, raw: unknown, actor: SessionUser): Promise<{ results: BulkResult[] }> {
  const input = bulkSlabActionSchema.parse(raw);
  const results: BulkResult[] = [];
  for (const id of [...new Set(input.ids)]) {
    try {
      const status = await db.transaction(async (tx) => {
        const slab = await repo.lockSlab(tx, id);
        if (!slab) throw new AppError(404, 'not_found', 'No slab with this id.');
        const from = slab.status as SlabStatus;
        if (input.action === 'move') {
          await repo.updateSlab(tx, id, { yardStack: input.stack! });
          return from;
        }
        const to: SlabStatus = input.action === 'list' ? 'listed' : 'withdrawn';
        if (from === to) return from;
        assertStaffMove(from, to);
        // A slab well above the target MC is listed only from its own page, where the warning is confirmed.
        if (to === 'listed') { await assertPublishable(tx, id); await assertDryEnoughOrConfirmed(tx, id, false); }
        await moveEverySlab(tx, [id], to, 'yard');
        await recordAudit(tx, { actor, action: 'slab.status', entityType: 'slab', entityId: id, before: { status: from }, after: { status: to } });
        return to;
      });
      results.push({ id, ok: true, status });
    } catch (err) {
      if (!(err instanceof AppError)) throw err;
      results.push({ id, ok: false, code: err.code, message: err.message });
    }
  }
  return { results };
}

export const listFigureKinds = (db: Db) => repo.listFigureKinds(db);

/** Figures are data the mill can extend; the multiplier changes prices, so the addition is audited. */
export async function addFigureKind(db: Db, raw: unknown, actor: SessionUser) {
  const input = createFigureKindSchema.parse(raw);
  return db.transaction(async (tx) => {
    const row = await repo.insertFigureKind(tx, input);
    if (!row) throw new AppError(409, 'conflict', `The figure ${input.slug} already exists.`, { slug: ['Already in the list'] });
    await recordAudit(tx, { actor, action: 'figure-kind.create', entityType: 'figure_kind', entityId: row.slug, before: null, after: row });
    return row;
  });
}
