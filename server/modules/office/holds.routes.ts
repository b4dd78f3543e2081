import { Router } from 'express';
import type { Db } from '../../db/client';
import { requireRole } from '../../lib/session';
import { listActiveHolds, releaseHold } from './holds.service';
import { parseRouteId } from './route-id';

export function officeHoldRoutes({ db }: { db: Db }) {
  const router = Router();
  const admin = requireRole('admin');
  router.get('/office/holds', admin, async (_req, res) => {
    res.json({ items: await listActiveHolds(db) });
  });
  router.delete('/office/holds/:id', admin, async (req, res) => {
    res.json(await releaseHold(db, req.user!, parseRouteId(req.params.id as string, 'That hold')));
  });
  return router;
}
