import { Router } from 'express';

export function accountRoutes(_deps: object) {
  const router = Router();
  /** Who am I: { user: null } for visitors — a normal answer, not an error, on every signed-out page. */
  router.get('/me', (req, res) => {
    res.json({ user: req.user ?? null });
  });
  return router;
}
