import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { eq } from 'drizzle-orm';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow } from '../../helpers/fixtures';
import { moistureReadings, slabs } from '../../../server/db/schema/index';
import { maxMoistureContentPercent } from '../../../shared/wood/index';

let t: TestApp;
let seller: Awaited<ReturnType<TestApp['signedInAs']>>;
let walnut: Awaited<ReturnType<typeof logRow>>;
let oak: Awaited<ReturnType<typeof logRow>>;
const daysAgo = (n: number) => new Date(Date.now() - n * 86_400_000).toISOString().slice(0, 10);
const today = daysAgo(0);
const reading = (over: Record<string, unknown> = {}) => ({ measuredOn: today, mcPercent: 18, meterKind: 'pin', location: 'middle', ...over });
const post = (slabId: number, body: object) => seller.agent.post(`/api/slabs/${slabId}/moisture-readings`).set('Origin', TEST_ORIGIN).send(body);
const readingsOf = (slabId: number) => t.db.select().from(moistureReadings).where(eq(moistureReadings.slabId, slabId));
/** A slab with one earlier reading, written straight to the table as the yard had recorded it. */
async function slabWithReading(log: typeof walnut, mcPercent: number, measuredOn: string, review = 'in-line') {
  const slab = await slabRow(t.db, log, { mc: null, photo: false, dryingState: 'air-drying' });
  await t.db.insert(moistureReadings).values({ slabId: slab.id, measuredOn, mcPercent, meterKind: 'pin', location: 'middle', review });
  return slab;
}

beforeAll(async () => {
  t = await createTestApp();
  walnut = await logRow(t.db, 'black-walnut');
  oak = await logRow(t.db, 'white-oak');
  seller = await t.signedInAs('seller');
});
afterAll(() => t.close());

describe('an empty moisture field', () => {
  it('when the moisture content is left empty (or only spaces), it answers 400 at that field and stores nothing', async () => {
    const slab = await slabRow(t.db, walnut, { mc: null, photo: false, dryingState: 'green' });
    for (const mcPercent of ['', '   ', null, undefined]) {
      const res = await post(slab.id, reading({ mcPercent }));
      expect(res.status).toBe(400);
      expect(res.body.error.fieldErrors.mcPercent[0]).toMatch(/enter the moisture content/i);
    }
    expect(await readingsOf(slab.id)).toHaveLength(0);
    expect((await t.db.select().from(slabs).where(eq(slabs.id, slab.id)))[0].dryingState).toBe('green');
  });

  it('when a row of a moisture round has a slab code but no MC, it answers 400 on that row and saves no row', async () => {
    const a = await slabRow(t.db, walnut, { mc: null, photo: false });
    const b = await slabRow(t.db, walnut, { mc: null, photo: false });
    const res = await seller.agent.post('/api/moisture-readings/batch').set('Origin', TEST_ORIGIN).send({
      readings: [{ ...reading(), slabCode: a.code }, { ...reading({ mcPercent: '' }), slabCode: b.code }],
    });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fieldErrors)).toEqual(['readings.1.mcPercent']);
    expect([...(await readingsOf(a.id)), ...(await readingsOf(b.id))]).toHaveLength(0);
  });
});

describe('readings a meter cannot give', () => {
  // Meter ranges: pin 6–40 %, pinless 5–30 % (from memory; see METER_MC_RANGES in shared/readings.ts).
  it.each([
    ['pin', 0], ['pin', 5.5], ['pin', 45], ['pinless', 4], ['pinless', 35], ['oven-dry', 0],
  ])('a %s reading of %s %% is refused with 400 at the field', async (meterKind, mcPercent) => {
    const slab = await slabRow(t.db, walnut, { mc: null, photo: false });
    const res = await post(slab.id, reading({ meterKind, mcPercent }));
    expect(res.status).toBe(400);
    expect(res.body.error.fieldErrors).toHaveProperty('mcPercent');
    expect(await readingsOf(slab.id)).toHaveLength(0);
  });

  it('an oven-dry result above the species\' maximum moisture content is refused; one below it is kept', async () => {
    // Max MC = 100 (1.54 − Gb) / (1.54 Gb) (Wood Handbook FPL-GTR-190 ch. 4); white oak Gb 0.60 → about 101.7 %.
    expect(maxMoistureContentPercent(0.6)).toBeCloseTo(101.7, 1);
    const slab = await slabRow(t.db, oak, { mc: null, photo: false, dryingState: 'green' });
    const tooWet = await post(slab.id, reading({ meterKind: 'oven-dry', mcPercent: 115 }));
    expect(tooWet.status).toBe(400);
    expect(tooWet.body.error.fieldErrors.mcPercent[0]).toMatch(/White oak can hold at most about 101 %/);
    // The same 115 % is possible for black walnut (Gb 0.51 → about 131 %).
    const walnutSlab = await slabRow(t.db, walnut, { mc: null, photo: false, dryingState: 'green' });
    expect((await post(walnutSlab.id, reading({ meterKind: 'oven-dry', mcPercent: 115 }))).status).toBe(201);
    expect((await post(slab.id, reading({ meterKind: 'oven-dry', mcPercent: 95 }))).status).toBe(201);
  });
});

