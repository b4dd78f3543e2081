import { and, count, desc, eq, gte, ilike, lt, or, type SQL } from 'drizzle-orm';
import type { Tx } from '../../db/client';
import { auditLog } from '../../db/schema/index';
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
