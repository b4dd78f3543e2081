/**
 * For writing browser journeys: starts the product the way the e2e global setup does and keeps it
 * running, so journeys can be re-run without re-seeding the demo yard each time:
 *   npx vite build && npx tsx scripts/e2e-server.ts
 *   STICKERLINE_E2E_URL=… STICKERLINE_E2E_MAIL_PORT=… npx vitest run --config vitest.e2e.config.ts
 * Journeys change the data (holds, orders), so restart it for a clean yard.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { readEnv } from '../server/env';
import { freePort } from '../server/lib/free-port';
import { startStickerline } from '../server/start';
import { createLogger } from '../server/lib/logger';

async function main() {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'stickerline-e2e-data-'));
  const uploadsDir = fs.mkdtempSync(path.join(os.tmpdir(), 'stickerline-e2e-uploads-'));
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const env = readEnv({
    ...process.env, NODE_ENV: 'test', PORT: String(port), PUBLIC_URL: url, DATA_DIR: dataDir, UPLOADS_DIR: uploadsDir,
    START_LOCAL_FAKES: 'true', SEED_DEMO: 'true', BETTER_AUTH_SECRET: 'e2e-only-secret-e2e-only-secret-0123456789',
    DATABASE_URL: undefined, SMTP_HOST: undefined, SMTP_PORT: undefined, STRIPE_HOST: undefined, STRIPE_PORT: undefined,
  });
  const running = await startStickerline({ env, logger: createLogger({ level: 'warn' }) });
  console.log(`STICKERLINE_E2E_URL=${url} STICKERLINE_E2E_MAIL_PORT=${running.fakes!.mailWebPort}`);
  const stop = async () => {
    await running.stop();
    fs.rmSync(dataDir, { recursive: true, force: true });
    fs.rmSync(uploadsDir, { recursive: true, force: true });
    process.exit(0);
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

void main();