describe('a reading that jumps from the previous one', () => {
  it('a rise of more than 5 points needs confirming (409); resent with confirmed: true it is saved and marked confirmed', async () => {
    const slab = await slabWithReading(walnut, 14, daysAgo(10));
    const first = await post(slab.id, reading({ mcPercent: 22 }));
    expect(first.status).toBe(409);
    expect(first.body.error.code).toBe('reading_needs_confirmation');
    expect(first.body.error.fieldErrors.mcPercent[0]).toMatch(/8 points wetter than the previous reading \(14 %/);
    expect(await readingsOf(slab.id)).toHaveLength(1);
    const again = await post(slab.id, reading({ mcPercent: 22, confirmed: true }));
    expect(again.status).toBe(201);
    expect(again.body.reading.review).toBe('confirmed');
  });

  it('a drop faster than 2 points a day (after 3 points of meter spread) needs confirming; a slow drop does not', async () => {
    const fast = await slabWithReading(walnut, 30, daysAgo(2));
    const res = await post(fast.id, reading({ mcPercent: 20 })); // 10 points in 2 days > 3 + 2 × 2
    expect(res.status).toBe(409);
    expect(res.body.error.fieldErrors.mcPercent[0]).toMatch(/drier than/);
    const slow = await slabWithReading(walnut, 30, daysAgo(10));
    const ok = await post(slow.id, reading({ mcPercent: 20 })); // 10 points in 10 days ≤ 3 + 2 × 10
    expect(ok.status).toBe(201);
    expect(ok.body.reading.review).toBe('in-line');
  });

  it('in a moisture round, every jumping row is named at once and nothing is saved until they are confirmed', async () => {
    const a = await slabWithReading(walnut, 12, daysAgo(7));
    const b = await slabWithReading(walnut, 12, daysAgo(7));
    const rows = [{ ...reading({ mcPercent: 11 }), slabCode: a.code }, { ...reading({ mcPercent: 25 }), slabCode: b.code }];
    const res = await seller.agent.post('/api/moisture-readings/batch').set('Origin', TEST_ORIGIN).send({ readings: rows });
    expect(res.status).toBe(409);
    expect(Object.keys(res.body.error.fieldErrors)).toEqual(['readings.1.mcPercent']);
    expect(await readingsOf(a.id)).toHaveLength(1);
    const confirmed = await seller.agent.post('/api/moisture-readings/batch').set('Origin', TEST_ORIGIN)
      .send({ readings: [rows[0], { ...rows[1], confirmed: true }] });
    expect(confirmed.status).toBe(201);
    expect(confirmed.body.items.map((i: { reading: { review: string } }) => i.reading.review)).toEqual(['in-line', 'confirmed']);
  });
});

describe('buyers see only readings someone stands behind', () => {
  it('an unconfirmed reading stays in the yard list but not on the public slab page, its latest MC, weight or drying state', async () => {
    const slab = await slabWithReading(walnut, 12, daysAgo(20));
    await t.db.insert(moistureReadings).values({ slabId: slab.id, measuredOn: daysAgo(1), mcPercent: 3, meterKind: 'pin', location: '', review: 'unconfirmed' });
    const pub = await request(t.app).get(`/api/slabs/${slab.id}`);
    expect(pub.status).toBe(200);
    expect(pub.body.moistureReadings.map((r: { mcPercent: number }) => r.mcPercent)).toEqual([12]);
    expect(pub.body.moisturePercent).toBe(12);
    expect(pub.body.weightAtMcPercent).toBe(12);
    const list = await request(t.app).get('/api/slabs').query({ logId: walnut.id, pageSize: 100 });
    expect(list.body.items.find((i: { id: number }) => i.id === slab.id).moisturePercent).toBe(12);
    const yard = await seller.agent.get(`/api/slabs/${slab.id}/moisture-readings`);
    expect(yard.body.items.map((r: { review: string }) => r.review)).toEqual(['in-line', 'unconfirmed']);
    // A new reading works its drying state out from the vouched-for readings only.
    const next = await post(slab.id, reading({ mcPercent: 11 }));
    expect(next.status).toBe(201);
    expect(next.body.slab.dryingState).toBe('air-dry');
  });
});
