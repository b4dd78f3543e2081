import { Router } from 'express';
import type { Db } from '../../db/client';
import { getSlabDetail, listSlabs, parseId } from './catalogue.service';
import { distinctSpeciesInStock } from './catalogue.repo';

/** Public catalogue: anyone may read it. */
export function catalogueRoutes({ db }: { db: Db }) {
  const router = Router();
  router.get('/slabs', async (req, res) => {
    res.json(await listSlabs(db, req.query as Record<string, unknown>));
  });
  router.get('/slabs/:id', async (req, res) => {
    const staff = req.user?.role === 'seller' || req.user?.role === 'admin';
    res.json(await getSlabDetail(db, parseId(req.params.id), { includeHidden: staff }));
  });
  router.get('/species', async (_req, res) => {
    res.json({ items: await distinctSpeciesInStock(db) });
  });
  return router;
}
