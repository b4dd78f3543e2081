import { Router } from 'express';
import type { Db } from '../../db/client';
import { requireRole } from '../../lib/session';
import { parseUserListQuery, updateUserSchema } from '../../../shared/office';
import { listUsers, updateUser } from './users.service';

export function officeUserRoutes({ db }: { db: Db }) {
  const router = Router();
  const admin = requireRole('admin');
  router.get('/office/users', admin, async (req, res) => {
    res.json({ items: await listUsers(db, parseUserListQuery(req.query as Record<string, unknown>)) });
  });
  router.patch('/office/users/:id', admin, async (req, res) => {
    res.json(await updateUser(db, req.user!, req.params.id as string, updateUserSchema.parse(req.body)));
  });
  return router;
}
