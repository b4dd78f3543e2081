import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../../helpers/test-app';
import { logRow, matchedSetRow, slabRow } from '../../helpers/fixtures';
import { holds, slabs } from '../../../server/db/schema/index';
import { hold, millSettingsRow } from '../checkout/checkout-fixtures';

let t: TestApp;
beforeAll(async () => { t = await createTestApp(); await millSettingsRow(t.db, { holdHours: 24 }); });
afterAll(async () => { await t.close(); });

const slabStatus = async (id: number) => (await t.db.select().from(slabs).where(eq(slabs.id, id)))[0].status;

describe('holding a slab', () => {
  it('when 20 buyers reserve the same slab at once, exactly one wins and the rest get 409', async () => {
    const slab = await slabRow(t.db, await logRow(t.db, 'black-walnut'));
    const buyers = await Promise.all(Array.from({ length: 20 }, () => t.signedInAs('buyer')));
    const results = await Promise.all(buyers.map((b) => hold(b.agent, slab.id)));
    const statuses = results.map((r) => r.status);
    expect(statuses.filter((s) => s === 201)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(19);
    expect(results.find((r) => r.status === 409)!.body.error.message).toMatch(/already on hold for another buyer/);
    expect(await slabStatus(slab.id)).toBe('held');
    expect(await t.db.select().from(holds).where(eq(holds.slabId, slab.id))).toHaveLength(1);
  }, 240_000); // twenty sign-ups hash twenty passwords first

  it('answers 201 with the expiry taken from the mill settings', async () => {
    const slab = await slabRow(t.db, await logRow(t.db, 'black-walnut'));
    const { agent } = await t.signedInAs('buyer');
    const before = Date.now();
    const res = await hold(agent, slab.id);
    expect(res.status).toBe(201);
    const hours = (Date.parse(res.body.hold.expiresAt) - before) / 3_600_000;
    expect(hours).toBeGreaterThan(23.9);
    expect(hours).toBeLessThan(24.1);
  });

  it('refuses visitors with 401', async () => {
    const slab = await slabRow(t.db, await logRow(t.db, 'black-walnut'));
    const res = await (await import('supertest')).default(t.app).post(`/api/slabs/${slab.id}/hold`).set('Origin', TEST_ORIGIN);
    expect(res.status).toBe(401);
  });

  it('refuses slabs that are still drying or already sold with 409, and unknown slabs with 404', async () => {
    const log = await logRow(t.db, 'black-walnut');
    const drying = await slabRow(t.db, log, { status: 'drying' });
    const sold = await slabRow(t.db, log, { status: 'sold' });
    const { agent } = await t.signedInAs('buyer');
    expect((await hold(agent, drying.id)).status).toBe(409);
    const soldRes = await hold(agent, sold.id);
    expect(soldRes.status).toBe(409);
    expect(soldRes.body.error.message).toMatch(/already sold/);
    expect((await hold(agent, 999_999)).status).toBe(404);
  });
});

describe('a buyer’s holds', () => {
  it('lists only the buyer’s own active holds, with slab details and weight', async () => {
    const log = await logRow(t.db, 'black-walnut');
    const [a, b] = [await slabRow(t.db, log), await slabRow(t.db, log)];
    const ann = await t.signedInAs('buyer');
    const ben = await t.signedInAs('buyer');
    await hold(ann.agent, a.id);
    await hold(ben.agent, b.id);
    const res = await ann.agent.get('/api/holds');
    expect(res.status).toBe(200);
    expect(res.body.holds.map((h: { slabId: number }) => h.slabId)).toEqual([a.id]);
    expect(res.body.holds[0].slab.code).toBe(a.code);
    expect(res.body.holds[0].slab.weightLb).toBeGreaterThan(0);
  });

  it('releasing a hold puts the slab back on sale; another buyer cannot release it (404)', async () => {
    const slab = await slabRow(t.db, await logRow(t.db, 'black-walnut'));
    const owner = await t.signedInAs('buyer');
    const other = await t.signedInAs('buyer');
    const { body } = await hold(owner.agent, slab.id);
    expect((await other.agent.delete(`/api/holds/${body.hold.id}`).set('Origin', TEST_ORIGIN)).status).toBe(404);
    expect(await slabStatus(slab.id)).toBe('held');
    expect((await owner.agent.delete(`/api/holds/${body.hold.id}`).set('Origin', TEST_ORIGIN)).status).toBe(204);
    expect(await slabStatus(slab.id)).toBe('listed');
    expect((await hold(other.agent, slab.id)).status).toBe(201);
  });
});

describe('a book-matched pair', () => {
  it('holds two slabs the yard marked as a pair together, under one group', async () => {
    const log = await logRow(t.db, 'black-walnut');
    const [a, b] = [await slabRow(t.db, log), await slabRow(t.db, log)];
    await matchedSetRow(t.db, [a, b]);
    const { agent } = await t.signedInAs('buyer');
    const res = await agent.post('/api/holds/matched-set').set('Origin', TEST_ORIGIN).send({ slabIds: [a.id, b.id] });
    expect(res.status).toBe(201);
    expect(res.body.holds).toHaveLength(2);
    expect(res.body.holds[0].groupId).toBeTruthy();
    expect(res.body.holds[0].groupId).toBe(res.body.holds[1].groupId);
  });

  it('holds neither slab when one of the pair is already held (all or nothing)', async () => {
    const log = await logRow(t.db, 'black-walnut');
    const [a, b] = [await slabRow(t.db, log), await slabRow(t.db, log)];
    await matchedSetRow(t.db, [a, b]);
    const first = await t.signedInAs('buyer');
    await hold(first.agent, b.id);
    const { agent } = await t.signedInAs('buyer');
    const res = await agent.post('/api/holds/matched-set').set('Origin', TEST_ORIGIN).send({ slabIds: [a.id, b.id] });
    expect(res.status).toBe(409);
    expect(await slabStatus(a.id)).toBe('listed');
    expect(await t.db.select().from(holds).where(eq(holds.slabId, a.id))).toHaveLength(0);
  });

  it('refuses slabs the yard has not marked as one set with 400 — even neighbours from the same log', async () => {
    const log = await logRow(t.db, 'black-walnut');
    const a = await slabRow(t.db, log);
    const b = await slabRow(t.db, log);
    const elsewhere = await slabRow(t.db, await logRow(t.db, 'black-walnut'));
    const { agent } = await t.signedInAs('buyer');
    const neighbours = await agent.post('/api/holds/matched-set').set('Origin', TEST_ORIGIN).send({ slabIds: [a.id, b.id] });
    expect(neighbours.status).toBe(400);
    expect(neighbours.body.error.code).toBe('not_matched');
    expect((await agent.post('/api/holds/matched-set').set('Origin', TEST_ORIGIN).send({ slabIds: [a.id, elsewhere.id] })).status).toBe(400);
    expect(await slabStatus(a.id)).toBe('listed');
  });
});
