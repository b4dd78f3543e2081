import express from 'express';
import path from 'node:path';
import fs from 'node:fs';
import helmet from 'helmet';
import { toNodeHandler } from 'better-auth/node';
import type { Db } from './db/client';
import type { Auth } from './lib/auth';
import type { Mailer } from './lib/mail';
import type { Payments } from './lib/payments';
import type { TrustProxy } from './lib/trust-proxy';
import { getLogger, type Logger } from './lib/logger';
import { requestLog } from './lib/request-log';
import { healthRoutes } from './modules/health/health.routes';
import { apiNotFound, errorMiddleware } from './lib/errors';
import { loadUser } from './lib/session';
import { sameOriginOnly } from './lib/same-origin';
import { writeLimit } from './lib/write-limit';
import { catalogueRoutes } from './modules/slabs/catalogue.routes';
import { accountRoutes } from './modules/accounts/accounts.routes';
import { preferenceRoutes } from './modules/accounts/preferences.routes';
import { millClockRoutes } from './modules/mill-clock/mill-clock.routes';
import { holdRoutes } from './modules/holds/holds.routes';
import { checkoutRoutes } from './modules/checkout/checkout.routes';
import { pickupRoutes } from './modules/pickups/pickups.routes';
import { webhookRoutes } from './modules/webhooks/webhooks.routes';
import { photoRoutes } from './modules/photos/photos.routes';
import { authGate } from './modules/accounts/auth-gate';
import { logRoutes } from './modules/logs/logs.routes';
import { yardSlabRoutes } from './modules/slabs/yard-slabs.routes';
import { officeRoutes } from './modules/office/office.routes';
import { millRulesRoutes } from './modules/mill-rules/mill-rules.routes';
import { readingRoutes } from './modules/readings/readings.routes';
import { salesTermsRoutes } from './modules/sales-terms/sales-terms.routes';
import { buyerListRoutes } from './modules/buyer-lists/buyer-lists.routes';
import { shopAddressRoutes } from './modules/shop-address/shop-address.routes';
import { matchedSetRoutes } from './modules/matched-sets/matched-sets.routes';

export type AppDeps = {
  db: Db;
  auth: Auth;
  mailer: Mailer;
  payments: Payments;
  /** State-changing API calls allowed per client address per minute; 0 = no limit. Default 300. */
  writeLimitPerMinute?: number;
  /** Overrides mill_settings.holdHours (tests). */
  holdHours?: number;
  /** Base URL for links in e-mails; defaults to the first trusted origin. */
  publicUrl?: string;
  uploadsDir: string;
  /** Built client to serve (production); omitted in dev and API tests. */
  clientDir?: string;
  /** Origins allowed to send state-changing requests (the public URL and TRUSTED_ORIGINS). */
  trustedOrigins?: string[];
  /** Which hops may tell the client's address and scheme (TRUST_PROXY); default none. */
  trustProxy?: TrustProxy;
  /** Where request lines go; default the process logger. */
  logger?: Logger;
  /** True once shutdown has begun: /api/ready answers 503 and responses close their connection. */
  isShuttingDown?: () => boolean;
};

export function createApp(deps: AppDeps) {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', deps.trustProxy ?? false);
  app.use(requestLog(deps.logger ?? getLogger()));
  if (deps.isShuttingDown) {
    const shuttingDown = deps.isShuttingDown;
    // Keep-alive clients are told to reconnect elsewhere (or later) once shutdown has begun.
    app.use((_req, res, next) => { if (shuttingDown()) res.setHeader('Connection', 'close'); next(); });
  }
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          styleSrc: ["'self'", "'unsafe-inline'"],
          fontSrc: ["'self'", 'data:'],
          scriptSrc: ["'self'"],
          connectSrc: ["'self'"],
          objectSrc: ["'none'"],
          frameAncestors: ["'none'"],
          upgradeInsecureRequests: null,
        },
      },
      crossOriginEmbedderPolicy: false,
      // Sent below, and only over https: over plain http the header is meaningless and a local run must stay reachable.
      strictTransportSecurity: false,
    }),
  );
  app.use((req, res, next) => {
    if (req.secure) res.setHeader('Strict-Transport-Security', 'max-age=15552000; includeSubDomains');
    next();
  });

  // The auth library parses its own bodies, so it is mounted before express.json().
  app.use('/api/auth', authGate({ trustedOrigins: deps.trustedOrigins }));
  app.all('/api/auth/{*any}', toNodeHandler(deps.auth));
  // Provider events are verified against their exact bytes, so this path keeps its raw body.
  app.use('/api/webhooks/payments', express.raw({ type: 'application/json', limit: '256kb' }), webhookRoutes(deps));
  app.use(express.json({ limit: '100kb' }));

  const api = express.Router();
  api.use(sameOriginOnly(deps.trustedOrigins ?? []));
  api.use(writeLimit(deps.writeLimitPerMinute ?? 300));
  api.use(loadUser(deps.auth));
  api.use(healthRoutes(deps));
  api.use(catalogueRoutes(deps));
  api.use(accountRoutes(deps));
  api.use(preferenceRoutes(deps));
  api.use(millClockRoutes());
  api.use(holdRoutes(deps));
  api.use(buyerListRoutes(deps));
  api.use(checkoutRoutes(deps));
  api.use(pickupRoutes(deps));
  api.use(photoRoutes(deps));
  api.use(logRoutes(deps));
  api.use(yardSlabRoutes(deps));
  api.use(readingRoutes(deps));
  api.use(matchedSetRoutes(deps));
  api.use(officeRoutes(deps));
  api.use(millRulesRoutes(deps));
  api.use(salesTermsRoutes(deps));
  api.use(shopAddressRoutes({ publicUrl: deps.publicUrl ?? deps.trustedOrigins?.[0] ?? 'http://localhost:3000' }));
  api.use(apiNotFound);
  app.use('/api', api);

  app.use(
    '/uploads',
    express.static(path.resolve(deps.uploadsDir), {
      maxAge: '365d',
      immutable: true,
      index: false,
      dotfiles: 'deny',
      setHeaders: (res) => {
        res.setHeader('X-Content-Type-Options', 'nosniff');
        res.setHeader('Content-Security-Policy', "default-src 'none'; sandbox");
      },
    }),
  );

  if (deps.clientDir && fs.existsSync(deps.clientDir)) {
    const clientDir = path.resolve(deps.clientDir);
    app.use('/assets', express.static(path.join(clientDir, 'assets'), { maxAge: '365d', immutable: true }));
    app.use(express.static(clientDir, { index: false, maxAge: '1h' }));
    // Client-side routes: every other GET gets the app shell.
    app.get('/{*any}', (_req, res) => res.sendFile(path.join(clientDir, 'index.html')));
  }

  app.use(errorMiddleware);
  return app;
}
