import { Router } from 'express';
import type { Db } from '../../db/client';
import { requireRole } from '../../lib/session';
import { listStacks, roundForStack } from './moisture-round.service';
import { addBatch, addReading, listForSlab, parseId, removeReading } from './readings.service';

const staff = requireRole('seller', 'admin');

/** Moisture readings: mill staff record them; each one moves the slab's drying state. */
export function readingRoutes({ db }: { db: Db }) {
  const router = Router();
  router.get('/slabs/:id/moisture-readings', staff, async (req, res) => {
    res.json(await listForSlab(db, parseId(req.params.id as string, 'That slab')));
  });
  router.post('/slabs/:id/moisture-readings', staff, async (req, res) => {
    res.status(201).json(await addReading(db, req.user!, parseId(req.params.id as string, 'That slab'), req.body));
  });
  router.post('/moisture-readings/batch', staff, async (req, res) => {
    res.status(201).json(await addBatch(db, req.user!, req.body));
  });
  router.delete('/moisture-readings/:id', staff, async (req, res) => {
    res.json(await removeReading(db, req.user!, parseId(req.params.id as string, 'That reading')));
  });
  router.get('/yard/stacks', staff, async (_req, res) => {
    res.json({ items: await listStacks(db) });
  });
  router.get('/yard/moisture-round', staff, async (req, res) => {
    res.json(await roundForStack(db, req.query.stack));
  });
  return router;
}
