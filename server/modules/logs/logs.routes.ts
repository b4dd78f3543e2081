import { Router } from 'express';
import type { Db } from '../../db/client';
import { requireRole } from '../../lib/session';
import { createLog, deleteLog, getLog, listLogs, parseLogId, updateLog } from './logs.service';

/** The mill's log book: staff only. */
export function logRoutes({ db }: { db: Db }) {
  const router = Router();
  const staff = requireRole('seller', 'admin');
  router.get('/logs', staff, async (_req, res) => {
    res.json({ items: await listLogs(db) });
  });
  router.post('/logs', staff, async (req, res) => {
    res.status(201).json(await createLog(db, req.body, req.user!));
  });
  router.get('/logs/:id', staff, async (req, res) => {
    res.json(await getLog(db, parseLogId(String(req.params.id))));
  });
  router.patch('/logs/:id', staff, async (req, res) => {
    res.json(await updateLog(db, parseLogId(String(req.params.id)), req.body));
  });
  router.delete('/logs/:id', staff, async (req, res) => {
    res.json(await deleteLog(db, req.user!, parseLogId(String(req.params.id))));
  });
  return router;
}
