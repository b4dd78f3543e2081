import type { RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * A ceiling on state-changing API calls per client address, so one script cannot flood the yard
 * with holds or uploads. Reads are not counted. `perMinute` 0 switches it off (tests that fire
 * bursts on purpose). Sign-in has its own, stricter limits in the accounts module.
 */
export function writeLimit(perMinute: number): RequestHandler {
  if (perMinute <= 0) return (_req, _res, next) => next();
  return rateLimit({
    windowMs: 60_000,
    limit: perMinute,
    skip: (req) => SAFE.has(req.method),
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, res) => {
      res.status(429).json({ error: { code: 'too_many_requests', message: 'Too many changes from this address in a minute. Please wait a moment and try again.' } });
    },
  });
}
