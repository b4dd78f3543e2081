import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { eq } from 'drizzle-orm';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow } from '../../helpers/fixtures';
import { auditLog, figureKinds, slabs } from '../../../server/db/schema/index';
import { slabPriceCents } from '../../../shared/wood/index';

let t: TestApp;
let admin: Awaited<ReturnType<TestApp['signedInAs']>>;

const rules = (over: Record<string, unknown> = {}) => ({
  millName: 'Orrin Hollow Sawyers', contactEmail: 'yard@orrin-hollow.test', holdHours: 24, targetMcPercent: 7,
  maxReadingAgeDays: 45, minimumChargeCents: 0, thickPremiumMinIn: 3, thickPremiumMultiplier: 1,
  flatteningCentsPerSqFt: 500, noShowRule: 'keep', speciesRates: {}, figurePremiums: {}, ...over,
});
const put = (agent: ReturnType<typeof request.agent>, body: object) => agent.put('/api/office/mill-rules').set('Origin', TEST_ORIGIN).send(body);

beforeAll(async () => {
  t = await createTestApp();
  admin = await t.signedInAs('admin');
  await t.db.insert(figureKinds).values({ slug: 'crotch', label: 'Crotch', premiumMultiplier: 1.5 });
});
afterAll(() => t.close());

describe('the mill\'s prices and rules', () => {
  it('when an admin raises a species rate, every unsold slab of it is repriced and the change is audited; sold slabs keep their price', async () => {
    const log = await logRow(t.db, 'black-cherry');
    const listed = await slabRow(t.db, log, { thicknessIn: 2, widthsIn: [18, 18], lengthIn: 72 });
    const sold = await slabRow(t.db, log, { status: 'sold', thicknessIn: 2, widthsIn: [18, 18], lengthIn: 72 });

    const res = await put(admin.agent, rules({ speciesRates: { 'black-cherry': 1500 } }));

    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ millName: 'Orrin Hollow Sawyers', holdHours: 24, speciesRates: { 'black-cherry': 1500 }, repricedSlabs: 1 });
    // 2 × 18 × 72 ÷ 144 = 18 bd ft (board-foot definition) × $15.00 = $270.00, no adjustments.
    const expected = slabPriceCents({ thicknessIn: 2, widthIn: 18, lengthIn: 72, ratePerBoardFootCents: 1500, rules: { figurePremiums: { crotch: 1.5 }, thickPremium: { minThicknessIn: 3, multiplier: 1 }, minimumChargeCents: 0, flatteningCentsPerSqFt: 500 } });
    expect(expected).toBe(27000);
    const catalogue = await request(t.app).get(`/api/slabs/${listed.id}`);
    expect(catalogue.body.priceCents).toBe(27000);
    expect(catalogue.body.priceBreakdown.totalCents).toBe(27000);
    const [soldNow] = await t.db.select().from(slabs).where(eq(slabs.id, sold.id));
    expect(soldNow.priceCents).toBe(sold.priceCents);
    const audits = await t.db.select().from(auditLog).where(eq(auditLog.action, 'mill-rules.update'));
    expect(audits).toHaveLength(1);
    expect(audits[0].actorId).toBe(admin.id);
  });

  it('a figure premium the admin changes is what the price breakdown uses', async () => {
    const log = await logRow(t.db, 'black-walnut');
    const slab = await slabRow(t.db, log, { figures: ['crotch'] });
    expect((await put(admin.agent, rules({ figurePremiums: { crotch: 2 } }))).status).toBe(200);
    const res = await request(t.app).get(`/api/slabs/${slab.id}`);
    expect(res.body.priceBreakdown.lines.find((l: { code: string }) => l.code === 'figure').label).toMatch(/100 % of/); // ×2 is a 100 % premium on the base
  });

  it('answers 400 with field messages for bad rules and unknown names, and saves nothing', async () => {
    const bad = await put(admin.agent, rules({ holdHours: 0, targetMcPercent: 50, thickPremiumMultiplier: 0.5, speciesRates: { 'black-cherry': -3 } }));
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fieldErrors)).toEqual(expect.arrayContaining(['holdHours', 'targetMcPercent', 'thickPremiumMultiplier', 'speciesRates.black-cherry']));
    const unknown = await put(admin.agent, rules({ holdHours: 12, speciesRates: { 'unobtainium': 900 } }));
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.fieldErrors).toHaveProperty(['speciesRates.unobtainium']);
    expect((await admin.agent.get('/api/office/mill-rules')).body.holdHours).toBe(24);
  });

  it('is for admins only: visitors 401, buyers and sellers 403', async () => {
    const buyer = await t.signedInAs('buyer');
    const seller = await t.signedInAs('seller');
    expect((await request(t.app).get('/api/office/mill-rules')).status).toBe(401);
    expect((await buyer.agent.get('/api/office/mill-rules')).status).toBe(403);
    expect((await put(seller.agent, rules())).status).toBe(403);
  });
});
