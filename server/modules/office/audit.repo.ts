import { and, count, desc, eq, gte, ilike, inArray, lt, or, type SQL } from 'drizzle-orm';
import type { Tx } from '../../db/client';
import { auditLog, holds, logs, orders, slabs, user } from '../../db/schema/index';
import type { AuditQuery } from '../../../shared/office';

const escapeLike = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);
const nextDay = (day: string) => new Date(Date.parse(`${day}T00:00:00Z`) + 86_400_000);

function where(q: AuditQuery): SQL | undefined {
  const f: (SQL | undefined)[] = [];
  if (q.actor) f.push(or(ilike(auditLog.actorEmail, `%${escapeLike(q.actor)}%`), eq(auditLog.actorId, q.actor)));
  if (q.action) f.push(eq(auditLog.action, q.action));
  if (q.entityType) f.push(eq(auditLog.entityType, q.entityType));
  // Dates are whole UTC days, both ends included.
  if (q.from) f.push(gte(auditLog.createdAt, new Date(`${q.from}T00:00:00Z`)));
  if (q.to) f.push(lt(auditLog.createdAt, nextDay(q.to)));
  return f.length ? and(...f) : undefined;
}

export async function findAuditPage(db: Tx, q: AuditQuery, pageSize: number) {
  const cond = where(q);
  const [items, [{ total }]] = await Promise.all([
    db.select().from(auditLog).where(cond).orderBy(desc(auditLog.createdAt), desc(auditLog.id)).limit(pageSize).offset((q.page - 1) * pageSize),
    db.select({ total: count() }).from(auditLog).where(cond),
  ]);
  return { items, total };
}

export async function distinctActionsAndTypes(db: Tx) {
  const [actions, types] = await Promise.all([
    db.selectDistinct({ v: auditLog.action }).from(auditLog).orderBy(auditLog.action),
    db.selectDistinct({ v: auditLog.entityType }).from(auditLog).orderBy(auditLog.entityType),
  ]);
  return { actions: actions.map((r) => r.v), entityTypes: types.map((r) => r.v) };
}

/** Names and codes for the people and things a page of entries mentions, in one query per kind. */
export async function namesFor(db: Tx, ids: { users: string[]; slabs: number[]; orders: number[]; logs: number[]; holds: number[] }) {
  const none = Promise.resolve([]);
  const [people, slabRows, orderRows, logRows, holdRows] = await Promise.all([
    ids.users.length ? db.select({ id: user.id, name: user.name, email: user.email }).from(user).where(inArray(user.id, ids.users)) : none,
    ids.slabs.length ? db.select({ id: slabs.id, code: slabs.code }).from(slabs).where(inArray(slabs.id, ids.slabs)) : none,
    ids.orders.length ? db.select({ id: orders.id, code: orders.code }).from(orders).where(inArray(orders.id, ids.orders)) : none,
    ids.logs.length ? db.select({ id: logs.id, code: logs.code }).from(logs).where(inArray(logs.id, ids.logs)) : none,
    ids.holds.length ? db.select({ id: holds.id, slabId: holds.slabId, code: slabs.code }).from(holds).innerJoin(slabs, eq(slabs.id, holds.slabId)).where(inArray(holds.id, ids.holds)) : none,
  ]);
  return {
    users: new Map((people as Array<{ id: string; name: string; email: string }>).map((p) => [p.id, p])),
    slabs: new Map((slabRows as Array<{ id: number; code: string }>).map((s) => [s.id, s.code])),
    orders: new Map((orderRows as Array<{ id: number; code: string }>).map((s) => [s.id, s.code])),
    logs: new Map((logRows as Array<{ id: number; code: string }>).map((s) => [s.id, s.code])),
    holds: new Map((holdRows as Array<{ id: number; slabId: number; code: string }>).map((h) => [h.id, h])),
  };
}
