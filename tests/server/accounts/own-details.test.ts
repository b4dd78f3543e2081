import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { eq } from 'drizzle-orm';
import { createTestApp, mailTo, TEST_ORIGIN, waitForMail, type TestApp } from '../../helpers/test-app';
import { user } from '../../../server/db/schema/index';

let t: TestApp;
beforeAll(async () => { t = await createTestApp(); });
afterAll(() => t.close());

type Agent = ReturnType<typeof request.agent>;
const post = (agent: Agent | ReturnType<typeof request>, path: string, body: object) => agent.post(path).set('Origin', TEST_ORIGIN).send(body);
const emailOf = async (id: string) => (await t.db.select().from(user).where(eq(user.id, id)))[0];

describe('a buyer changes their own name', () => {
  it('the new name is saved and shows on /api/me', async () => {
    const { agent, id } = await t.signedInAs('buyer', 'Bryn Oldcastle');
    expect((await post(agent, '/api/auth/update-user', { name: '  Bryn Hollowell ' })).status).toBe(200);
    expect((await agent.get('/api/me')).body.user.name).toBe('Bryn Hollowell');
    expect((await emailOf(id)).name).toBe('Bryn Hollowell');
  });

  it('an empty or over-long name is refused at the field (400) and nothing changes', async () => {
    const { agent, id } = await t.signedInAs('buyer', 'Cade Millward');
    const empty = await post(agent, '/api/auth/update-user', { name: '   ' });
    expect(empty.status).toBe(400);
    expect(empty.body.error.fieldErrors.name).toEqual(['Enter your name']);
    expect((await post(agent, '/api/auth/update-user', { name: 'x'.repeat(81) })).status).toBe(400);
    expect((await emailOf(id)).name).toBe('Cade Millward');
  });

  it('only the name can be sent: a role, e-mail or image in the body is refused (400)', async () => {
    const { agent, id } = await t.signedInAs('buyer');
    expect((await post(agent, '/api/auth/update-user', { name: 'Dell', role: 'admin' })).status).toBe(400);
    expect((await post(agent, '/api/auth/update-user', { name: 'Dell', email: 'x@example.test' })).status).toBe(400);
    expect((await emailOf(id)).role).toBe('buyer');
  });

  it('a visitor cannot change any name (401)', async () => {
    expect((await post(request(t.app), '/api/auth/update-user', { name: 'Nobody' })).status).toBe(401);
  });
});

describe('a buyer changes their own e-mail', () => {
  it('the address changes only after the link sent to the new address is opened', async () => {
    const { agent, id, email, password } = await t.signedInAs('buyer', 'Esme Tarrant');
    const newEmail = `esme.${Date.now()}@example.test`;
    const asked = await post(agent, '/api/auth/change-email', { newEmail, callbackURL: '/account?email=changed' });
    expect(asked.status).toBe(200);
    expect((await emailOf(id)).email).toBe(email);

    const mail = await waitForMail(newEmail, (m) => m.subject === 'Confirm your new e-mail for Stickerline');
    expect(mail.text).toContain('Esme Tarrant');
    expect(await mailTo(email)).toEqual([]);
    const link = new URL(/http:\/\/\S+verify-email\S+/.exec(mail.text)![0]);
    const opened = await agent.get(link.pathname + link.search);
    expect(opened.status).toBe(302);
    expect(opened.headers.location).toBe('/account?email=changed');
    expect((await emailOf(id)).email).toBe(newEmail);

    // The new address signs in with the same password; the old one no longer does.
    expect((await post(request(t.app), '/api/auth/sign-in/email', { email: newEmail, password })).status).toBe(200);
    expect((await post(request(t.app), '/api/auth/sign-in/email', { email, password })).status).toBe(401);
  });

  it('a malformed address is refused at the field (400)', async () => {
    const { agent } = await t.signedInAs('buyer');
    const res = await post(agent, '/api/auth/change-email', { newEmail: 'not-an-address' });
    expect(res.status).toBe(400);
    expect(res.body.error.fieldErrors.newEmail).toEqual(['Enter a valid e-mail']);
  });

  it('a link sent to the new address is useless to someone signed in as another person', async () => {
    const owner = await t.signedInAs('buyer');
    const other = await t.signedInAs('buyer');
    const newEmail = `taken.${Date.now()}@example.test`;
    await post(owner.agent, '/api/auth/change-email', { newEmail });
    const mail = await waitForMail(newEmail, () => true);
    const link = new URL(/http:\/\/\S+verify-email\S+/.exec(mail.text)![0]);
    await other.agent.get(link.pathname + link.search);
    expect((await emailOf(owner.id)).email).toBe(owner.email);
    expect((await emailOf(other.id)).email).toBe(other.email);
  });
});
