import fs from 'node:fs';
import path from 'node:path';
import { readEnv, wantsDemoData } from './env';
import { startStickerline } from './start';
import { DEMO_ACCOUNTS } from './seed/demo-data';
import { createLogger, loggerOptionsFor, setLogger } from './lib/logger';

/** `npm start` (built client) and `npm run dev` (Vite with hot reload in front of the API). */
async function main() {
  const dev = process.argv.includes('--dev');
  // Settings from a local .env file; anything already in the environment wins.
  if (fs.existsSync('.env')) process.loadEnvFile('.env');
  const env = readEnv();
  const logger = createLogger(loggerOptionsFor(env));
  setLogger(logger);
  const running = await startStickerline({ env, dev, logger });
  const { fakes, database } = running;

  logger.info({
    url: running.url, dev, database: database.kind === 'postgres' ? 'postgres (DATABASE_URL)' : path.resolve(env.DATA_DIR, 'pglite'),
    ...(fakes ? { mailInbox: `http://127.0.0.1:${fakes.mailWebPort}`, smtpPort: fakes.smtpPort, paymentFake: `http://127.0.0.1:${fakes.stripePort}` } : {}),
  }, `Stickerline is up: ${running.url}${dev ? ' (Vite dev server, API behind its proxy)' : ''}`);
  if (env.NODE_ENV !== 'production' && wantsDemoData(env)) {
    // A note for the person at the terminal, not a log line (logs never carry passwords or whole e-mail addresses).
    const lines = DEMO_ACCOUNTS.map((a) => `    ${a.role.padEnd(6)} ${a.email}  /  ${a.password}`);
    process.stdout.write(`  Demo accounts (demo only — change or remove before real use):\n${lines.join('\n')}\n  Stop with Ctrl+C.\n`);
  }

  let stopping = false;
  const shutdown = async (signal: string) => {
    if (stopping) {
      logger.warn({ part: 'shutdown', signal }, 'second signal: leaving at once');
      process.exit(1);
    }
    stopping = true;
    logger.info({ part: 'shutdown', signal }, 'shutting down: finishing requests in flight');
    const started = Date.now();
    try {
      await running.stop();
      logger.info({ part: 'shutdown', ms: Date.now() - started }, 'stopped cleanly');
      logger.flush();
      process.exit(0);
    } catch (err) {
      logger.error({ part: 'shutdown', err }, 'shutdown failed');
      logger.flush();
      process.exit(1);
    }
  };
  process.on('SIGINT', () => void shutdown('SIGINT'));
  process.on('SIGTERM', () => void shutdown('SIGTERM'));
}

main().catch((err) => {
  // Refusals at start (bad settings, production checks) are read by a person at a terminal or in the
  // journal: plain text, as the checks wrote it.
  process.stderr.write(`${err instanceof Error ? err.message : String(err)}\n`);
  process.exit(1);
});
