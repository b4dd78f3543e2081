import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow, speciesRow } from '../../helpers/fixtures';
import { createLog } from '../../../server/modules/logs/logs.service';
import { FLARE_ALLOWANCE, widestSlabFor } from '../../../shared/logs';

let t: TestApp;
let seller: Awaited<ReturnType<TestApp['signedInAs']>>;

const goodLog = {
  speciesSlug: 'black-walnut', originNote: 'Wind-thrown hedgerow tree, Varrow Valley', lengthIn: 120,
  buttDiameterIn: 28.5, topDiameterIn: 24, sawingMethod: 'live-edge-slabbing',
};
const postLog = (body: object) => seller.agent.post('/api/logs').set('Origin', TEST_ORIGIN).send(body);
const postSlab = (body: object) => seller.agent.post('/api/slabs').set('Origin', TEST_ORIGIN).send(body);

beforeAll(async () => {
  t = await createTestApp();
  await speciesRow(t.db, 'black-walnut');
  seller = await t.signedInAs('seller');
});
afterAll(() => t.close());

describe('log dates at the mill', () => {
  const tz = process.env.MILL_TIME_ZONE;
  afterEach(() => { if (tz === undefined) delete process.env.MILL_TIME_ZONE; else process.env.MILL_TIME_ZONE = tz; });
  // 30 June 2026, 20:00 UTC: already 1 July at a mill in New Zealand, still 30 June at one in the US Midwest.
  const now = new Date('2026-06-30T20:00:00Z');
  const actor = () => ({ id: seller.id, email: seller.email, name: seller.name, role: 'seller' }) as never;

  it('refuses a log felled or milled after today as the mill’s calendar reads it, at the field', async () => {
    process.env.MILL_TIME_ZONE = 'America/Chicago';
    const felled = await createLog(t.db, { ...goodLog, felledOn: '2026-07-01' }, actor(), now).catch((e) => e);
    expect(felled.status).toBe(400);
    expect(felled.fieldErrors).toEqual({ felledOn: ['A log cannot be felled in the future (today at the mill is 2026-06-30)'] });
    const milled = await createLog(t.db, { ...goodLog, felledOn: '2026-06-01', milledOn: '2026-07-01' }, actor(), now).catch((e) => e);
    expect(milled.fieldErrors).toEqual({ milledOn: ['A log cannot be milled in the future (today at the mill is 2026-06-30)'] });

    process.env.MILL_TIME_ZONE = 'Pacific/Auckland';
    const there = await createLog(t.db, { ...goodLog, felledOn: '2026-07-01', milledOn: '2026-07-01' }, actor(), now);
    expect(there).toMatchObject({ felledOn: '2026-07-01', milledOn: '2026-07-01' });
  });

  it('answers 400 over HTTP for a date years ahead, and for milled before felled, keeping the log unrecorded', async () => {
    const before = (await seller.agent.get('/api/logs')).body.items.length;
    const future = await postLog({ ...goodLog, felledOn: '2099-05-01' });
    expect(future.status).toBe(400);
    expect(future.body.error.fieldErrors.felledOn[0]).toMatch(/felled in the future/);
    const backwards = await postLog({ ...goodLog, felledOn: '2025-05-01', milledOn: '2025-04-01' });
    expect(backwards.status).toBe(400);
    expect(backwards.body.error.fieldErrors.milledOn).toEqual(['A log cannot be milled before it was felled']);
    const edit = await seller.agent.patch(`/api/logs/${(await logRow(t.db, 'black-walnut')).id}`).set('Origin', TEST_ORIGIN).send({ milledOn: '2099-01-01' });
    expect(edit.status).toBe(400);
    expect(edit.body.error.fieldErrors.milledOn[0]).toMatch(/milled in the future/);
    expect((await seller.agent.get('/api/logs')).body.items.length).toBe(before + 1);
  });
});

