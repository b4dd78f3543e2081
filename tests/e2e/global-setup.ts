import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { readEnv } from '../../server/env';
import { freePort } from '../../server/lib/free-port';
import { startStickerline, type Running } from '../../server/start';
import { createLogger } from '../../server/lib/logger';

/**
 * Once per browser run: start the REAL product in this process — built client from dist/,
 * migrations, demo yard and accounts, mail catcher and payment fake — on a free port, with its
 * own throw-away data and uploads folders. Seeding the demo yard (photos included) is the slow
 * part, so every journey file shares this one server; journeys pick different slabs.
 */
export default async function setup(project: TestProject) {
  // While writing journeys, `npx tsx scripts/e2e-server.ts` keeps one product running between runs.
  const reuse = process.env.STICKERLINE_E2E_URL;
  if (reuse) {
    project.provide('e2eUrl', reuse);
    project.provide('e2eMailWebPort', Number(process.env.STICKERLINE_E2E_MAIL_PORT));
    return;
  }
  if (!fs.existsSync(path.resolve('dist/index.html'))) {
    throw new Error('No built client in dist/: run `npm run test:browser` (it builds first) or `npx vite build`.');
  }
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'stickerline-e2e-data-'));
  const uploadsDir = fs.mkdtempSync(path.join(os.tmpdir(), 'stickerline-e2e-uploads-'));
  const removeDirs = () => {
    fs.rmSync(dataDir, { recursive: true, force: true });
    fs.rmSync(uploadsDir, { recursive: true, force: true });
  };
  const port = await freePort();
  // 127.0.0.1 rather than localhost: the API only accepts changes from its own public origin.
  const url = `http://127.0.0.1:${port}`;
  let running: Running;
  try {
    const env = readEnv({
      ...process.env, NODE_ENV: 'test', PORT: String(port), PUBLIC_URL: url, DATA_DIR: dataDir, UPLOADS_DIR: uploadsDir,
      START_LOCAL_FAKES: 'true', SEED_DEMO: 'true', BETTER_AUTH_SECRET: 'e2e-only-secret-e2e-only-secret-0123456789',
      // Never borrow a developer's real services from their shell.
      DATABASE_URL: undefined, SMTP_HOST: undefined, SMTP_PORT: undefined, STRIPE_HOST: undefined, STRIPE_PORT: undefined,
      STRIPE_PROTOCOL: undefined, MAILDEV_WEB_PORT: undefined,
    });
    const started = performance.now();
    running = await startStickerline({ env, logger: createLogger({ level: 'warn' }) });
    console.log(`[e2e] Stickerline up at ${url} in ${((performance.now() - started) / 1000).toFixed(1)} s`);
  } catch (e) {
    removeDirs();
    throw e;
  }
  project.provide('e2eUrl', url);
  project.provide('e2eMailWebPort', running.fakes!.mailWebPort);
  return async () => {
    await running.stop().catch((e) => console.error('[e2e] stopping Stickerline failed', e));
    removeDirs();
  };
}

declare module 'vitest' {
  export interface ProvidedContext {
    e2eUrl: string;
    e2eMailWebPort: number;
  }
}
