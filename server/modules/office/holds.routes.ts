import { Router } from 'express';
import type { AppDeps } from '../../app';
import { flushOutbox } from '../../lib/outbox';
import { requireRole } from '../../lib/session';
import { listActiveHolds, releaseHold } from './holds.service';
import { parseRouteId } from './route-id';
import { getLogger } from '../../lib/logger';

export function officeHoldRoutes({ db, mailer, publicUrl, trustedOrigins }: AppDeps) {
  const router = Router();
  const base = publicUrl ?? trustedOrigins?.[0] ?? '';
  const admin = requireRole('admin');
  router.get('/office/holds', admin, async (_req, res) => {
    res.json({ items: await listActiveHolds(db) });
  });
  router.delete('/office/holds/:id', admin, async (req, res) => {
    const result = await releaseHold(db, req.user!, parseRouteId(req.params.id as string, 'That hold'), { publicUrl: base });
    await flushOutbox(db, mailer).catch((err) => getLogger().warn({ part: 'office', reason: (err as Error).message }, 'sending queued e-mail failed'));
    res.json(result);
  });
  return router;
}
