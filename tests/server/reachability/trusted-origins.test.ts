import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { readEnv } from '../../../server/env';
import { shopOrigins } from '../../../server/lib/shop-origins';
import { createTestApp, type TestApp } from '../../helpers/test-app';

// Invented addresses: the yard office machine on the mill's network, and the shop's internet name.
const YARD_LAN = 'http://192.168.40.12:3000';
const INTERNET = 'https://slabs.varrow-creek.example';

const hasSessionCookie = (res: request.Response) =>
  ([] as string[]).concat(res.headers['set-cookie'] ?? []).some((c) => /session_token=[^;]/.test(c));

describe('which origins the shop trusts', () => {
  it('in development trusts the public address plus both localhost and 127.0.0.1 on the port', () => {
    const env = readEnv({ NODE_ENV: 'development', PORT: '3000', PUBLIC_URL: YARD_LAN });
    expect(shopOrigins(env)).toEqual({
      publicUrl: YARD_LAN,
      trustedOrigins: [YARD_LAN, 'http://localhost:3000', 'http://127.0.0.1:3000'],
    });
  });

  it('in production trusts only PUBLIC_URL and TRUSTED_ORIGINS', () => {
    const env = readEnv({ NODE_ENV: 'production', PORT: '3000', PUBLIC_URL: `${INTERNET}/`, TRUSTED_ORIGINS: `${YARD_LAN}, http://yard-desk.varrow.example:3000/` });
    expect(shopOrigins(env)).toEqual({
      publicUrl: INTERNET,
      trustedOrigins: [INTERNET, YARD_LAN, 'http://yard-desk.varrow.example:3000'],
    });
  });

  it('without PUBLIC_URL the public address is http://localhost on the port', () => {
    expect(shopOrigins(readEnv({ PORT: '4100' })).publicUrl).toBe('http://localhost:4100');
  });

  it('refuses to start on a trusted origin that is not an http(s) address', () => {
    expect(() => readEnv({ TRUSTED_ORIGINS: `${YARD_LAN},ftp://yard.example` })).toThrow(/TRUSTED_ORIGINS.*ftp:\/\/yard\.example/s);
    expect(() => readEnv({ TRUSTED_ORIGINS: 'yard-desk' })).toThrow(/TRUSTED_ORIGINS/);
  });

  it('reads TRUST_PROXY as off, on, a hop count or a list of addresses, and refuses nonsense', () => {
    expect(readEnv({}).TRUST_PROXY).toBe(false);
    expect(readEnv({ TRUST_PROXY: '' }).TRUST_PROXY).toBe(false);
    expect(readEnv({ TRUST_PROXY: 'false' }).TRUST_PROXY).toBe(false);
    expect(readEnv({ TRUST_PROXY: 'true' }).TRUST_PROXY).toBe(true);
    expect(readEnv({ TRUST_PROXY: '1' }).TRUST_PROXY).toBe(1);
    expect(readEnv({ TRUST_PROXY: 'loopback, 10.8.0.0/16,192.168.40.2' }).TRUST_PROXY).toEqual(['loopback', '10.8.0.0/16', '192.168.40.2']);
    expect(() => readEnv({ TRUST_PROXY: 'the proxy' })).toThrow(/TRUST_PROXY/);
    expect(() => readEnv({ TRUST_PROXY: '10.0.0.0/40' })).toThrow(/TRUST_PROXY/);
  });

  it('treats an empty value in the environment as not set', () => {
    const env = readEnv({ PUBLIC_URL: '', TRUSTED_ORIGINS: '' });
    expect(env.PUBLIC_URL).toBeUndefined();
    expect(env.TRUSTED_ORIGINS).toEqual([]);
  });
});

describe('signing in from the trusted origins', () => {
  let t: TestApp;
  let account: { email: string; password: string };
  const { trustedOrigins } = shopOrigins(readEnv({ NODE_ENV: 'development', PORT: '3000', PUBLIC_URL: YARD_LAN, TRUSTED_ORIGINS: INTERNET }));
  beforeAll(async () => {
    t = await createTestApp({ publicUrl: YARD_LAN, trustedOrigins });
    account = await t.signedInAs('seller');
  });
  afterAll(() => t.close());

  for (const origin of [YARD_LAN, INTERNET, 'http://localhost:3000', 'http://127.0.0.1:3000']) {
    it(`signs in from ${origin}`, async () => {
      const res = await request(t.app).post('/api/auth/sign-in/email').set('Origin', origin).send(account);
      expect(res.status).toBe(200);
      expect(hasSessionCookie(res)).toBe(true);
    });
  }

  for (const origin of ['http://192.168.40.99:3000', 'https://slabs.varrow-creek.example:8443', 'http://localhost:3001', 'https://slab-bargains.example']) {
    it(`refuses a sign-in from ${origin} and sets no session`, async () => {
      const res = await request(t.app).post('/api/auth/sign-in/email').set('Origin', origin).send(account);
      expect(res.status).toBe(403);
      expect(hasSessionCookie(res)).toBe(false);
    });
  }

  it('lets a signed-in phone on the yard network change data, and refuses the same from an untrusted origin', async () => {
    const seller = await t.signedInAs('seller');
    const ok = await seller.agent.post('/api/logs').set('Origin', YARD_LAN).send({});
    expect(ok.status).toBe(400); // through the origin check, stopped by validation
    const refused = await seller.agent.post('/api/logs').set('Origin', 'http://192.168.40.99:3000').send({});
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('cross_origin');
  });
});

describe('behind a TLS proxy', () => {
  it('sets Secure session cookies when the public address is https', async () => {
    const t = await createTestApp({ publicUrl: INTERNET });
    try {
      const { email, password } = await t.signedInAs('buyer');
      const res = await request(t.app).post('/api/auth/sign-in/email').set('Origin', INTERNET).send({ email, password });
      expect(res.status).toBe(200);
      const session = ([] as string[]).concat(res.headers['set-cookie'] ?? []).find((c) => /session_token=/.test(c));
      expect(session).toMatch(/^__Secure-/);
      expect(session).toMatch(/;\s*Secure/i);
    } finally {
      await t.close();
    }
  });
});
