import fs from 'node:fs';
import path from 'node:path';
import type { Server } from 'node:http';
import { readEnv } from './env';
import { openDatabase, migrateDatabase } from './db/client';
import { createAuth } from './lib/auth';
import { createMailer } from './lib/mail';
import { startLocalFakes, type LocalFakes } from './lib/local-fakes';
import { authSecret } from './lib/dev-secret';
import { createApp } from './app';
import { seedDemo } from './seed/seed-demo';
import { DEMO_ACCOUNTS } from './seed/demo-data';
import { startBackgroundJobs } from './jobs';

/** `npm start` (built client) and `npm run dev` (Vite with hot reload in front of the API). */
async function main() {
  const dev = process.argv.includes('--dev');
  const env = readEnv();
  const production = env.NODE_ENV === 'production';
  fs.mkdirSync(env.DATA_DIR, { recursive: true });
  fs.mkdirSync(env.UPLOADS_DIR, { recursive: true });

  // Local fakes: started unless the environment points at real mail and payment services.
  const wantFakes = env.START_LOCAL_FAKES ? env.START_LOCAL_FAKES === 'true' : !production && !env.SMTP_PORT;
  const fakes: LocalFakes | null = wantFakes ? await startLocalFakes({}) : null;
  if (fakes) {
    process.env.STRIPE_HOST ??= '127.0.0.1';
    process.env.STRIPE_PORT ??= String(fakes.stripePort);
    process.env.STRIPE_PROTOCOL ??= 'http';
  }
  const smtpPort = env.SMTP_PORT ?? fakes?.smtpPort ?? 25;

  const database = await openDatabase({ databaseUrl: env.DATABASE_URL, dataDir: path.join(env.DATA_DIR, 'pglite') });
  await migrateDatabase(database);

  const publicPort = env.PORT;
  const apiPort = dev ? publicPort + 1 : publicPort;
  const publicUrl = env.PUBLIC_URL ?? `http://localhost:${publicPort}`;
  const mailer = createMailer({ host: env.SMTP_HOST, port: smtpPort, from: env.MAIL_FROM });
  const auth = createAuth({ db: database.db, secret: authSecret(env.BETTER_AUTH_SECRET, env.DATA_DIR, production), baseURL: publicUrl, mailer });

  if (env.SEED_DEMO === 'true') {
    const { seeded } = await seedDemo({ db: database.db, auth, uploadsDir: env.UPLOADS_DIR, log: (m) => console.log(`[seed] ${m}`) });
    if (seeded) console.log('[seed] demo data written');
  }

  const app = createApp({
    db: database.db, auth, mailer, uploadsDir: env.UPLOADS_DIR,
    clientDir: dev ? undefined : 'dist', trustedOrigins: [publicUrl],
  });
  const jobs = startBackgroundJobs({ db: database.db, mailer, publicUrl });
  const server: Server = await new Promise((resolve) => {
    const s = app.listen(apiPort, env.HOST, () => resolve(s));
  });

  let vite: { close(): Promise<void> } | null = null;
  if (dev) {
    process.env.API_PROXY_TARGET = `http://127.0.0.1:${apiPort}`;
    const { createServer } = await import('vite');
    const viteServer = await createServer({ server: { port: publicPort, host: env.HOST, strictPort: true } });
    await viteServer.listen();
    vite = viteServer;
  }

  console.log(`\nStickerline is up: ${publicUrl}${dev ? ' (Vite dev server, API behind its proxy)' : ''}`);
  if (fakes) {
    console.log(`  Mail catcher inbox: http://127.0.0.1:${fakes.mailWebPort}  (SMTP ${fakes.smtpPort})`);
    console.log(`  Payment fake (test mode): http://127.0.0.1:${fakes.stripePort}`);
  }
  console.log(`  Database: ${database.kind === 'postgres' ? 'PostgreSQL server (DATABASE_URL)' : path.resolve(env.DATA_DIR, 'pglite')}`);
  if (!production && env.SEED_DEMO === 'true') {
    console.log('  Demo accounts (demo only — change or remove before real use):');
    for (const a of DEMO_ACCOUNTS) console.log(`    ${a.role.padEnd(6)} ${a.email}  /  ${a.password}`);
  }

  const shutdown = async () => {
    jobs.stop();
    await vite?.close();
    await new Promise((r) => server.close(() => r(null)));
    mailer.close();
    await database.close();
    await fakes?.stop();
    process.exit(0);
  };
  process.once('SIGINT', shutdown);
  process.once('SIGTERM', shutdown);
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
