import { Router } from 'express';
import type { Db } from '../../db/client';
import { requireRole } from '../../lib/session';
import { parseId } from './catalogue.service';
import { createSlab, getYardSlab, updateSlab } from './yard-slabs.service';
import { addFigureKind, bulkSlabAction, listFigureKinds, listYardSlabs, yardSlabsForExport } from './yard-inventory.service';
import { yardSlabsCsv } from './yard-csv';
import { deleteSlab } from './slab-removal';

/** The yard desk's slab routes: recording, editing, the inventory list and its CSV. Staff only, except reading figure kinds. */
export function yardSlabRoutes({ db, uploadsDir }: { db: Db; uploadsDir: string }) {
  const router = Router();
  const staff = requireRole('seller', 'admin');
  router.post('/slabs', staff, async (req, res) => {
    res.status(201).json(await createSlab(db, req.body, req.user!));
  });
  router.patch('/slabs/:id', staff, async (req, res) => {
    res.json(await updateSlab(db, parseId(String(req.params.id)), req.body, req.user!));
  });
  router.delete('/slabs/:id', staff, async (req, res) => {
    res.json(await deleteSlab(db, uploadsDir, req.user!, parseId(String(req.params.id))));
  });
  router.get('/yard/slabs', staff, async (req, res) => {
    res.json(await listYardSlabs(db, req.query as Record<string, unknown>));
  });
  router.get('/yard/slabs.csv', staff, async (req, res) => {
    const csv = yardSlabsCsv(await yardSlabsForExport(db, req.query as Record<string, unknown>));
    const day = new Date().toISOString().slice(0, 10);
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', `attachment; filename="stickerline-yard-${day}.csv"`);
    res.send(csv);
  });
  router.post('/yard/slabs/bulk', staff, async (req, res) => {
    res.json(await bulkSlabAction(db, req.body, req.user!));
  });
  router.get('/yard/slabs/:id', staff, async (req, res) => {
    res.json(await getYardSlab(db, parseId(String(req.params.id))));
  });
  // Figure names and multipliers show on public slab pages too, so reading them needs no account.
  router.get('/figure-kinds', async (_req, res) => {
    res.json({ items: await listFigureKinds(db) });
  });
  router.post('/figure-kinds', staff, async (req, res) => {
    res.status(201).json(await addFigureKind(db, req.body, req.user!));
  });
  return router;
}
