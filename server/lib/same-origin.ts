import type { RequestHandler } from 'express';
import { AppError } from './errors';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Refuses state-changing requests whose Origin (or Referer) names another site. Browsers always
 * send Origin on cross-site POSTs, so together with SameSite=Lax cookies this blocks cross-site
 * request forgery. Requests without either header (curl, server-to-server) carry no cookie risk.
 */
export function sameOriginOnly(trusted: string[]): RequestHandler {
  const allowed = new Set(trusted.map((o) => new URL(o).origin));
  return (req, _res, next) => {
    if (SAFE.has(req.method)) return next();
    const source = req.get('origin') ?? req.get('referer');
    if (!source) return next();
    let origin: string;
    try { origin = new URL(source).origin; } catch { origin = 'invalid'; }
    const self = `${req.protocol}://${req.get('host')}`;
    if (origin === self || allowed.has(origin)) return next();
    throw new AppError(403, 'cross_origin', 'This request came from another site and was refused.');
  };
}
