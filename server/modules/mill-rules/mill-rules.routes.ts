import { Router } from 'express';
import type { Db } from '../../db/client';
import { requireRole } from '../../lib/session';
import { millRulesSchema } from '../../../shared/mill-rules';
import { getMillRules, saveMillRules } from './mill-rules.service';

export function millRulesRoutes({ db }: { db: Db }) {
  const router = Router();
  router.get('/office/mill-rules', requireRole('admin'), async (_req, res) => {
    res.json(await getMillRules(db));
  });
  router.put('/office/mill-rules', requireRole('admin'), async (req, res) => {
    res.json(await saveMillRules(db, req.user!, millRulesSchema.parse(req.body)));
  });
  return router;
}
