import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { eq } from 'drizzle-orm';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow } from '../../helpers/fixtures';
import { auditLog, moistureReadings, slabs } from '../../../server/db/schema/index';
import { averageWidthIn, boardFeet, DEFAULT_PRICING_RULES, slabPriceCents } from '../../../shared/wood/index';

let t: TestApp;
let seller: Awaited<ReturnType<TestApp['signedInAs']>>['agent'];
let log: Awaited<ReturnType<typeof logRow>>;

const slabBody = () => ({
  logId: log.id, thicknessIn: 2, widthsIn: [20, 22, 24], lengthIn: 96, liveEdge: 'both',
  figures: ['curl'], defects: [{ kind: 'check', note: 'End check, 3 in, butt end' }], yardStack: 'B2', yardPosition: 'top',
});
const post = (body: object) => seller.post('/api/slabs').set('Origin', TEST_ORIGIN).send(body);
const patch = (id: number, body: object) => seller.patch(`/api/slabs/${id}`).set('Origin', TEST_ORIGIN).send(body);
const daysAgo = (n: number) => new Date(Date.now() - n * 86_400_000).toISOString().slice(0, 10);

beforeAll(async () => {
  t = await createTestApp();
  log = await logRow(t.db, 'black-walnut', { code: 'L-2026-07' });
  seller = (await t.signedInAs('seller')).agent;
  const fig = await seller.post('/api/figure-kinds').set('Origin', TEST_ORIGIN).send({ slug: 'curl', label: 'Curl', premiumMultiplier: 1.25 });
  expect(fig.status).toBe(201);
});
afterAll(() => t.close());

describe('who may record and edit slabs', () => {
  it('answers 401 to a visitor and 403 to a buyer', async () => {
    const buyer = (await t.signedInAs('buyer')).agent;
    expect((await request(t.app).post('/api/slabs').set('Origin', TEST_ORIGIN).send(slabBody())).status).toBe(401);
    expect((await buyer.post('/api/slabs').set('Origin', TEST_ORIGIN).send(slabBody())).status).toBe(403);
    expect((await request(t.app).patch('/api/slabs/1').set('Origin', TEST_ORIGIN).send({})).status).toBe(401);
    expect((await buyer.patch('/api/slabs/1').set('Origin', TEST_ORIGIN).send({})).status).toBe(403);
    expect((await buyer.post('/api/figure-kinds').set('Origin', TEST_ORIGIN).send({ slug: 'x', label: 'X', premiumMultiplier: 1 })).status).toBe(403);
  });
});

describe('POST /api/slabs', () => {
  it('creates a drying slab with next sequence, species from the log and derived columns from the shared wood math', async () => {
    const res = await post(slabBody());
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ code: 'L-2026-07-01', sequenceInLog: 1, status: 'drying', dryingState: 'green', species: { slug: 'black-walnut' } });
    // Board foot = T × W × L ÷ 144 (hardwood grading rules' definition): 2 × 22 × 96 / 144 = 29.33
    expect(res.body.boardFeet).toBe(29.33);
    expect(res.body.widthIn).toBe(averageWidthIn([20, 22, 24]));
    expect(boardFeet({ thicknessIn: 2, widthIn: 22, lengthIn: 96 })).toBeCloseTo(29.333, 3);
    // With no mill settings row the service prices by the shared default rules.
    const expected = slabPriceCents({ thicknessIn: 2, widthIn: 22, lengthIn: 96, ratePerBoardFootCents: 1200, figures: ['curl'], rules: DEFAULT_PRICING_RULES });
    expect(res.body.priceCents).toBe(expected);
    expect(expected).toBeGreaterThan(slabPriceCents({ thicknessIn: 2, widthIn: 22, lengthIn: 96, ratePerBoardFootCents: 1200, rules: DEFAULT_PRICING_RULES }));
    const next = await post({ ...slabBody(), status: 'ready' });
    expect(next.body).toMatchObject({ sequenceInLog: 2, status: 'ready' });
  });

  it('answers 409 naming the slab when the sequence number is taken in the log', async () => {
    const res = await post({ ...slabBody(), sequenceInLog: 1 });
    expect(res.status).toBe(409);
    expect(res.body.error.fieldErrors.sequenceInLog[0]).toMatch(/L-2026-07-01/);
  });

  it.each([
    [{ thicknessIn: -2 }, 'thicknessIn'],
    [{ widthsIn: [] }, 'widthsIn'],
    [{ widthsIn: [20, 21, 22, 23, 24, 25, 26, 27, 28] }, 'widthsIn'],
    [{ figures: ['sparkly'] }, 'figures'],
    [{ priceOverrideCents: 50000 }, 'priceOverrideReason'],
    [{ logId: 999999 }, 'logId'],
    [{ status: 'listed' }, 'status'],
    [{ defects: [{ kind: 'mould', note: '' }] }, 'defects.0.kind'],
  ])('answers 400 with a field error for %o and saves nothing', async (over, field) => {
    const before = (await t.db.select().from(slabs)).length;
    const res = await post({ ...slabBody(), ...over });
    expect(res.status).toBe(400);
    expect(res.body.error.fieldErrors[field]).toBeDefined();
    expect((await t.db.select().from(slabs)).length).toBe(before);
  });

  it('takes a price set by hand with its reason and writes an audit row', async () => {
    const res = await post({ ...slabBody(), priceOverrideCents: 45000, priceOverrideReason: 'Matched pair with -03' });
    expect(res.status).toBe(201);
    expect(res.body.priceCents).toBe(45000);
    const rows = await t.db.select().from(auditLog).where(eq(auditLog.entityId, String(res.body.id)));
    expect(rows.map((r) => r.action)).toContain('slab.create');
  });
});

