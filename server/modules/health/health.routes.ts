import { Router } from 'express';
import { readinessChecker, type ReadinessDeps } from './readiness';

/**
 * GET /api/health: the process is alive (no dependencies touched).
 * GET /api/ready: it can serve buyers now — 200 when every check passes, else 503 naming the failed ones.
 */
export function healthRoutes(deps: ReadinessDeps) {
  const router = Router();
  const check = readinessChecker(deps);
  router.get('/health', (_req, res) => {
    res.json({ ok: true });
  });
  router.get('/ready', async (_req, res) => {
    const report = await check();
    res.status(report.ready ? 200 : 503).set('Cache-Control', 'no-store').json({
      ...report, ...(deps.isShuttingDown?.() ? { shuttingDown: true } : {}),
    });
  });
  return router;
}
