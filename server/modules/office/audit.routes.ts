import { Router } from 'express';
import type { Db } from '../../db/client';
import { requireRole } from '../../lib/session';
import { AUDIT_PAGE_SIZE, parseAuditQuery, type AuditEntryView, type AuditPage, type AuditTarget } from '../../../shared/office';
import { millDateTime } from '../pickups/slot-calendar';
import { describeChange } from './audit-words';
import { distinctActionsAndTypes, findAuditPage, namesFor } from './audit.repo';

type Row = Awaited<ReturnType<typeof findAuditPage>>['items'][number];
const num = (v: unknown) => (typeof v === 'number' ? v : Number(v));
const slabOfEntry = (e: Row) => (e.entityType === 'moisture-reading' ? num((e.before as { slabId?: number } | null)?.slabId) : num(e.entityId));

/**
 * Reading the change log is a plain query plus words: who by name, what happened in a sentence, on
 * which slab, order or log (linked), and when on the mill's clock. Raw records and ids stay inside.
 */
async function readAuditLog(db: Db, raw: Record<string, unknown>): Promise<AuditPage> {
  const q = parseAuditQuery(raw);
  const [{ items, total }, facets] = await Promise.all([findAuditPage(db, q, AUDIT_PAGE_SIZE), distinctActionsAndTypes(db)]);
  const ids = (type: string) => items.filter((e) => e.entityType === type).map((e) => num(e.entityId)).filter(Number.isInteger);
  const names = await namesFor(db, {
    users: [...new Set([...items.flatMap((e) => (e.actorId ? [e.actorId] : [])), ...items.filter((e) => e.entityType === 'user').map((e) => e.entityId)])],
    slabs: items.filter((e) => e.entityType === 'slab' || e.entityType === 'moisture-reading').map(slabOfEntry).filter(Number.isInteger),
    orders: ids('order'), logs: ids('log'), holds: ids('hold'),
  });
  const target = (e: Row): AuditTarget => {
    switch (e.entityType) {
      case 'slab': case 'moisture-reading': {
        const id = slabOfEntry(e);
        const code = names.slabs.get(id);
        return code ? { label: `slab ${code}`, link: { kind: 'slab', id } } : { label: 'a slab no longer on file', link: null };
      }
      case 'order': {
        const code = names.orders.get(num(e.entityId));
        return code ? { label: `order ${code}`, link: { kind: 'office-order', id: num(e.entityId) } } : { label: 'an order', link: null };
      }
      case 'log': {
        const code = names.logs.get(num(e.entityId));
        return code ? { label: `log ${code}`, link: { kind: 'log', id: num(e.entityId) } } : { label: 'a log', link: null };
      }
      case 'hold': {
        const h = names.holds.get(num(e.entityId));
        return h ? { label: `the hold on slab ${h.code}`, link: { kind: 'slab', id: h.slabId } } : { label: 'a hold', link: null };
      }
      case 'user': {
        const u = names.users.get(e.entityId);
        return { label: u ? `${u.name}'s account` : 'an account', link: null };
      }
      case 'mill_settings': return { label: "the mill's settings", link: null };
      case 'figure_kind': return { label: 'the figure list', link: null };
      default: return { label: e.entityType.replace(/[_-]/g, ' '), link: null };
    }
  };
  const view = (e: Row): AuditEntryView => {
    const actor = e.actorId ? names.users.get(e.actorId) : undefined;
    return {
      id: e.id, action: e.action, entityType: e.entityType, createdAt: e.createdAt.toISOString(),
      who: actor?.name || actor?.email || e.actorEmail || 'Stickerline (automatic)',
      what: describeChange(e.action, e.before, e.after, (iso) => millDateTime(new Date(iso))),
      on: target(e), whenAtMill: millDateTime(e.createdAt),
    };
  };
  return { items: items.map(view), total, page: q.page, pageSize: AUDIT_PAGE_SIZE, ...facets };
}

export function officeAuditRoutes({ db }: { db: Db }) {
  const router = Router();
  router.get('/office/audit', requireRole('admin'), async (req, res) => {
    res.json(await readAuditLog(db, req.query as Record<string, unknown>));
  });
  return router;
}
