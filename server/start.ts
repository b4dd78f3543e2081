import fs from 'node:fs';
import path from 'node:path';
import type { Server } from 'node:http';
import { wantsDemoData, type Env } from './env';
import { configProblems, databaseProblems, refuseIfAny } from './production-checks';
import { openDatabase, migrateDatabase, type Database } from './db/client';
import { createAuth } from './lib/auth';
import { createMailer } from './lib/mail';
import { createPayments } from './lib/payments';
import { startLocalFakes, type LocalFakes } from './lib/local-fakes';
import { authSecret } from './lib/dev-secret';
import { shopOrigins } from './lib/shop-origins';
import { createApp } from './app';
import { seedDemo } from './seed/seed-demo';
import { ensureMillSettings } from './modules/mill-rules/mill-rules.service';
import { startBackgroundJobs } from './jobs';
import { getLogger, type Logger } from './lib/logger';
import { gracefulCloser } from './lib/graceful-close';

/** Keys starting sk_test_local are placeholders that only the local fake accepts. */
export const usesLocalPaymentFake = (secretKey: string) => secretKey.startsWith('sk_test_local');

export type StartOptions = { env: Env; dev?: boolean; logger?: Logger };

export type Running = {
  url: string;
  apiPort: number;
  fakes: LocalFakes | null;
  database: Database;
  /**
   * Graceful stop: no new connections, requests in flight finish (connections still busy after
   * SHUTDOWN_GRACE_MS are closed), timers stop, then the database closes.
   */
  stop(): Promise<void>;
};

/**
 * Starts the whole product: local fakes (unless real services are configured), database with
 * migrations and demo data, the API (and Vite in dev). Used by `npm start`, `npm run dev` and the
 * browser tests.
 */
export async function startStickerline({ env, dev = false, logger = getLogger() }: StartOptions): Promise<Running> {
  const production = env.NODE_ENV === 'production';
  // Production refuses the demo's defaults before anything starts (see server/production-checks.ts).
  const problems = production ? configProblems(env) : [];
  fs.mkdirSync(env.DATA_DIR, { recursive: true });
  fs.mkdirSync(env.UPLOADS_DIR, { recursive: true });
  // The database first: a folder another process already holds is refused before anything else starts.
  const database = await openDatabase({ databaseUrl: env.DATABASE_URL, dataDir: path.join(env.DATA_DIR, 'pglite'), purpose: 'the shop' });
  if (production) {
    // Only looked at for demo accounts: nothing is migrated or written before the checks pass.
    try {
      problems.push(...(await databaseProblems(database.db)));
      refuseIfAny(problems);
    } catch (err) {
      await database.close();
      throw err;
    }
  }
  await migrateDatabase(database);

  const wantFakes = env.START_LOCAL_FAKES ? env.START_LOCAL_FAKES === 'true' : !production && !env.SMTP_PORT;
  // MAILDEV_WEB_PORT keeps the inbox at one address across restarts (a bookmarked tab keeps working).
  const fakes = wantFakes ? await startLocalFakes({ mailWebPort: env.MAILDEV_WEB_PORT }) : null;
  const smtpPort = env.SMTP_PORT ?? fakes?.smtpPort ?? 25;
  // The payment fake answers only for the local placeholder key; a real key (sk_test_… or sk_live_… from the
  // provider) goes to the provider itself, and buyers see its real payment page — nothing else changes.
  const paymentFake = fakes && usesLocalPaymentFake(env.STRIPE_SECRET_KEY) ? fakes : null;
  const stripe = {
    host: env.STRIPE_HOST ?? (paymentFake ? '127.0.0.1' : undefined),
    port: env.STRIPE_PORT ?? paymentFake?.stripePort,
    protocol: env.STRIPE_PROTOCOL ?? (paymentFake ? ('http' as const) : undefined),
  };


  const publicPort = env.PORT;
  const apiPort = dev ? publicPort + 1 : publicPort;
  const { publicUrl: url, trustedOrigins } = shopOrigins(env);
  const mailer = createMailer({ host: env.SMTP_HOST, port: smtpPort, from: env.MAIL_FROM });
  const auth = createAuth({ db: database.db, secret: authSecret(env.BETTER_AUTH_SECRET, env.DATA_DIR, production), baseURL: url, trustedOrigins, mailer });

  if (wantsDemoData(env)) {
    await seedDemo({ db: database.db, auth, uploadsDir: env.UPLOADS_DIR, log: (m: string) => logger.info({ part: 'seed' }, m) });
  }
  await ensureMillSettings(database.db);

  let shuttingDown = false;
  const payments = createPayments({ secretKey: env.STRIPE_SECRET_KEY, ...stripe, webhookSecret: env.STRIPE_WEBHOOK_SECRET });
  const app = createApp({
    db: database.db, auth, mailer, payments, publicUrl: url, uploadsDir: env.UPLOADS_DIR,
    clientDir: dev ? undefined : 'dist', trustedOrigins, trustProxy: env.TRUST_PROXY,
    logger, isShuttingDown: () => shuttingDown,
  });
  const jobs = startBackgroundJobs({ db: database.db, mailer, publicUrl: url });
  const server: Server = await new Promise((resolve) => {
    const s = app.listen(apiPort, env.HOST, () => resolve(s));
  });
  // The local payment fake posts its signed events straight to this process (a live account has its endpoint registered instead).
  paymentFake?.addWebhookEndpoint({ url: `http://127.0.0.1:${apiPort}/api/webhooks/payments`, secret: env.STRIPE_WEBHOOK_SECRET });
  const closer = gracefulCloser(server, logger);

  let vite: { close(): Promise<void> } | null = null;
  if (dev) {
    process.env.API_PROXY_TARGET = `http://127.0.0.1:${apiPort}`;
    const { createServer } = await import('vite');
    const viteServer = await createServer({ server: { port: publicPort, host: env.HOST, strictPort: true } });
    await viteServer.listen();
    vite = viteServer;
  }

  return {
    url, apiPort, fakes, database,
    async stop() {
      if (shuttingDown) return;
      shuttingDown = true;
      const jobsStopped = jobs.stop();
      await vite?.close();
      await closer.close(env.SHUTDOWN_GRACE_MS);
      await jobsStopped;
      mailer.close();
      await database.close();
      await fakes?.stop();
    },
  };
}
