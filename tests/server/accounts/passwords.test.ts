import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createTestApp, mailTo, TEST_ORIGIN, waitForMail, type TestApp } from '../../helpers/test-app';

let t: TestApp;
let n = 0;
beforeAll(async () => { t = await createTestApp(); });
afterAll(() => t.close());

// Each test its own address (RFC 5737 range) so the library's per-address limits stay apart.
const from = () => `192.0.2.${++n}`;
const post = (agent: ReturnType<typeof request.agent> | ReturnType<typeof request>, path: string, body: object, ip = from()) =>
  agent.post(path).set('Origin', TEST_ORIGIN).set('X-Forwarded-For', ip).send(body);

describe('change password', () => {
  it('after changing the password, the new one signs in and the old one does not', async () => {
    const { agent, email, password } = await t.signedInAs('buyer');
    const newPassword = 'a fresh new password';
    const change = await post(agent, '/api/auth/change-password', { currentPassword: password, newPassword });
    expect(change.status).toBe(200);

    expect((await post(request(t.app), '/api/auth/sign-in/email', { email, password: newPassword })).status).toBe(200);
    expect((await post(request(t.app), '/api/auth/sign-in/email', { email, password })).status).toBe(401);
  });

  it('refuses a change when the current password is wrong', async () => {
    const { agent, email, password } = await t.signedInAs('buyer');
    const change = await post(agent, '/api/auth/change-password', { currentPassword: 'not my password!', newPassword: 'another new password' });
    expect(change.status).toBeGreaterThanOrEqual(400);
    expect((await post(request(t.app), '/api/auth/sign-in/email', { email, password })).status).toBe(200);
  });

  it('refuses a new password shorter than 10 characters', async () => {
    const { agent, password } = await t.signedInAs('buyer');
    const change = await post(agent, '/api/auth/change-password', { currentPassword: password, newPassword: 'short1' });
    expect(change.status).toBe(400);
  });
});

describe('password reset by e-mail', () => {
  it('the link in the reset e-mail leads to the reset page with a token that sets a new password', async () => {
    const { agent, email, password } = await t.signedInAs('buyer');
    const asked = await post(request(t.app), '/api/auth/request-password-reset', { email, redirectTo: `${TEST_ORIGIN}/reset-password` });
    expect(asked.status).toBe(200);

    const mail = await waitForMail(email, (m) => /reset/i.test(m.subject));
    const link = new URL(/https?:\/\/\S+/.exec((mail as { text: string }).text)![0]);
    expect(link.origin).toBe(TEST_ORIGIN);
    const landing = await request(t.app).get(link.pathname + link.search);
    expect(landing.status).toBe(302);
    const target = new URL(landing.headers.location, TEST_ORIGIN);
    expect(target.origin + target.pathname).toBe(`${TEST_ORIGIN}/reset-password`);
    const token = target.searchParams.get('token');
    expect(token).toBeTruthy();

    const reset = await post(request(t.app), '/api/auth/reset-password', { token, newPassword: 'brand new password' });
    expect(reset.status).toBe(200);
    expect((await post(request(t.app), '/api/auth/sign-in/email', { email, password: 'brand new password' })).status).toBe(200);
    expect((await post(request(t.app), '/api/auth/sign-in/email', { email, password })).status).toBe(401);
    // Sessions from before the reset end with it.
    expect((await agent.get('/api/me')).body.user).toBeNull();
    // A token works once.
    expect((await post(request(t.app), '/api/auth/reset-password', { token, newPassword: 'yet another password' })).status).toBe(400);
  });

  it('answers the same for an unknown e-mail and sends nothing', async () => {
    const { email } = await t.signedInAs('buyer');
    const known = await post(request(t.app), '/api/auth/request-password-reset', { email, redirectTo: `${TEST_ORIGIN}/reset-password` });
    const ghost = `ghost-${Date.now()}@example.test`;
    const unknown = await post(request(t.app), '/api/auth/request-password-reset', { email: ghost, redirectTo: `${TEST_ORIGIN}/reset-password` });
    expect(unknown.status).toBe(known.status);
    expect(unknown.body).toEqual(known.body);
    await new Promise((r) => setTimeout(r, 300));
    expect(await mailTo(ghost)).toHaveLength(0);
  });

  it('refuses a reset link that would send the person to another site', async () => {
    const { email } = await t.signedInAs('buyer');
    const res = await post(request(t.app), '/api/auth/request-password-reset', { email, redirectTo: 'https://elsewhere.example/steal' });
    expect(res.status).toBe(403);
    await new Promise((r) => setTimeout(r, 300));
    expect(await mailTo(email)).toHaveLength(0);
  });
});
