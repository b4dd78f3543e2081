import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { sql } from 'drizzle-orm';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../../helpers/test-app';

let t: TestApp;
beforeAll(async () => { t = await createTestApp(); });
afterAll(() => t.close());

describe('a person keeps their units on their account', () => {
  it('starts with no choice, keeps metric once chosen, and another account is untouched', async () => {
    const wren = await t.signedInAs('buyer');
    const ash = await t.signedInAs('buyer');
    expect((await wren.agent.get('/api/me/preferences')).body).toEqual({ units: null });

    const saved = await wren.agent.put('/api/me/preferences').set('Origin', TEST_ORIGIN).send({ units: 'metric' });
    expect(saved.status).toBe(200);
    expect(saved.body).toEqual({ units: 'metric' });
    expect((await wren.agent.get('/api/me/preferences')).body).toEqual({ units: 'metric' });
    expect((await ash.agent.get('/api/me/preferences')).body).toEqual({ units: null });
  });

  it('refuses an unknown unit system with a message at the field', async () => {
    const wren = await t.signedInAs('buyer');
    const res = await wren.agent.put('/api/me/preferences').set('Origin', TEST_ORIGIN).send({ units: 'cubits' });
    expect(res.status).toBe(400);
    expect(res.body.error.fieldErrors.units[0]).toMatch(/inches and pounds, or millimetres/);
  });

  it('asks a visitor to sign in', async () => {
    expect((await request(t.app).get('/api/me/preferences')).status).toBe(401);
    expect((await request(t.app).put('/api/me/preferences').set('Origin', TEST_ORIGIN).send({ units: 'metric' })).status).toBe(401);
  });

  it('the database itself refuses a unit system it does not know', async () => {
    const wren = await t.signedInAs('buyer');
    const failure = await t.db.execute(sql`update "user" set units = 'cubits' where id = ${wren.id}`).then(() => null, (e: Error & { cause?: Error }) => e);
    expect(String(failure?.cause?.message ?? failure?.message)).toMatch(/user_units_known/);
  });
});
