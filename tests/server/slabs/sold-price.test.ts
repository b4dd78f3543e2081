import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { eq } from 'drizzle-orm';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow } from '../../helpers/fixtures';
import { hold, millSettingsRow, pay, windowFor } from '../checkout/checkout-fixtures';
import { orderLines, orders, slabs } from '../../../server/db/schema/index';

let t: TestApp;
let admin: Awaited<ReturnType<TestApp['signedInAs']>>;
let seller: Awaited<ReturnType<TestApp['signedInAs']>>;
let buyer: Awaited<ReturnType<TestApp['signedInAs']>>;
let slot: Awaited<ReturnType<typeof windowFor>>;

const rules = (rate: number) => ({
  millName: 'Varrow Creek Slab Mill', contactEmail: 'yard@varrow-creek.test', holdHours: 48, targetMcPercent: 8,
  maxReadingAgeDays: 60, minimumChargeCents: 0, thickPremiumMinIn: 3, thickPremiumMultiplier: 1,
  flatteningCentsPerSqFt: 800, noShowRule: 'keep', speciesRates: { 'black-cherry': rate }, figurePremiums: {},
});
const reprice = (rate: number) => admin.agent.put('/api/office/mill-rules').set('Origin', TEST_ORIGIN).send(rules(rate));

beforeAll(async () => {
  t = await createTestApp();
  await millSettingsRow(t.db, { minimumChargeCents: 0 });
  slot = await windowFor(t.db);
  admin = await t.signedInAs('admin');
  seller = await t.signedInAs('seller');
  buyer = await t.signedInAs('buyer');
});
afterAll(() => t.close());

describe('a sold slab keeps the price it sold at', () => {
  it('after the office raises the species rate, a sold and a picked-up slab still show the paid price everywhere; an unsold neighbour changes', async () => {
    const log = await logRow(t.db, 'black-cherry');
    const sold = await slabRow(t.db, log, { thicknessIn: 2, widthsIn: [18, 18], lengthIn: 72 });
    const unsold = await slabRow(t.db, log, { thicknessIn: 2, widthsIn: [18, 18], lengthIn: 72 });
    expect((await reprice(1200)).status).toBe(200);
    // 2 × 18 × 72 ÷ 144 = 18 bd ft (board-foot definition) × $12.00 = $216.00.
    expect((await hold(buyer.agent, sold.id)).status).toBe(201);
    const paid = await pay(buyer.agent, { pickupWindowId: slot.window.id, pickupOn: slot.day });
    expect(paid.status).toBe(201);
    const [line] = await t.db.select().from(orderLines).where(eq(orderLines.slabId, sold.id));
    expect(line).toMatchObject({ status: 'sold', slabCents: 21600 });

    expect((await reprice(2000)).status).toBe(200); // 18 bd ft × $20.00 = $360.00 for what is still for sale

    const page = await request(t.app).get(`/api/slabs/${sold.id}`);
    expect(page.body).toMatchObject({ status: 'sold', priceCents: 21600, priceBreakdown: { totalCents: 21600, slabCents: 21600 } });
    const neighbours = (await request(t.app).get(`/api/slabs/${unsold.id}`)).body;
    expect(neighbours.priceCents).toBe(36000);
    expect(neighbours.neighbours.find((n: { id: number }) => n.id === sold.id).priceCents).toBe(21600);
    const card = await request(t.app).get('/api/slabs').query({ logId: log.id, availability: 'all' });
    expect(card.body.items.find((i: { id: number }) => i.id === unsold.id).priceCents).toBe(36000);
    const yardLog = await seller.agent.get(`/api/logs/${log.id}`);
    expect(yardLog.status).toBe(200);
    expect(yardLog.body.slabs.find((s: { id: number }) => s.id === sold.id).priceCents).toBe(21600);

    // Correcting a measurement on the sold slab's record does not reprice it either.
    const edit = await seller.agent.patch(`/api/slabs/${sold.id}`).set('Origin', TEST_ORIGIN).send({ lengthIn: 73 });
    expect(edit.status).toBe(200);
    expect((await t.db.select().from(slabs).where(eq(slabs.id, sold.id)))[0].priceCents).toBe(21600);

    // Picked up: still the paid price.
    await t.db.update(slabs).set({ status: 'picked-up' }).where(eq(slabs.id, sold.id));
    await t.db.update(orders).set({ status: 'picked-up' }).where(eq(orders.id, line.orderId));
    expect((await request(t.app).get(`/api/slabs/${sold.id}`)).body.priceCents).toBe(21600);
  });

  it('a slab marked sold with no recorded sale shows no price at all (the page says just "Sold")', async () => {
    const log = await logRow(t.db, 'black-cherry');
    const slab = await slabRow(t.db, log, { status: 'sold' });
    const res = await request(t.app).get(`/api/slabs/${slab.id}`);
    expect(res.status).toBe(200);
    expect(res.body.priceCents).toBeNull();
    expect(res.body.priceBreakdown).toBeNull();
  });
});
