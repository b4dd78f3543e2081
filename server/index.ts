import fs from 'node:fs';
import path from 'node:path';
import { readEnv, wantsDemoData } from './env';
import { startStickerline } from './start';
import { DEMO_ACCOUNTS } from './seed/demo-data';

/** `npm start` (built client) and `npm run dev` (Vite with hot reload in front of the API). */
async function main() {
  const dev = process.argv.includes('--dev');
  // Settings from a local .env file; anything already in the environment wins.
  if (fs.existsSync('.env')) process.loadEnvFile('.env');
  const env = readEnv();
  const running = await startStickerline({ env, dev });
  const { fakes, database } = running;

  console.log(`\nStickerline is up: ${running.url}${dev ? ' (Vite dev server, API behind its proxy)' : ''}`);
  if (fakes) {
    console.log(`  Mail catcher inbox: http://127.0.0.1:${fakes.mailWebPort}  (SMTP ${fakes.smtpPort})`);
    console.log(`  Payment fake (test mode): http://127.0.0.1:${fakes.stripePort}`);
  }
  console.log(`  Database: ${database.kind === 'postgres' ? 'PostgreSQL server (DATABASE_URL)' : path.resolve(env.DATA_DIR, 'pglite')}`);
  if (env.NODE_ENV !== 'production' && wantsDemoData(env)) {
    console.log('  Demo accounts (demo only — change or remove before real use):');
    for (const a of DEMO_ACCOUNTS) console.log(`    ${a.role.padEnd(6)} ${a.email}  /  ${a.password}`);
  }
  console.log('  Stop with Ctrl+C.');

  const shutdown = async () => {
    await running.stop();
    process.exit(0);
  };
  process.once('SIGINT', shutdown);
  process.once('SIGTERM', shutdown);
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
