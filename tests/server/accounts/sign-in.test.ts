import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { eq } from 'drizzle-orm';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../../helpers/test-app';
import { user } from '../../../server/db/schema/index';

let t: TestApp;
let n = 0;
beforeAll(async () => { t = await createTestApp(); });
afterAll(() => t.close());

const newAccount = () => ({ name: 'Wren Oakhollow', email: `wren-${Date.now()}-${++n}@example.test`, password: 'sawdust and shavings' });

describe('sign-up, sign-in and who am I', () => {
  it('refuses a sign-in sent from another site', async () => {
    const acct = newAccount();
    await request(t.app).post('/api/auth/sign-up/email').set('Origin', TEST_ORIGIN).send(acct);
    const res = await request(t.app).post('/api/auth/sign-in/email').set('Origin', 'https://elsewhere.example')
      .send({ email: acct.email, password: acct.password });
    expect(res.status).toBe(403);
    expect(res.headers['set-cookie']).toBeUndefined();
  });

  it('when a visitor signs up and later signs in, /api/me names them as a buyer', async () => {
    const acct = newAccount();
    const signUp = await request(t.app).post('/api/auth/sign-up/email').set('Origin', TEST_ORIGIN).send(acct);
    expect(signUp.status).toBe(200);

    const agent = request.agent(t.app);
    const signIn = await agent.post('/api/auth/sign-in/email').set('Origin', TEST_ORIGIN).send({ email: acct.email, password: acct.password });
    expect(signIn.status).toBe(200);
    const me = await agent.get('/api/me');
    expect(me.status).toBe(200);
    expect(me.body).toEqual({ user: { id: expect.any(String), email: acct.email, name: acct.name, role: 'buyer' } });
  });

  it('sets the session cookie httpOnly and SameSite=Lax, without Secure over plain http', async () => {
    const res = await request(t.app).post('/api/auth/sign-up/email').set('Origin', TEST_ORIGIN).send(newAccount());
    const cookies = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
    const token = cookies.find((c) => c.includes('session_token='));
    expect(token).toBeDefined();
    expect(token).toMatch(/;\s*HttpOnly/i);
    expect(token).toMatch(/;\s*SameSite=Lax/i);
    expect(token).not.toMatch(/;\s*Secure/i);
  });

  it('a visitor without a session gets { user: null } from /api/me, not an error (no console error on public pages)', async () => {
    const res = await request(t.app).get('/api/me');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ user: null });
  });
});

describe('wrong credentials', () => {
  it('answers 401 with the same body for a wrong password and for an unknown e-mail', async () => {
    const acct = newAccount();
    await request(t.app).post('/api/auth/sign-up/email').set('Origin', TEST_ORIGIN).send(acct);

    const wrongPassword = await request(t.app).post('/api/auth/sign-in/email').set('Origin', TEST_ORIGIN)
      .send({ email: acct.email, password: 'not the password at all' });
    const unknownEmail = await request(t.app).post('/api/auth/sign-in/email').set('Origin', TEST_ORIGIN)
      .send({ email: `nobody-${n}@example.test`, password: 'not the password at all' });

    expect(wrongPassword.status).toBe(401);
    expect(unknownEmail.status).toBe(401);
    expect(unknownEmail.body).toEqual(wrongPassword.body);
    expect(JSON.stringify(wrongPassword.body)).not.toMatch(/not found|no such|does not exist/i);
  });
});

describe('sign-out', () => {
  it('after signing out, the same cookie jar is a visitor again for /api/me', async () => {
    const { agent } = await t.signedInAs('buyer');
    expect((await agent.get('/api/me')).body.user).toMatchObject({ id: expect.any(String) });
    const out = await agent.post('/api/auth/sign-out').set('Origin', TEST_ORIGIN);
    expect(out.status).toBe(200);
    expect((await agent.get('/api/me')).body.user).toBeNull();
  });
});

describe('roles cannot be chosen by the user', () => {
  it('when a sign-up body asks for the admin role, the new account is still a buyer', async () => {
    const acct = newAccount();
    const res = await request(t.app).post('/api/auth/sign-up/email').set('Origin', TEST_ORIGIN).send({ ...acct, role: 'admin' });
    expect(res.status).toBe(400);
    const rows = await t.db.select().from(user).where(eq(user.email, acct.email));
    expect(rows).toHaveLength(0);
  });

  it('when a buyer tries to raise their own role through update-user, the role stays buyer', async () => {
    const { agent, email } = await t.signedInAs('buyer');
    const res = await agent.post('/api/auth/update-user').set('Origin', TEST_ORIGIN).send({ role: 'admin' });
    expect(res.status).toBe(400);
    await agent.post('/api/auth/update-user').set('Origin', TEST_ORIGIN).send({ name: 'Still a buyer', role: 'seller' });
    const [row] = await t.db.select().from(user).where(eq(user.email, email));
    expect(row.role).toBe('buyer');
    expect((await agent.get('/api/me')).body.user.role).toBe('buyer');
  });

  it('when a buyer calls the admin set-role endpoint on themselves, it is refused and nothing changes', async () => {
    const { agent, id, email } = await t.signedInAs('buyer');
    const res = await agent.post('/api/auth/admin/set-role').set('Origin', TEST_ORIGIN).send({ userId: id, role: 'admin' });
    expect(res.status).toBeGreaterThanOrEqual(401);
    expect(res.status).toBeLessThan(500);
    const [row] = await t.db.select().from(user).where(eq(user.email, email));
    expect(row.role).toBe('buyer');
  });
});

describe('banned accounts', () => {
  it('when an account is banned after signing in, its old session counts as signed out', async () => {
    const { agent, id } = await t.signedInAs('seller');
    expect((await agent.get('/api/me')).body.user).toMatchObject({ id: expect.any(String) });
    await t.db.update(user).set({ banned: true }).where(eq(user.id, id));
    expect((await agent.get('/api/me')).body.user).toBeNull();
  });

  it('a ban whose end date has passed no longer keeps the user out', async () => {
    const { agent, id } = await t.signedInAs('buyer');
    await t.db.update(user).set({ banned: true, banExpires: new Date(Date.now() - 60_000) }).where(eq(user.id, id));
    expect((await agent.get('/api/me')).body.user).toMatchObject({ id: expect.any(String) });
  });

  it('a banned account cannot sign in with its correct password', async () => {
    const { email, password, id } = await t.signedInAs('buyer');
    await t.db.update(user).set({ banned: true }).where(eq(user.id, id));
    const agent = request.agent(t.app);
    const res = await agent.post('/api/auth/sign-in/email').set('Origin', TEST_ORIGIN).send({ email, password });
    expect(res.status).not.toBe(200);
    expect((await agent.get('/api/me')).body.user).toBeNull();
  });
});