describe('the log code the form previews is the code stored', () => {
  it('for a log felled in a given year and for one with no felling date', async () => {
    for (const felledOn of ['2024-10-12', undefined]) {
      const preview = await seller.agent.get(`/api/logs/next-code${felledOn ? `?felledOn=${felledOn}` : ''}`);
      expect(preview.status).toBe(200);
      const saved = await postLog({ ...goodLog, ...(felledOn ? { felledOn } : {}) });
      expect(saved.status).toBe(201);
      expect(saved.body.code).toBe(preview.body.code);
      expect(saved.body.code.slice(2, 6)).toBe(felledOn ? '2024' : preview.body.millToday.slice(0, 4));
      // And the preview moves on to the next number once that one is taken.
      const after = await seller.agent.get(`/api/logs/next-code${felledOn ? `?felledOn=${felledOn}` : ''}`);
      expect(after.body.code).not.toBe(saved.body.code);
    }
  });

  it('is staff only and refuses a malformed date', async () => {
    const buyer = await t.signedInAs('buyer');
    expect((await buyer.agent.get('/api/logs/next-code')).status).toBe(403);
    expect((await seller.agent.get('/api/logs/next-code?felledOn=soon')).status).toBe(400);
  });
});

describe('a slab must fit the log it came from', () => {
  it('refuses a slab wider than the butt plus the flare allowance, naming the station, and one longer than the log', async () => {
    const log = (await postLog(goodLog)).body;
    // Allowance for butt flare: 5 % over the butt diameter — Stickerline's own allowance (common practice that a butt flares).
    expect(FLARE_ALLOWANCE).toBe(0.05);
    expect(widestSlabFor(28.5)).toBeCloseTo(29.93, 2);
    const wide = await postSlab({ logId: log.id, thicknessIn: 2.5, widthsIn: [26, 60, 27], lengthIn: 100 });
    expect(wide.status).toBe(400);
    expect(Object.keys(wide.body.error.fieldErrors)).toEqual(['widthsIn.1']);
    expect(wide.body.error.fieldErrors['widthsIn.1'][0]).toMatch(/butt is 28.5 in across \(up to 29.93 in with flare\)/);
    const long = await postSlab({ logId: log.id, thicknessIn: 2.5, widthsIn: [26, 27], lengthIn: 121 });
    expect(long.status).toBe(400);
    expect(long.body.error.fieldErrors.lengthIn[0]).toMatch(/Longer than log .* 120 in long/);

    const flared = await postSlab({ logId: log.id, thicknessIn: 2.5, widthsIn: [29.9, 27], lengthIn: 120 });
    expect(flared.status).toBe(201);
    const widened = await seller.agent.patch(`/api/slabs/${flared.body.id}`).set('Origin', TEST_ORIGIN).send({ widthsIn: [31, 27] });
    expect(widened.status).toBe(400);
    expect(Object.keys(widened.body.error.fieldErrors)).toEqual(['widthsIn.0']);
  });

  it('refuses a log edit that its slabs contradict: a butt narrower than a slab, a log shorter than one', async () => {
    const log = await logRow(t.db, 'black-walnut', { buttDiameterIn: 30, lengthIn: 120 });
    await slabRow(t.db, log, { widthsIn: [24, 29, 26], lengthIn: 110 });
    const narrower = await seller.agent.patch(`/api/logs/${log.id}`).set('Origin', TEST_ORIGIN).send({ buttDiameterIn: 26, topDiameterIn: 22 });
    expect(narrower.status).toBe(400);
    expect(narrower.body.error.fieldErrors.buttDiameterIn[0]).toMatch(/29 in wide/);
    const shorter = await seller.agent.patch(`/api/logs/${log.id}`).set('Origin', TEST_ORIGIN).send({ lengthIn: 100 });
    expect(shorter.body.error.fieldErrors.lengthIn[0]).toMatch(/110 in long/);
    expect((await seller.agent.patch(`/api/logs/${log.id}`).set('Origin', TEST_ORIGIN).send({ buttDiameterIn: 28 })).status).toBe(200);
  });
});
