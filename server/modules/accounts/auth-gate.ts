import express, { Router } from 'express';
import { AppError } from '../../lib/errors';
import { CLIENT_IP_HEADER } from '../../lib/auth';
import { changeEmailSchema, SIGN_IN_FAILURES_PER_ACCOUNT, SIGN_IN_PAUSE_MINUTES, updateNameSchema } from '../../../shared/accounts';
import { sameOriginOnly } from '../../lib/same-origin';
import { createSignInThrottle } from './sign-in-throttle';

/**
 * Runs in front of the auth library's handler (mount it on /api/auth before it):
 * 1. tells the library the client's address as Express resolved it (honouring the app's
 *    'trust proxy' setting), so a visitor cannot dodge the per-address limit with a made-up
 *    X-Forwarded-For, and direct connections still get their own bucket;
 * 2. refuses state changes sent from other sites, as the rest of the API does (this also stops
 *    another site from signing a visitor into an account of its choosing);
 * 3. pauses an e-mail address after repeated wrong passwords, whatever address they come from.
 */
export function authGate(opts: { trustedOrigins?: string[]; maxFailures?: number; windowMs?: number } = {}) {
  const throttle = createSignInThrottle({
    maxFailures: opts.maxFailures ?? SIGN_IN_FAILURES_PER_ACCOUNT,
    windowMs: opts.windowMs ?? SIGN_IN_PAUSE_MINUTES * 60_000,
  });
  const router = Router();

  router.use((req, _res, next) => {
    if (req.ip) req.headers[CLIENT_IP_HEADER] = req.ip;
    else delete req.headers[CLIENT_IP_HEADER];
    next();
  });
  router.use(sameOriginOnly(opts.trustedOrigins ?? []));

  // The body is parsed here to read the e-mail; the auth library re-reads the parsed body
  // (its Node adapter falls back to req.body once the stream has been consumed).
  router.post('/sign-in/email', express.json({ limit: '10kb' }), (req, res, next) => {
    // The library also reads form-encoded bodies; only JSON is let through so the count below
    // cannot be dodged by switching the body's format.
    if (!req.is('application/json')) throw new AppError(415, 'unsupported_media_type', 'Send the sign-in as JSON.');
    const raw: unknown = req.body?.email;
    if (typeof raw !== 'string' || !raw.trim()) return next();
    const key = raw.trim().toLowerCase();
    const wait = throttle.waitSeconds(key);
    if (wait > 0) {
      res.set('Retry-After', String(wait));
      const minutes = Math.ceil(wait / 60);
      throw new AppError(429, 'account_paused',
        `Too many wrong passwords for this account. Wait ${minutes} minute${minutes === 1 ? '' : 's'}, or reset your password.`);
    }
    const attempt = throttle.begin(key);
    res.on('finish', () => {
      attempt.settle(res.statusCode === 401 ? 'wrong-password' : res.statusCode === 200 ? 'signed-in' : 'other');
    });
    next();
  });

  // A person may change only their own name here (the library refuses e-mail and role changes on
  // this route); the same rules as the sign-up form apply, with messages at the field.
  router.post('/update-user', express.json({ limit: '10kb' }), (req, _res, next) => {
    const input = updateNameSchema.strict().parse(req.body ?? {});
    req.body = input;
    next();
  });
  router.post('/change-email', express.json({ limit: '10kb' }), (req, _res, next) => {
    const { callbackURL } = req.body ?? {};
    const input = changeEmailSchema.parse(req.body ?? {});
    req.body = { newEmail: input.newEmail, ...(typeof callbackURL === 'string' ? { callbackURL } : {}) };
    next();
  });

  return router;
}
