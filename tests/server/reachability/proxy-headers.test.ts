import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createTestApp, type TestApp } from '../../helpers/test-app';

// The auth library keeps its per-address counts in one table per process, so this file signs in
// from the loopback address only in the first test (a file of its own gets a fresh table).
describe('proxy headers', () => {
  let direct: TestApp;
  let proxied: TestApp;
  beforeAll(async () => {
    direct = await createTestApp({ signInLimitPerMinute: 2, trustProxy: false });
    proxied = await createTestApp({ signInLimitPerMinute: 2, trustProxy: ['loopback'] });
  });
  afterAll(async () => { await direct.close(); await proxied.close(); });

  const wrongSignIn = (t: TestApp, forwardedFor: string, n: number) =>
    request(t.app).post('/api/auth/sign-in/email').set('Origin', 'http://localhost:3000').set('X-Forwarded-For', forwardedFor)
      .send({ email: `nobody-${n}@example.test`, password: 'not the password' });

  it('without TRUST_PROXY, X-Forwarded-For is ignored: every made-up address shares the caller\'s sign-in limit', async () => {
    const statuses = [];
    for (let i = 0; i < 3; i++) statuses.push((await wrongSignIn(direct, `203.0.113.${i + 1}`, i)).status);
    expect(statuses).toEqual([401, 401, 429]);
  });

  it('with TRUST_PROXY naming the proxy, each forwarded client address gets its own limit', async () => {
    const statuses = [];
    for (let i = 0; i < 3; i++) statuses.push((await wrongSignIn(proxied, `203.0.113.${i + 1}`, i)).status);
    expect(statuses).toEqual([401, 401, 401]);
  });

  it('reads https from X-Forwarded-Proto only when the proxy is trusted', async () => {
    // The shop's own host over https, as the proxy would forward it; not in the trusted list,
    // so only a correct reading of the scheme makes Origin match the shop itself.
    const send = (t: TestApp) => request(t.app).post('/api/slabs/1/hold').set('Host', 'yard-shop.varrow.example')
      .set('X-Forwarded-Proto', 'https').set('Origin', 'https://yard-shop.varrow.example').send({});
    expect((await send(proxied)).status).toBe(401); // through the origin check; signed out
    const refused = await send(direct);
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('cross_origin');
  });
});
