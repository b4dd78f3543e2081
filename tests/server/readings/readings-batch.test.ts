import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { eq, inArray } from 'drizzle-orm';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow } from '../../helpers/fixtures';
import { moistureReadings, slabs } from '../../../server/db/schema/index';

let t: TestApp;
let seller: Awaited<ReturnType<TestApp['signedInAs']>>;
let log: Awaited<ReturnType<typeof logRow>>;
const today = new Date().toISOString().slice(0, 10);

beforeAll(async () => {
  t = await createTestApp();
  log = await logRow(t.db, 'white-oak');
  seller = await t.signedInAs('seller');
});
afterAll(() => t.close());

const readingsOf = (ids: number[]) => t.db.select().from(moistureReadings).where(inArray(moistureReadings.slabId, ids));

describe('POST /api/moisture-readings/batch', () => {
  it('when every row names a slab by code or id, it saves them all and answers each slab\'s new drying state', async () => {
    const a = await slabRow(t.db, log, { mc: null, photo: false, dryingState: 'green' });
    const b = await slabRow(t.db, log, { mc: null, photo: false, dryingState: 'green' });
    const res = await seller.agent.post('/api/moisture-readings/batch').set('Origin', TEST_ORIGIN).send({
      readings: [
        { slabCode: a.code.toLowerCase(), measuredOn: today, mcPercent: '22', meterKind: 'pin', location: '' },
        { slabId: b.id, measuredOn: today, mcPercent: 7.5, meterKind: 'pinless', ambientTempF: '', ambientRhPercent: '' },
      ],
    });
    expect(res.status).toBe(201);
    expect(res.body.items.map((i: { slab: { id: number; dryingState: string } }) => [i.slab.id, i.slab.dryingState])).toEqual([[a.id, 'air-drying'], [b.id, 'shop-dry']]);
    expect(await readingsOf([a.id, b.id])).toHaveLength(2);
    expect((await t.db.select().from(slabs).where(eq(slabs.id, b.id)))[0].dryingState).toBe('shop-dry');
  });

  it('when one row has a bad value, it answers 400 naming that row\'s field and saves none of the rows', async () => {
    const a = await slabRow(t.db, log, { mc: null, photo: false });
    const b = await slabRow(t.db, log, { mc: null, photo: false });
    const res = await seller.agent.post('/api/moisture-readings/batch').set('Origin', TEST_ORIGIN).send({
      readings: [
        { slabId: a.id, measuredOn: today, mcPercent: 12, meterKind: 'pin' },
        { slabId: b.id, measuredOn: today, mcPercent: 12, meterKind: 'pin' },
        { slabId: b.id, measuredOn: today, mcPercent: 'wet', meterKind: 'pin' },
      ],
    });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fieldErrors)).toEqual(['readings.2.mcPercent']);
    expect(await readingsOf([a.id, b.id])).toHaveLength(0);
  });

  it('when a row names a slab code that does not exist, it answers 400 on that row and saves nothing', async () => {
    const a = await slabRow(t.db, log, { mc: null, photo: false, dryingState: 'green' });
    const res = await seller.agent.post('/api/moisture-readings/batch').set('Origin', TEST_ORIGIN).send({
      readings: [
        { slabId: a.id, measuredOn: today, mcPercent: 12, meterKind: 'pin' },
        { slabCode: 'NO-SUCH-SLAB', measuredOn: today, mcPercent: 12, meterKind: 'pin' },
        { measuredOn: today, mcPercent: 12, meterKind: 'pin' },
      ],
    });
    expect(res.status).toBe(400);
    expect(res.body.error.fieldErrors).toHaveProperty(['readings.2.slabCode']);
    const second = await seller.agent.post('/api/moisture-readings/batch').set('Origin', TEST_ORIGIN).send({
      readings: [
        { slabId: a.id, measuredOn: today, mcPercent: 12, meterKind: 'pin' },
        { slabCode: 'NO-SUCH-SLAB', measuredOn: today, mcPercent: 12, meterKind: 'pin' },
      ],
    });
    expect(second.status).toBe(400);
    expect(second.body.error.fieldErrors['readings.1.slabCode'][0]).toMatch(/NO-SUCH-SLAB/);
    expect(await readingsOf([a.id])).toHaveLength(0);
    expect((await t.db.select().from(slabs).where(eq(slabs.id, a.id)))[0].dryingState).toBe('green');
  });

  it('when the list is empty, it answers 400', async () => {
    const res = await seller.agent.post('/api/moisture-readings/batch').set('Origin', TEST_ORIGIN).send({ readings: [] });
    expect(res.status).toBe(400);
    expect(res.body.error.fieldErrors).toHaveProperty('readings');
  });

  it('is for staff only: visitor 401, buyer 403', async () => {
    const buyer = await t.signedInAs('buyer');
    const body = { readings: [{ slabId: 1, measuredOn: today, mcPercent: 12, meterKind: 'pin' }] };
    expect((await request(t.app).post('/api/moisture-readings/batch').send(body)).status).toBe(401);
    expect((await buyer.agent.post('/api/moisture-readings/batch').set('Origin', TEST_ORIGIN).send(body)).status).toBe(403);
  });
});
