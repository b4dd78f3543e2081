import { Router } from 'express';
import type { Db } from '../../db/client';
import { requireUser } from '../../lib/session';
import { parseId } from '../slabs/catalogue.service';
import { compareSlabs, listSavedSlabs, mySlabMarks, saveSlab, unsaveSlab, unwatchSlab, watchSlab } from './buyer-lists.service';

/** A buyer's own lists (saved slabs, "tell me when it is free") and the public compare view. */
export function buyerListRoutes({ db }: { db: Db }) {
  const router = Router();
  router.get('/compare', async (req, res) => {
    const staff = req.user?.role === 'seller' || req.user?.role === 'admin';
    res.json(await compareSlabs(db, req.query.ids, { includeHidden: staff }));
  });
  router.get('/me/slab-marks', requireUser, async (req, res) => {
    res.json(await mySlabMarks(db, req.user!.id));
  });
  router.get('/saved-slabs', requireUser, async (req, res) => {
    res.json({ items: await listSavedSlabs(db, req.user!.id) });
  });
  router.put('/saved-slabs/:slabId', requireUser, async (req, res) => {
    await saveSlab(db, req.user!, parseId(String(req.params.slabId)));
    res.json({ saved: true });
  });
  router.delete('/saved-slabs/:slabId', requireUser, async (req, res) => {
    await unsaveSlab(db, req.user!, parseId(String(req.params.slabId)));
    res.status(204).end();
  });
  router.post('/slabs/:id/watch', requireUser, async (req, res) => {
    await watchSlab(db, req.user!, parseId(String(req.params.id)));
    res.status(201).json({ watching: true });
  });
  router.delete('/slabs/:id/watch', requireUser, async (req, res) => {
    await unwatchSlab(db, req.user!, parseId(String(req.params.id)));
    res.status(204).end();
  });
  return router;
}
