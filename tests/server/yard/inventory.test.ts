import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { eq, inArray } from 'drizzle-orm';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow } from '../../helpers/fixtures';
import { auditLog, moistureReadings, slabs } from '../../../server/db/schema/index';
import { csvField } from '../../../server/modules/slabs/yard-csv';

let t: TestApp;
let seller: Awaited<ReturnType<TestApp['signedInAs']>>['agent'];
const ids: Record<string, number> = {};

beforeAll(async () => {
  t = await createTestApp();
  const walnut = await logRow(t.db, 'black-walnut', { code: 'L-2026-01' });
  const oak = await logRow(t.db, 'white-oak', { code: 'L-2026-02' });
  ids.ready = (await slabRow(t.db, walnut, { status: 'ready', yardStack: 'A1', thicknessIn: 2 })).id;
  ids.bare = (await slabRow(t.db, walnut, { status: 'ready', photo: false, yardStack: 'A1', thicknessIn: 3 })).id;
  ids.listed = (await slabRow(t.db, oak, { status: 'listed', yardStack: 'B2', description: 'Wide, "quiet" grain, one check', thicknessIn: 1.5 })).id;
  ids.held = (await slabRow(t.db, oak, { status: 'held', yardStack: 'B2', thicknessIn: 2.5 })).id;
  seller = (await t.signedInAs('seller')).agent;
});
afterAll(() => t.close());

describe('GET /api/yard/slabs', () => {
  it('answers 401 to a visitor and 403 to a buyer', async () => {
    const buyer = (await t.signedInAs('buyer')).agent;
    for (const url of ['/api/yard/slabs', '/api/yard/slabs.csv', `/api/yard/slabs/${ids.ready}`]) {
      expect((await request(t.app).get(url)).status).toBe(401);
      expect((await buyer.get(url)).status).toBe(403);
    }
    expect((await buyer.post('/api/yard/slabs/bulk').set('Origin', TEST_ORIGIN).send({ ids: [ids.ready], action: 'list' })).status).toBe(403);
  });

  it('shows every status with counts, and filters by status, species, log, stack and text', async () => {
    const all = await seller.get('/api/yard/slabs');
    expect(all.status).toBe(200);
    expect(all.body.total).toBe(4);
    expect(all.body.counts).toMatchObject({ ready: 2, listed: 1, held: 1, sold: 0 });
    const idsOf = async (q: string) => (await seller.get(`/api/yard/slabs?${q}`)).body.items.map((i: { id: number }) => i.id).sort();
    expect(await idsOf('status=ready')).toEqual([ids.ready, ids.bare].sort());
    expect(await idsOf('status=listed,held')).toEqual([ids.listed, ids.held].sort());
    expect(await idsOf('species=white-oak')).toEqual([ids.listed, ids.held].sort());
    expect(await idsOf('stack=A1')).toEqual([ids.ready, ids.bare].sort());
    expect(await idsOf('q=quiet')).toEqual([ids.listed]);
    const log = (await seller.get('/api/yard/slabs?status=held')).body.items[0].logId;
    expect(await idsOf(`log=${log}`)).toEqual([ids.listed, ids.held].sort());
  });

  it('sorts by any column either way and pages', async () => {
    const thick = (await seller.get('/api/yard/slabs?sort=thicknessIn&dir=desc')).body.items.map((i: { thicknessIn: number }) => i.thicknessIn);
    expect(thick).toEqual([3, 2.5, 2, 1.5]);
    const page = await seller.get('/api/yard/slabs?sort=thicknessIn&pageSize=3&page=2');
    expect(page.body.items.map((i: { thicknessIn: number }) => i.thicknessIn)).toEqual([3]);
    const photos = (await seller.get('/api/yard/slabs?sort=photoCount')).body.items[0];
    expect(photos).toMatchObject({ id: ids.bare, photoCount: 0 });
  });

  it('answers 400 for an unknown sort or status', async () => {
    const res = await seller.get('/api/yard/slabs?sort=colour&status=lost');
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fieldErrors).sort()).toEqual(['sort', 'status']);
  });
});

