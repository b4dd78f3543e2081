import { Router } from 'express';
import type { Db } from '../../db/client';
import { requireRole } from '../../lib/session';
import { z } from 'zod';
import { createLog, deleteLog, getLog, listLogs, nextLogCode, parseLogId, updateLog } from './logs.service';

const nextCodeQuery = z.object({ felledOn: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'Felled date must be a date (YYYY-MM-DD)').optional().or(z.literal('').transform(() => undefined)) });

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
  // What the log form shows as the code a new log will get; createLog asks the same function.
  router.get('/logs/next-code', staff, async (req, res) => {
    res.json(await nextLogCode(db, nextCodeQuery.parse(req.query).felledOn));
  });
  router.get('/logs/:id', staff, async (req, res) => {
    res.json(await getLog(db, parseLogId(String(req.params.id))));
  });
  router.patch('/logs/:id', staff, async (req, res) => {
    res.json(await updateLog(db, parseLogId(String(req.params.id)), req.body, req.user!));
  });
  router.delete('/logs/:id', staff, async (req, res) => {
    res.json(await deleteLog(db, req.user!, parseLogId(String(req.params.id))));
  });
  return router;
}
