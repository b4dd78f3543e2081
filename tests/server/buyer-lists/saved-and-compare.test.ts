import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow } from '../../helpers/fixtures';
import { COMPARE_FULL_MESSAGE, MAX_COMPARE } from '../../../shared/buyer-lists';

let t: TestApp;
let log: Awaited<ReturnType<typeof logRow>>;
beforeAll(async () => { t = await createTestApp(); log = await logRow(t.db, 'black-walnut'); });
afterAll(() => t.close());

type Agent = Awaited<ReturnType<TestApp['signedInAs']>>['agent'];
const save = (agent: Agent, id: number) => agent.put(`/api/saved-slabs/${id}`).set('Origin', TEST_ORIGIN);
const unsave = (agent: Agent, id: number) => agent.delete(`/api/saved-slabs/${id}`).set('Origin', TEST_ORIGIN);

describe('saved slabs', () => {
  it('a buyer saves two slabs, sees them newest first on their list and in their marks, and removes one', async () => {
    const [a, b] = [await slabRow(t.db, log), await slabRow(t.db, log, { status: 'drying' })];
    const { agent } = await t.signedInAs('buyer');
    expect((await save(agent, a.id)).status).toBe(200);
    expect((await save(agent, b.id)).status).toBe(200);
    expect((await save(agent, b.id)).status).toBe(200); // saving twice keeps one row

    const list = await agent.get('/api/saved-slabs');
    expect(list.body.items.map((i: { code: string }) => i.code)).toEqual([b.code, a.code]);
    expect(list.body.items[0]).toMatchObject({ status: 'drying', species: { slug: 'black-walnut' } });
    expect((await agent.get('/api/me/slab-marks')).body.savedSlabIds.sort()).toEqual([a.id, b.id].sort());

    expect((await unsave(agent, a.id)).status).toBe(204);
    expect((await agent.get('/api/saved-slabs')).body.items.map((i: { id: number }) => i.id)).toEqual([b.id]);
  });

  it('one buyer never sees another buyer’s saved slabs', async () => {
    const slab = await slabRow(t.db, log);
    const first = await t.signedInAs('buyer');
    const second = await t.signedInAs('buyer');
    await save(first.agent, slab.id);
    expect((await second.agent.get('/api/saved-slabs')).body.items).toEqual([]);
    expect((await second.agent.get('/api/me/slab-marks')).body.savedSlabIds).toEqual([]);
    // Removing "their" saved slab touches only the caller's own list.
    await unsave(second.agent, slab.id);
    expect((await first.agent.get('/api/saved-slabs')).body.items).toHaveLength(1);
  });

  it('a withdrawn or unknown slab cannot be saved (404), and a slab withdrawn later drops off the list', async () => {
    const withdrawn = await slabRow(t.db, log, { status: 'withdrawn' });
    const later = await slabRow(t.db, log);
    const { agent } = await t.signedInAs('buyer');
    expect((await save(agent, withdrawn.id)).status).toBe(404);
    expect((await save(agent, 999_999)).status).toBe(404);
    await save(agent, later.id);
    await t.db.execute(`update slabs set status = 'withdrawn' where id = ${later.id}`);
    expect((await agent.get('/api/saved-slabs')).body.items).toEqual([]);
  });

  it('visitors are asked to sign in (401)', async () => {
    const slab = await slabRow(t.db, log);
    expect((await request(t.app).put(`/api/saved-slabs/${slab.id}`).set('Origin', TEST_ORIGIN)).status).toBe(401);
    expect((await request(t.app).get('/api/saved-slabs')).status).toBe(401);
  });
});

describe('comparing slabs', () => {
  it(`shows up to ${MAX_COMPARE} slabs side by side in the order asked, to anyone`, async () => {
    const four = [await slabRow(t.db, log), await slabRow(t.db, log, { thicknessIn: 3 }), await slabRow(t.db, log), await slabRow(t.db, log)];
    const ids = [four[2].id, four[0].id, four[3].id, four[1].id];
    const res = await request(t.app).get('/api/compare').query({ ids: ids.join(',') });
    expect(res.status).toBe(200);
    expect(res.body.items.map((s: { id: number }) => s.id)).toEqual(ids);
    expect(res.body.items[3]).toMatchObject({ thicknessIn: 3, priceBreakdown: { totalCents: expect.any(Number) } });
    expect(res.body.missingIds).toEqual([]);
  });

  it('refuses a fifth slab with a plain message at the ids field (400)', async () => {
    const five = [];
    for (let i = 0; i < 5; i++) five.push(await slabRow(t.db, log));
    const res = await request(t.app).get('/api/compare').query({ ids: five.map((s) => s.id).join(',') });
    expect(res.status).toBe(400);
    expect(res.body.error.fieldErrors.ids).toEqual([COMPARE_FULL_MESSAGE]);
  });

  it('refuses an empty or garbled list (400) and names slabs that are no longer shown', async () => {
    expect((await request(t.app).get('/api/compare')).status).toBe(400);
    expect((await request(t.app).get('/api/compare').query({ ids: '1,abc' })).status).toBe(400);
    const shown = await slabRow(t.db, log);
    const withdrawn = await slabRow(t.db, log, { status: 'withdrawn' });
    const res = await request(t.app).get('/api/compare').query({ ids: `${shown.id},${withdrawn.id}` });
    expect(res.status).toBe(200);
    expect(res.body.items.map((s: { id: number }) => s.id)).toEqual([shown.id]);
    expect(res.body.missingIds).toEqual([withdrawn.id]);
  });
});
