import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { eq } from 'drizzle-orm';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../../helpers/test-app';
import { auditLog, session, user } from '../../../server/db/schema/index';

let t: TestApp;
let admin: Awaited<ReturnType<TestApp['signedInAs']>>;

beforeAll(async () => {
  t = await createTestApp();
  admin = await t.signedInAs('admin', 'Oriel Branth');
});
afterAll(() => t.close());

describe('office users: who may look', () => {
  it.each([
    ['get', '/api/office/users'], ['patch', '/api/office/users/x'], ['get', '/api/office/audit'],
    ['get', '/api/office/numbers'], ['get', '/api/office/holds'], ['delete', '/api/office/holds/1'],
  ] as const)('a visitor gets 401, a buyer and a seller 403 for %s %s', async (method, url) => {
    expect((await request(t.app)[method](url).set('Origin', TEST_ORIGIN).send({})).status).toBe(401);
    for (const role of ['buyer', 'seller'] as const) {
      const { agent } = await t.signedInAs(role);
      expect((await agent[method](url).set('Origin', TEST_ORIGIN).send({})).status).toBe(403);
    }
  });
});

describe('GET /api/office/users', () => {
  it('finds accounts by part of a name or e-mail and filters by role', async () => {
    const seller = await t.signedInAs('seller', 'Wendeline Quarry');
    const byName = await admin.agent.get('/api/office/users?q=wendeline');
    expect(byName.status).toBe(200);
    expect(byName.body.items.map((u: { id: string }) => u.id)).toEqual([seller.id]);
    expect(byName.body.items[0]).toMatchObject({ name: 'Wendeline Quarry', email: seller.email, role: 'seller', disabled: false });
    const admins = await admin.agent.get('/api/office/users?role=admin');
    expect(admins.body.items.every((u: { role: string }) => u.role === 'admin')).toBe(true);
    expect(admins.body.items.map((u: { id: string }) => u.id)).toContain(admin.id);
  });

  it('refuses an unknown role filter with 400', async () => {
    const res = await admin.agent.get('/api/office/users?role=owner');
    expect(res.status).toBe(400);
    expect(res.body.error.fieldErrors.role).toBeDefined();
  });
});

describe('PATCH /api/office/users/:id', () => {
  it('changes a role and records before and after in the audit log', async () => {
    const buyer = await t.signedInAs('buyer');
    const res = await admin.agent.patch(`/api/office/users/${buyer.id}`).set('Origin', TEST_ORIGIN).send({ role: 'seller' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id: buyer.id, role: 'seller' });
    const [row] = await t.db.select().from(user).where(eq(user.id, buyer.id));
    expect(row.role).toBe('seller');
    const audits = await t.db.select().from(auditLog).where(eq(auditLog.entityId, buyer.id));
    expect(audits).toHaveLength(1);
    expect(audits[0]).toMatchObject({ action: 'user.role', entityType: 'user', actorId: admin.id, before: { role: 'buyer', disabled: false }, after: { role: 'seller', disabled: false } });
  });

  it('disabling an account bans it and signs it out everywhere', async () => {
    const buyer = await t.signedInAs('buyer');
    expect((await buyer.agent.get('/api/me')).body.user).toMatchObject({ id: expect.any(String) });
    const res = await admin.agent.patch(`/api/office/users/${buyer.id}`).set('Origin', TEST_ORIGIN).send({ disabled: true });
    expect(res.status).toBe(200);
    expect(res.body.disabled).toBe(true);
    const [row] = await t.db.select().from(user).where(eq(user.id, buyer.id));
    expect(row.banned).toBe(true);
    expect(await t.db.select().from(session).where(eq(session.userId, buyer.id))).toHaveLength(0);
    expect((await buyer.agent.get('/api/me')).body.user).toBeNull();
    const signIn = await request(t.app).post('/api/auth/sign-in/email').set('Origin', TEST_ORIGIN).send({ email: buyer.email, password: buyer.password });
    expect(signIn.status).not.toBe(200);
  });

  it('re-enabling lets the account sign in again', async () => {
    const buyer = await t.signedInAs('buyer');
    await admin.agent.patch(`/api/office/users/${buyer.id}`).set('Origin', TEST_ORIGIN).send({ disabled: true });
    const res = await admin.agent.patch(`/api/office/users/${buyer.id}`).set('Origin', TEST_ORIGIN).send({ disabled: false });
    expect(res.body.disabled).toBe(false);
    const signIn = await request(t.app).post('/api/auth/sign-in/email').set('Origin', TEST_ORIGIN).send({ email: buyer.email, password: buyer.password });
    expect(signIn.status).toBe(200);
  });

  it('refuses to demote or disable the last working admin with 409 and changes nothing', async () => {
    const { db } = t;
    // Make this admin the only one left: demote every other admin directly.
    const others = (await db.select().from(user).where(eq(user.role, 'admin'))).filter((u) => u.id !== admin.id);
    for (const o of others) await db.update(user).set({ role: 'buyer' }).where(eq(user.id, o.id));
    for (const body of [{ role: 'seller' }, { disabled: true }]) {
      const res = await admin.agent.patch(`/api/office/users/${admin.id}`).set('Origin', TEST_ORIGIN).send(body);
      expect(res.status).toBe(409);
      expect(res.body.error.code).toBe('last_admin');
      expect(res.body.error.message).toMatch(/only admin/);
    }
    const [row] = await db.select().from(user).where(eq(user.id, admin.id));
    expect(row).toMatchObject({ role: 'admin', banned: false });
  });

  it('lets an admin step down once another admin exists', async () => {
    const second = await t.signedInAs('admin');
    const res = await second.agent.patch(`/api/office/users/${second.id}`).set('Origin', TEST_ORIGIN).send({ role: 'seller' });
    expect(res.status).toBe(200);
    expect(res.body.role).toBe('seller');
  });

  it('answers 400 for an unknown role or an empty change, and 404 for an unknown account', async () => {
    const buyer = await t.signedInAs('buyer');
    const bad = await admin.agent.patch(`/api/office/users/${buyer.id}`).set('Origin', TEST_ORIGIN).send({ role: 'owner' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fieldErrors.role).toBeDefined();
    expect((await admin.agent.patch(`/api/office/users/${buyer.id}`).set('Origin', TEST_ORIGIN).send({})).status).toBe(400);
    expect((await admin.agent.patch('/api/office/users/nobody').set('Origin', TEST_ORIGIN).send({ role: 'seller' })).status).toBe(404);
  });
});
