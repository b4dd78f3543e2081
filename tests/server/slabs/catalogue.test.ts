import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createTestApp, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow } from '../../helpers/fixtures';
import { boardFeet, averageWidthIn, slabPriceCents } from '../../../shared/wood/index';

let t: TestApp;
const ids: Record<string, number> = {};

beforeAll(async () => {
  t = await createTestApp();
  const walnut = await logRow(t.db, 'black-walnut');
  const oak = await logRow(t.db, 'white-oak');
  ids.thinWalnut = (await slabRow(t.db, walnut, { thicknessIn: 1.75, widthsIn: [18, 20, 22], lengthIn: 84, liveEdge: 'both' })).id;
  ids.thickWalnut = (await slabRow(t.db, walnut, { thicknessIn: 3, widthsIn: [24, 26], lengthIn: 120, liveEdge: 'one' })).id;
  ids.oak = (await slabRow(t.db, oak, { thicknessIn: 2.25, widthsIn: [30, 30, 30], lengthIn: 100, liveEdge: 'none', dryingState: 'shop-dry' })).id;
  ids.drying = (await slabRow(t.db, oak, { status: 'drying', dryingState: 'green', mc: 45 })).id;
  ids.withdrawn = (await slabRow(t.db, oak, { status: 'withdrawn' })).id;
});
afterAll(() => t.close());

describe('GET /api/health', () => {
  it('answers ok', async () => {
    const res = await request(t.app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ ok: true });
  });
});

describe('GET /api/slabs', () => {
  it('lists slabs for sale with the contract fields, board feet and price from the shared wood math', async () => {
    const res = await request(t.app).get('/api/slabs');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ total: 3, page: 1, pageSize: 24 });
    const oak = res.body.items.find((i: { id: number }) => i.id === ids.oak);
    expect(oak).toMatchObject({
      species: { slug: 'white-oak', name: expect.any(String) }, thicknessIn: 2.25, widthIn: 30, lengthIn: 100,
      status: 'listed', dryingState: 'shop-dry', moisturePercent: 9, coverPhotoUrl: expect.stringMatching(/^\/uploads\/.+-display\.webp$/),
    });
    // Board foot: T × W × L ÷ 144 (hardwood grading rules' definition): 2.25 × 30 × 100 / 144 = 46.875 → 46.88
    expect(oak.boardFeet).toBe(46.88);
    expect(Number.isInteger(oak.priceCents)).toBe(true);
    const bf = boardFeet({ thicknessIn: 2.25, widthIn: averageWidthIn([30, 30, 30]), lengthIn: 100 });
    expect(bf).toBeCloseTo(46.875, 10);
    expect(oak.priceCents).toBe(slabPriceCents({ thicknessIn: 2.25, widthIn: 30, lengthIn: 100, ratePerBoardFootCents: 1200 }));
  });

  it('hides drying and withdrawn slabs by default and shows upcoming ones on request', async () => {
    const all = await request(t.app).get('/api/slabs');
    expect(all.body.items.map((i: { id: number }) => i.id)).not.toContain(ids.drying);
    const upcoming = await request(t.app).get('/api/slabs?availability=upcoming');
    expect(upcoming.body.items.map((i: { id: number }) => i.id)).toEqual([ids.drying]);
  });

  it('filters by species, thickness range, minimum length and width, maximum price, live edge and drying state', async () => {
    const get = async (q: string) => (await request(t.app).get(`/api/slabs?${q}`)).body.items.map((i: { id: number }) => i.id).sort();
    expect(await get('species=black-walnut')).toEqual([ids.thinWalnut, ids.thickWalnut].sort());
    expect(await get('minThicknessIn=2&maxThicknessIn=2.5')).toEqual([ids.oak]);
    expect(await get('minLengthIn=110')).toEqual([ids.thickWalnut]);
    expect(await get('minWidthIn=25')).toEqual([ids.thickWalnut, ids.oak].sort());
    expect(await get('liveEdge=both')).toEqual([ids.thinWalnut]);
    expect(await get('liveEdge=yes')).toEqual([ids.thinWalnut, ids.thickWalnut].sort());
    expect(await get('dryingState=shop-dry')).toEqual([ids.oak]);
    const cheapest = (await request(t.app).get('/api/slabs?sort=price-asc')).body.items[0];
    expect(await get(`maxPriceCents=${cheapest.priceCents}`)).toEqual([cheapest.id]);
  });

  it('sorts by price and board feet and pages through results', async () => {
    const asc = (await request(t.app).get('/api/slabs?sort=price-asc')).body.items.map((i: { priceCents: number }) => i.priceCents);
    expect(asc).toEqual([...asc].sort((a, b) => a - b));
    const bf = (await request(t.app).get('/api/slabs?sort=board-feet-desc')).body.items.map((i: { boardFeet: number }) => i.boardFeet);
    expect(bf).toEqual([...bf].sort((a, b) => b - a));
    const page2 = await request(t.app).get('/api/slabs?pageSize=2&page=2&sort=price-asc');
    expect(page2.body).toMatchObject({ total: 3, page: 2, pageSize: 2 });
    expect(page2.body.items).toHaveLength(1);
    const pastTheEnd = await request(t.app).get('/api/slabs?pageSize=2&page=5');
    expect(pastTheEnd.body).toMatchObject({ total: 3, page: 5, items: [] });
    const none = await request(t.app).get('/api/slabs?species=sweetgum');
    expect(none.body).toMatchObject({ total: 0, items: [] });
  });

  it.each([
    ['pageSize=0', 'pageSize'], ['pageSize=101', 'pageSize'], ['page=abc', 'page'], ['minThicknessIn=-1', 'minThicknessIn'],
    ['maxPriceCents=12.5', 'maxPriceCents'], ['sort=cheapest', 'sort'], ['liveEdge=maybe', 'liveEdge'],
    ['dryingState=soggy', 'dryingState'], ['minThicknessIn=3&maxThicknessIn=2', 'maxThicknessIn'], ['colour=red', '_form'],
  ])('answers 400 with field errors for a bad query (%s)', async (query, field) => {
    const res = await request(t.app).get(`/api/slabs?${query}`);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation');
    expect(Object.keys(res.body.error.fieldErrors)).toContain(field);
  });
});

