import { Router } from 'express';
import type { Db } from '../../db/client';
import { requireRole } from '../../lib/session';
import { parseId } from '../readings/readings.service';
import { markSet, setsOfLog, unmarkSet } from './matched-sets.service';

const staff = requireRole('seller', 'admin');

/** The yard marks and unmarks book-matched sets; reading them is part of the log page. */
export function matchedSetRoutes({ db }: { db: Db }) {
  const router = Router();
  router.get('/logs/:id/matched-sets', staff, async (req, res) => {
    res.json(await setsOfLog(db, parseId(req.params.id as string, 'That log')));
  });
  router.post('/matched-sets', staff, async (req, res) => {
    res.status(201).json(await markSet(db, req.user!, req.body));
  });
  router.delete('/matched-sets/:id', staff, async (req, res) => {
    res.json(await unmarkSet(db, req.user!, parseId(req.params.id as string, 'That matched set')));
  });
  return router;
}
