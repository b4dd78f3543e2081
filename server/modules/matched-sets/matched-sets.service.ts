import type { Db, Tx } from '../../db/client';
import { AppError, notFound, validationError } from '../../lib/errors';
import { recordAudit } from '../../lib/audit';
import type { SessionUser } from '../../lib/session';
import { isUniqueViolation } from '../holds/unique-violation';
import { markMatchedSetSchema, type LogMatchedSets, type MatchedSetMember, type MatchedSetView } from '../../../shared/matched-sets';
import * as repo from './matched-sets.repo';

type MemberRow = Awaited<ReturnType<typeof repo.membersInLog>>[number];
const member = (m: Pick<MemberRow, 'id' | 'code' | 'sequenceInLog' | 'status'>): MatchedSetMember =>
  ({ id: m.id, code: m.code, sequenceInLog: m.sequenceInLog, status: m.status });

function toSets(rows: MemberRow[]): MatchedSetView[] {
  const bySet = new Map<number, MatchedSetView>();
  for (const r of rows) {
    const set = bySet.get(r.setId) ?? { id: r.setId, logId: r.logId, slabs: [] };
    set.slabs.push(member(r));
    bySet.set(r.setId, set);
  }
  return [...bySet.values()];
}

/** The yard marks slabs of one log as book-matched. A slab is in at most one set. */
export async function markSet(db: Db, actor: SessionUser, body: unknown): Promise<MatchedSetView> {
  const { slabIds } = markMatchedSetSchema.parse(body);
  try {
    return await db.transaction(async (tx) => {
      const found = await repo.findSlabs(tx, slabIds);
      if (found.length !== slabIds.length) throw validationError({ slabIds: ['One of those slabs does not exist'] });
      const logIds = new Set(found.map((s) => s.logId));
      if (logIds.size !== 1) throw validationError({ slabIds: ['Book-matched slabs come from one log'] }, 'Book-matched slabs come from one log.');
      const clash = (await repo.membersOfSetsWith(tx, slabIds)).find((m) => slabIds.includes(m.id));
      if (clash) throw inAnotherSet(clash.code);
      const [logId] = logIds;
      const ordered = [...found].sort((a, b) => a.sequenceInLog - b.sequenceInLog);
      const set = await repo.insertSet(tx, logId, ordered.map((s) => s.id), actor.id);
      await recordAudit(tx, { actor, action: 'matched-set.mark', entityType: 'log', entityId: logId, before: null, after: { setId: set.id, slabCodes: ordered.map((s) => s.code) } });
      return { id: set.id, logId, slabs: ordered.map(member) };
    });
  } catch (err) {
    if (isUniqueViolation(err)) throw inAnotherSet('One of those slabs');
    throw err;
  }
}

const inAnotherSet = (what: string) => new AppError(409, 'already_in_set', `${what.startsWith('One') ? what : `Slab ${what}`} is already in a matched set. Unmark that set first.`, {
  slabIds: ['Already in a matched set'],
});

/** The yard takes a mark back (the slabs stay as they are; holds already placed keep running). */
export async function unmarkSet(db: Db, actor: SessionUser, id: number) {
  return db.transaction(async (tx) => {
    const set = await repo.findSet(tx, id);
    if (!set) throw notFound('That matched set');
    const members = await repo.membersInLog(tx, set.logId);
    await repo.deleteSet(tx, id);
    await recordAudit(tx, { actor, action: 'matched-set.unmark', entityType: 'log', entityId: set.logId, before: { setId: id, slabCodes: members.filter((m) => m.setId === id).map((m) => m.code) }, after: null });
    return { id };
  });
}

/**
 * The log's marked sets, and as a suggestion every pair of neighbouring slabs (sawn one after the
 * other) that is not in a set yet and not withdrawn — the usual book-match (common practice).
 */
export async function setsOfLog(db: Tx, logId: number): Promise<LogMatchedSets> {
  const [rows, all] = await Promise.all([repo.membersInLog(db, logId), repo.slabsInLog(db, logId)]);
  const inSet = new Set(rows.map((r) => r.id));
  const free = all.filter((s) => !inSet.has(s.id) && s.status !== 'withdrawn');
  const suggestions = free.flatMap((s, i) => (free[i + 1] && free[i + 1].sequenceInLog === s.sequenceInLog + 1 ? [[member(s), member(free[i + 1])]] : []));
  return { sets: toSets(rows), suggestions };
}

/** The set a slab belongs to, or null. */
export async function setOfSlab(db: Tx, slabId: number): Promise<MatchedSetView | null> {
  return toSets(await repo.membersOfSetsWith(db, [slabId]))[0] ?? null;
}

/** The pair/set hold is only for slabs the yard marked as one set (at least two of its members). */
export async function assertOneSet(db: Tx, slabIds: number[]) {
  const sets = toSets(await repo.membersOfSetsWith(db, slabIds));
  const ok = sets.length === 1 && slabIds.every((id) => sets[0].slabs.some((s) => s.id === id));
  if (!ok) {
    throw new AppError(400, 'not_matched', 'Those slabs are not marked as one book-matched set by the yard.', {
      slabIds: ['Pick slabs of one matched set'],
    });
  }
  return sets[0];
}
