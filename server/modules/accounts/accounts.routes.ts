import { Router } from 'express';
import { requireUser } from '../../lib/session';

export function accountRoutes(_deps: object) {
  const router = Router();
  /** Who am I: 401 for visitors so the client can tell them apart. */
  router.get('/me', requireUser, (req, res) => {
    res.json({ user: req.user });
  });
  return router;
}