describe('GET /api/yard/slabs.csv', () => {
  it('exports the filtered, sorted view with a header and proper quoting', async () => {
    const res = await seller.get('/api/yard/slabs.csv?species=white-oak&sort=thicknessIn');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    expect(res.headers['content-disposition']).toMatch(/attachment; filename="stickerline-yard-/);
    const lines = res.text.trimEnd().split('\r\n');
    expect(lines[0].split(',').slice(0, 3)).toEqual(['Code', 'Species', 'Log']);
    expect(lines).toHaveLength(3);
    expect(lines[1].startsWith('L-2026-02-1,White oak,L-2026-02,1,listed,')).toBe(true);
    expect(lines[2]).toContain(',held,');
  });

  it('quotes commas, quotes and line breaks, and defuses spreadsheet formulas', () => {
    expect(csvField('plain')).toBe('plain');
    expect(csvField('a,b')).toBe('"a,b"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(csvField('two\nlines')).toBe('"two\nlines"');
    expect(csvField('=SUM(A1)')).toBe("'=SUM(A1)");
    expect(csvField(-3)).toBe('-3');
    expect(csvField(null)).toBe('');
  });
});

describe('POST /api/yard/slabs/bulk', () => {
  it('lists the slabs that pass the workflow and reports the others with reasons', async () => {
    const res = await seller.post('/api/yard/slabs/bulk').set('Origin', TEST_ORIGIN).send({ ids: [ids.ready, ids.bare, ids.held, 999999], action: 'list' });
    expect(res.status).toBe(200);
    const by = Object.fromEntries(res.body.results.map((r: { id: number }) => [r.id, r]));
    expect(by[ids.ready]).toMatchObject({ ok: true, status: 'listed' });
    expect(by[ids.bare]).toMatchObject({ ok: false, code: 'not_ready_to_list', message: expect.stringMatching(/photo/) });
    expect(by[ids.held]).toMatchObject({ ok: false, code: 'illegal_transition' });
    expect(by[999999]).toMatchObject({ ok: false, code: 'not_found' });
    const rows = await t.db.select().from(slabs).where(inArray(slabs.id, [ids.ready, ids.bare]));
    expect(Object.fromEntries(rows.map((r) => [r.id, r.status]))).toEqual({ [ids.ready]: 'listed', [ids.bare]: 'ready' });
    const audits = await t.db.select().from(auditLog).where(eq(auditLog.entityId, String(ids.ready)));
    expect(audits).toHaveLength(1);
  });

  it('moves slabs to a stack and withdraws listed ones', async () => {
    const moved = await seller.post('/api/yard/slabs/bulk').set('Origin', TEST_ORIGIN).send({ ids: [ids.bare, ids.listed], action: 'move', stack: 'C3' });
    expect(moved.body.results.every((r: { ok: boolean }) => r.ok)).toBe(true);
    expect((await seller.get('/api/yard/slabs?stack=C3')).body.total).toBe(2);
    const withdrawn = await seller.post('/api/yard/slabs/bulk').set('Origin', TEST_ORIGIN).send({ ids: [ids.listed, ids.held], action: 'withdraw' });
    expect(withdrawn.body.results.map((r: { ok: boolean }) => r.ok)).toEqual([true, false]);
  });

  it('answers 400 for a move without a stack or an unknown action', async () => {
    const res = await seller.post('/api/yard/slabs/bulk').set('Origin', TEST_ORIGIN).send({ ids: [ids.ready], action: 'move' });
    expect(res.status).toBe(400);
    expect(res.body.error.fieldErrors.stack).toBeDefined();
    const bad = await seller.post('/api/yard/slabs/bulk').set('Origin', TEST_ORIGIN).send({ ids: [], action: 'burn' });
    expect(Object.keys(bad.body.error.fieldErrors).sort()).toEqual(['action', 'ids']);
  });
});

describe('air-dry forecasts on the yard desk (runs last: it adds slabs)', () => {
  it('gives each slab an air-dry forecast and sorts drying stock by its expected date', async () => {
    // Log milled 2023-04-01; slabs without readings fall back to one year per inch (common practice):
    // 1.5 in → 2024-10-01, 2 in → 2025-04-01, 3 in → 2026-04-01. One slab gets three readings on an exact exponential
    // curve toward a 12 % EMC (k = 0.02/day from 60 %), which reaches 20 % on day 90 (ln(48/8)/0.02 = 89.6): 2025-06-30.
    const log = await logRow(t.db, 'black-cherry', { code: 'L-2026-09', milledOn: '2023-04-01' });
    const thin = (await slabRow(t.db, log, { status: 'drying', thicknessIn: 1.5, mc: null })).id;
    const mid = (await slabRow(t.db, log, { status: 'drying', thicknessIn: 2, mc: null })).id;
    const thick = (await slabRow(t.db, log, { status: 'drying', thicknessIn: 3, mc: null })).id;
    const fitted = (await slabRow(t.db, log, { status: 'drying', thicknessIn: 2.5, mc: null })).id;
    const day = (n: number) => new Date(Date.UTC(2025, 3, 1) + n * 86_400_000).toISOString().slice(0, 10);
    await t.db.insert(moistureReadings).values([0, 20, 45].map((d) => ({
      slabId: fitted, measuredOn: day(d), mcPercent: 12 + 48 * Math.exp(-0.02 * d), meterKind: 'pin',
    })));
    const res = await seller.get(`/api/yard/slabs?log=${log.id}&sort=airDryExpectedOn`);
    expect(res.status).toBe(200);
    const rows = res.body.items as { id: number; airDry: { expectedOn: string; basis: string; earliestOn: string; latestOn: string } }[];
    expect(rows.map((r) => r.id)).toEqual([thin, mid, fitted, thick]);
    expect(rows.map((r) => r.airDry.expectedOn)).toEqual(['2024-10-01', '2025-04-01', '2025-06-30', '2026-04-01']);
    const f = rows[2].airDry;
    expect(f.basis).toBe('fitted-curve');
    expect(f.earliestOn <= f.expectedOn && f.expectedOn <= f.latestOn).toBe(true);
    expect(rows[0].airDry.basis).toBe('rule-of-thumb');
    const desc = (await seller.get(`/api/yard/slabs?log=${log.id}&sort=airDryExpectedOn&dir=desc&pageSize=2&page=1`)).body.items.map((r: { id: number }) => r.id);
    expect(desc).toEqual([thick, fitted]);
  });
});