describe('GET /api/slabs/:id', () => {
  it('returns the whole slab with its log, readings, photos, neighbours, price breakdown and weight', async () => {
    const res = await request(t.app).get(`/api/slabs/${ids.thickWalnut}`);
    expect(res.status).toBe(200);
    const s = res.body;
    expect(s.widthsIn).toEqual([24, 26]);
    expect(s.log).toMatchObject({ code: expect.any(String), sawingMethod: 'live-edge-slabbing' });
    expect(s.neighbours.map((n: { sequenceInLog: number }) => n.sequenceInLog)).toEqual([1, 2]);
    expect(s.neighbours.find((n: { isThisSlab: boolean }) => n.isThisSlab).id).toBe(ids.thickWalnut);
    expect(s.moistureReadings).toHaveLength(1);
    expect(s.photos).toHaveLength(1);
    expect(s.priceBreakdown.lines.reduce((a: number, l: { amountCents: number }) => a + l.amountCents, 0)).toBe(s.priceBreakdown.totalCents);
    expect(s.weightLb).toBeGreaterThan(50);
    // well over the NIOSH Pub. 94-110 recommended limit for a slab lift, so no hand crew is advised
    expect(s.lifting).toMatchObject({ tier: 'equipment', needsEquipment: true, peopleNeeded: 0 });
    expect(s.lifting.basis).toMatch(/NIOSH Pub\. 94-110/);
    expect(s.weightBasis).toBe('reading');
    expect(s.dryingForecast).toMatchObject({ basis: expect.stringMatching(/rule-of-thumb|not-enough-data|already-reached/) });
    expect(s.dryingForecast.method.length).toBeGreaterThan(20);
  });

  it('answers 404 JSON for an unknown, malformed or withdrawn slab', async () => {
    for (const id of ['999999', 'abc', '-1', String(ids.withdrawn)]) {
      const res = await request(t.app).get(`/api/slabs/${id}`);
      expect(res.status).toBe(404);
      expect(res.body.error.code).toBe('not_found');
    }
  });
});