describe('GET/POST /api/figure-kinds', () => {
  it('lists figures and refuses a duplicate with 409', async () => {
    const list = await request(t.app).get('/api/figure-kinds');
    expect(list.body.items.map((f: { slug: string }) => f.slug)).toContain('curl');
    const dup = await seller.post('/api/figure-kinds').set('Origin', TEST_ORIGIN).send({ slug: 'curl', label: 'Curl', premiumMultiplier: 2 });
    expect(dup.status).toBe(409);
    const bad = await seller.post('/api/figure-kinds').set('Origin', TEST_ORIGIN).send({ slug: 'Bad Slug', label: '', premiumMultiplier: 9 });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fieldErrors).sort()).toEqual(['label', 'premiumMultiplier', 'slug']);
  });
});

describe('PATCH /api/slabs/:id', () => {
  it('recomputes derived columns and audits the price change', async () => {
    const id = (await post(slabBody())).body.id;
    const res = await patch(id, { widthsIn: [30, 30], thicknessIn: 3 });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ widthIn: 30, boardFeet: 60 }); // 3 × 30 × 96 / 144 = 60
    const audits = await t.db.select().from(auditLog).where(eq(auditLog.entityId, String(id)));
    expect(audits.find((a) => a.action === 'slab.price')).toMatchObject({ before: expect.objectContaining({ priceCents: expect.any(Number) }) });
  });

  it('refuses illegal transitions and statuses only holds and checkout may set', async () => {
    const id = (await post(slabBody())).body.id;
    for (const to of ['listed', 'held', 'sold', 'picked-up']) {
      const res = await patch(id, { status: to });
      expect(res.status).toBe(409);
      expect(res.body.error.code).toBe('illegal_transition');
    }
    expect((await patch(id, { status: 'withdrawn' })).status).toBe(200);
    expect((await patch(id, { status: 'ready' })).body.status).toBe('ready');
  });

  it('refuses to list without a photo, naming what is missing, and changes nothing else', async () => {
    const row = await slabRow(t.db, log, { status: 'ready', photo: false });
    const res = await patch(row.id, { status: 'listed', yardStack: 'Z9' });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/photo/);
    expect(res.body.error.message).not.toMatch(/moisture/);
    const [after] = await t.db.select().from(slabs).where(eq(slabs.id, row.id));
    expect(after).toMatchObject({ status: 'ready', yardStack: row.yardStack });
  });

  it('refuses to list without a reading, or with one older than 60 days', async () => {
    const none = await slabRow(t.db, log, { status: 'ready', mc: null });
    const res = await patch(none.id, { status: 'listed' });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/moisture reading/);
    const stale = await slabRow(t.db, log, { status: 'ready', mc: null });
    await t.db.insert(moistureReadings).values({ slabId: stale.id, measuredOn: daysAgo(61), mcPercent: 9, meterKind: 'pin' });
    const old = await patch(stale.id, { status: 'listed' });
    expect(old.status).toBe(409);
    expect(old.body.error.message).toMatch(/61 days old/);
  });

  it('lists a slab with a photo and a recent reading, sets listedAt and audits the status change', async () => {
    const row = await slabRow(t.db, log, { status: 'ready', mc: 9 });
    const res = await patch(row.id, { status: 'listed' });
    expect(res.status).toBe(200);
    expect(res.body.status).toBe('listed');
    expect(res.body.listedAt).not.toBeNull();
    expect(res.body.dryingState).toBe('air-dry'); // 9 % is above the 8 % default target, below 20 %
    const [audit] = await t.db.select().from(auditLog).where(eq(auditLog.action, 'slab.status'));
    expect(audit).toBeDefined();
    const mine = (await t.db.select().from(auditLog).where(eq(auditLog.entityId, String(row.id)))).find((a) => a.action === 'slab.status');
    expect(mine).toMatchObject({ before: { status: 'ready' }, after: { status: 'listed' } });
    expect((await patch(row.id, { status: 'ready' })).body.status).toBe('ready'); // unlist
  });

  it('answers 404 for an unknown slab and 400 for a negative length', async () => {
    expect((await patch(999999, { lengthIn: 90 })).status).toBe(404);
    const id = (await post(slabBody())).body.id;
    const res = await patch(id, { lengthIn: -1 });
    expect(res.status).toBe(400);
    expect(res.body.error.fieldErrors.lengthIn).toBeDefined();
  });
});
