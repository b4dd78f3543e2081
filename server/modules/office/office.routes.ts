import { Router } from 'express';
import type { AppDeps } from '../../app';
import { officeUserRoutes } from './users.routes';
import { officeAuditRoutes } from './audit.routes';
import { officeNumbersRoutes } from './numbers.routes';
import { officeHoldRoutes } from './holds.routes';
import { officeOrderRoutes } from './orders.routes';

/** Everything under /api/office: admin-only; each route carries its own requireRole('admin'). */
export function officeRoutes(deps: AppDeps) {
  const router = Router();
  router.use(officeUserRoutes(deps));
  router.use(officeAuditRoutes(deps));
  router.use(officeNumbersRoutes(deps));
  router.use(officeHoldRoutes(deps));
  router.use(officeOrderRoutes(deps));
  return router;
}
