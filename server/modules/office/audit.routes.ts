import { Router } from 'express';
import type { Db } from '../../db/client';
import { requireRole } from '../../lib/session';
import { AUDIT_PAGE_SIZE, parseAuditQuery, type AuditPage } from '../../../shared/office';
import { distinctActionsAndTypes, findAuditPage } from './audit.repo';

/** Reading the audit log is a plain query, so the route calls the repo directly through one small function. */
async function readAuditLog(db: Db, raw: Record<string, unknown>): Promise<AuditPage> {
  const q = parseAuditQuery(raw);
  const [{ items, total }, facets] = await Promise.all([findAuditPage(db, q, AUDIT_PAGE_SIZE), distinctActionsAndTypes(db)]);
  return {
    items: items.map((e) => ({
      id: e.id, actorEmail: e.actorEmail, action: e.action, entityType: e.entityType, entityId: e.entityId,
      before: e.before, after: e.after, createdAt: e.createdAt.toISOString(),
    })),
    total, page: q.page, pageSize: AUDIT_PAGE_SIZE, ...facets,
  };
}

export function officeAuditRoutes({ db }: { db: Db }) {
  const router = Router();
  router.get('/office/audit', requireRole('admin'), async (req, res) => {
    res.json(await readAuditLog(db, req.query as Record<string, unknown>));
  });
  return router;
}
