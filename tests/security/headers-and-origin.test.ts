import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../helpers/test-app';
import { logRow, slabRow } from '../helpers/fixtures';
import { holds } from '../../server/db/schema/index';

let t: TestApp;
beforeAll(async () => { t = await createTestApp(); });
afterAll(() => t.close());

const FOREIGN = 'https://slab-bargains.example';

describe('session cookie', () => {
  it('is httpOnly, SameSite=Lax and scoped to the whole site when a buyer signs up', async () => {
    const res = await request(t.app).post('/api/auth/sign-up/email').set('Origin', TEST_ORIGIN)
      .send({ email: 'cookie-check@example.test', password: 'correct horse battery', name: 'Ada Quill' });
    expect(res.status).toBe(200);
    const cookies = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
    const session = cookies.find((c) => /session_token=/.test(c));
    expect(session, cookies.join('\n')).toBeDefined();
    expect(session).toMatch(/;\s*HttpOnly/i);
    expect(session).toMatch(/;\s*SameSite=Lax/i);
    expect(session).toMatch(/;\s*Path=\//i);
  });
});

describe('cross-site requests', () => {
  let slabId: number;
  let buyer: Awaited<ReturnType<TestApp['signedInAs']>>;
  beforeAll(async () => {
    slabId = (await slabRow(t.db, await logRow(t.db, 'white-oak'))).id;
    buyer = await t.signedInAs('buyer');
  });

  it('when another site makes a signed-in buyer post a hold, it answers 403 and nothing is held', async () => {
    const res = await buyer.agent.post(`/api/slabs/${slabId}/hold`).set('Origin', FOREIGN).send({});
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('cross_origin');
    expect(await t.db.select().from(holds)).toEqual([]);
  });

  it('refuses a foreign Referer when no Origin is sent, and an unreadable Origin', async () => {
    const byReferer = await buyer.agent.post(`/api/slabs/${slabId}/hold`).set('Referer', `${FOREIGN}/deal`).send({});
    expect(byReferer.status).toBe(403);
    const opaque = await buyer.agent.post(`/api/slabs/${slabId}/hold`).set('Origin', 'null').send({});
    expect(opaque.status).toBe(403);
  });

  it('lets the same request through from the shop itself', async () => {
    const res = await buyer.agent.post(`/api/slabs/${slabId}/hold`).set('Origin', TEST_ORIGIN).send({});
    expect(res.status).toBe(201);
  });

  it('does not let another site sign someone in (the auth endpoints check the origin too)', async () => {
    const res = await request(t.app).post('/api/auth/sign-in/email').set('Origin', FOREIGN)
      .send({ email: buyer.email, password: buyer.password });
    expect(res.status).toBeGreaterThanOrEqual(400);
    expect(([] as string[]).concat(res.headers['set-cookie'] ?? []).some((c) => /session_token=[^;]/.test(c))).toBe(false);
  });
});

describe('security headers', () => {
  it('sends a content security policy that allows scripts from the shop only', async () => {
    const res = await request(t.app).get('/api/health');
    const csp = res.headers['content-security-policy'];
    expect(csp).toMatch(/script-src 'self'(;|$)/);
    expect(csp).toMatch(/object-src 'none'/);
    expect(csp).toMatch(/frame-ancestors 'none'/);
    expect(csp).not.toMatch(/script-src[^;]*unsafe-(inline|eval)/);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['x-powered-by']).toBeUndefined();
  });

  it('serves uploaded files with nosniff and a sandboxing policy, so a file can never run as a page', async () => {
    fs.writeFileSync(path.join(t.uploadsDir, 'probe-display.webp'), Buffer.from('<html><script>alert(1)</script>'));
    const res = await request(t.app).get('/uploads/probe-display.webp');
    expect(res.status).toBe(200);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toMatch(/sandbox/);
    expect(res.headers['content-type']).toMatch(/image\/webp/);
  });

  it('refuses an SVG photo upload, even one named .jpg, and stores no file', async () => {
    const seller = await t.signedInAs('seller');
    const slab = await slabRow(t.db, await logRow(t.db, 'black-walnut'), { photo: false });
    const svg = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>');
    const before = fs.readdirSync(t.uploadsDir).length;
    for (const name of ['slab.svg', 'slab.jpg']) {
      const res = await seller.agent.post(`/api/slabs/${slab.id}/photos`).set('Origin', TEST_ORIGIN)
        .attach('photos', svg, { filename: name, contentType: name.endsWith('.svg') ? 'image/svg+xml' : 'image/jpeg' });
      expect(res.status).toBeGreaterThanOrEqual(400);
      expect(res.status).toBeLessThan(500);
    }
    expect(fs.readdirSync(t.uploadsDir).length).toBe(before);
  });
});

describe('Strict-Transport-Security', () => {
  it('is sent only when the request came over https (directly or through the trusted proxy)', async () => {
    for (const path of ['/api/health', '/api/slabs', '/api/me', '/uploads/none.webp']) {
      const plain = await request(t.app).get(path);
      expect(plain.headers['strict-transport-security'], path).toBeUndefined();
      const secure = await request(t.app).get(path).set('X-Forwarded-Proto', 'https');
      expect(secure.headers['strict-transport-security'], path).toMatch(/max-age=\d{7,}/);
    }
  });
});
