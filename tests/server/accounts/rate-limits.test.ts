import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../../helpers/test-app';
import { CLIENT_IP_HEADER } from '../../../server/lib/auth';
import { SIGN_IN_FAILURES_PER_ACCOUNT } from '../../../shared/accounts';

// The app trusts X-Forwarded-For only from a loopback proxy, which is what supertest looks like,
// so each test picks its own documentation-range addresses (RFC 5737) to stay out of the others' way.
// Two apps: one with a per-address limit of 3, one with the default high limit so that creating
// accounts for the per-account tests does not run into the per-address limit.
let strict: TestApp;
let t: TestApp;
let n = 0;
beforeAll(async () => {
  strict = await createTestApp({ signInLimitPerMinute: 3 });
  t = await createTestApp();
});
afterAll(async () => { await strict.close(); await t.close(); });

const signInTo = (app: TestApp['app'], ip: string, email: string, password: string, extra: Record<string, string> = {}) =>
  request(app).post('/api/auth/sign-in/email').set('Origin', TEST_ORIGIN).set('X-Forwarded-For', ip).set(extra).send({ email, password });
const strictSignIn = (ip: string, email: string, password: string, extra: Record<string, string> = {}) =>
  signInTo(strict.app, ip, email, password, extra);
const signIn = (ip: string, email: string, password: string) => signInTo(t.app, ip, email, password);
const stranger = () => `stranger-${++n}@example.test`;

describe('per-address limit (auth library)', () => {
  it('when one address tries a fourth sign-in within a minute, it answers 429', async () => {
    const ip = '198.51.100.10';
    for (let i = 0; i < 3; i++) expect((await strictSignIn(ip, stranger(), 'wrong password 1')).status).toBe(401);
    expect((await strictSignIn(ip, stranger(), 'wrong password 1')).status).toBe(429);
  });

  it('keeps other addresses out of that count', async () => {
    for (let i = 0; i < 3; i++) await strictSignIn('198.51.100.20', stranger(), 'wrong password 1');
    expect((await strictSignIn('198.51.100.21', stranger(), 'wrong password 1')).status).toBe(401);
  });

  it('ignores a client-sent copy of the internal client-address header', async () => {
    const ip = '198.51.100.30';
    const statuses: number[] = [];
    for (let i = 0; i < 4; i++) {
      statuses.push((await strictSignIn(ip, stranger(), 'wrong password 1', { [CLIENT_IP_HEADER]: `192.0.2.${i + 1}` })).status);
    }
    expect(statuses).toEqual([401, 401, 401, 429]);
  });
});

describe('per-account limit', () => {
  it(`after ${SIGN_IN_FAILURES_PER_ACCOUNT} wrong passwords from different addresses, even the right one gets 429 for a while`, async () => {
    const { email, password } = await t.signedInAs('buyer');
    for (let i = 0; i < SIGN_IN_FAILURES_PER_ACCOUNT; i++) {
      expect((await signIn(`203.0.113.${i + 1}`, email, 'a wrong guess here')).status).toBe(401);
    }
    const blocked = await signIn('203.0.113.99', email.toUpperCase(), password);
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('account_paused');
    expect(blocked.body.error.message).toMatch(/wait \d+ minute/i);
    expect(Number(blocked.headers['retry-after'])).toBeGreaterThan(0);
    expect(blocked.headers['set-cookie']).toBeUndefined();
  });

  it('cannot be dodged by sending the sign-in form-encoded instead of as JSON', async () => {
    const { email, password } = await t.signedInAs('buyer');
    const res = await request(t.app).post('/api/auth/sign-in/email').set('Origin', TEST_ORIGIN).set('X-Forwarded-For', '203.0.113.200')
      .type('form').send({ email, password });
    expect(res.status).toBe(415);
    expect(res.headers['set-cookie']).toBeUndefined();
  });

  it('does not pause other accounts', async () => {
    const paused = await t.signedInAs('buyer');
    const other = await t.signedInAs('buyer');
    for (let i = 0; i < SIGN_IN_FAILURES_PER_ACCOUNT; i++) await signIn(`203.0.113.${110 + i}`, paused.email, 'a wrong guess here');
    expect((await signIn('203.0.113.120', other.email, other.password)).status).toBe(200);
  });

  it('a successful sign-in clears the earlier failures', async () => {
    const { email, password } = await t.signedInAs('buyer');
    const ips = (base: number) => Array.from({ length: SIGN_IN_FAILURES_PER_ACCOUNT - 1 }, (_, i) => `203.0.113.${base + i}`);
    for (const ip of ips(130)) await signIn(ip, email, 'a wrong guess here');
    expect((await signIn('203.0.113.140', email, password)).status).toBe(200);
    for (const ip of ips(150)) await signIn(ip, email, 'a wrong guess here');
    expect((await signIn('203.0.113.160', email, password)).status).toBe(200);
  });
});
