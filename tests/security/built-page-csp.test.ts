import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import request from 'supertest';
import { build } from 'vite';
import { createApp } from '../../server/app';
import { createPayments } from '../../server/lib/payments';
import { createTestApp, type TestApp } from '../helpers/test-app';

// A fresh production build in a temp folder: checking a stale dist/ would prove nothing.
const outDir = fs.mkdtempSync(path.join(os.tmpdir(), 'stickerline-dist-'));
let t: TestApp;
let html: string;
let app: ReturnType<typeof createApp>;

beforeAll(async () => {
  await build({ logLevel: 'error', build: { outDir, emptyOutDir: true } });
  html = fs.readFileSync(path.join(outDir, 'index.html'), 'utf8');
  t = await createTestApp();
  // Same deps as the test app, plus the built client, as `npm start` serves it.
  const payments = createPayments({ secretKey: 'sk_test_local_fake', host: '127.0.0.1', port: inject('stripePort'), protocol: 'http', webhookSecret: 'whsec_test_only' });
  app = createApp({ db: t.db, auth: t.auth, mailer: t.mailer, payments, uploadsDir: t.uploadsDir, clientDir: outDir });
}, 600_000);
afterAll(async () => {
  await t?.close();
  fs.rmSync(outDir, { recursive: true, force: true });
});

describe('the built page under the content security policy', () => {
  it('has no inline script, no inline event handler and no javascript: link in index.html', () => {
    const scripts = [...html.matchAll(/<script\b([^>]*)>([\s\S]*?)<\/script>/gi)];
    expect(scripts.length).toBeGreaterThan(0);
    for (const [, attrs, body] of scripts) {
      expect(attrs, 'every script is loaded from a file').toMatch(/\bsrc="\/[^"]+"/);
      expect(body.trim()).toBe('');
    }
    expect(html).not.toMatch(/\son[a-z]+\s*=/i);
    expect(html).not.toMatch(/javascript:/i);
  });

  it('loads every script and stylesheet from the shop itself, and each is served', async () => {
    const refs = [...html.matchAll(/\s(?:src|href)="([^"]+\.(?:js|css))"/g)].map((m) => m[1]);
    expect(refs.length).toBeGreaterThan(0);
    for (const ref of refs) {
      expect(ref.startsWith('/'), `${ref} is same-origin`).toBe(true);
      const res = await request(app).get(ref);
      expect(res.status, ref).toBe(200);
    }
  });

  it('serves the app shell for a client route with the policy header set', async () => {
    const res = await request(app).get('/slabs');
    expect(res.status).toBe(200);
    expect(res.text).toContain('<div id="root">');
    expect(res.headers['content-security-policy']).toMatch(/script-src 'self'(;|$)/);
  });
});
