import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq, isNotNull } from 'drizzle-orm';
import request from 'supertest';
import { createTestApp, TEST_ORIGIN, TEST_WEBHOOK_SECRET, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow } from '../../helpers/fixtures';
import { orderLines, orders } from '../../../server/db/schema/index';
import { backFromPaymentPage, fakeProvider, hold, millSettingsRow, onPaymentPage, startCheckout, windowFor } from '../checkout/checkout-fixtures';
import type { MillNumbers } from '../../../shared/office';

let t: TestApp;
let slot: Awaited<ReturnType<typeof windowFor>>;
beforeAll(async () => {
  t = await createTestApp();
  await millSettingsRow(t.db);
  slot = await windowFor(t.db, undefined, 30);
});
afterAll(() => t.close());

/** A buyer checks out these slabs (flattening the ones asked) and pays on the test payment page. */
async function boughtThroughCheckout(slabList: { id: number }[], flatten: number[] = []) {
  const buyer = await t.signedInAs('buyer', 'Wendel Ashgrove');
  for (const s of slabList) expect((await hold(buyer.agent, s.id)).status).toBe(201);
  const started = await startCheckout(buyer.agent, { pickupWindowId: slot.window.id, pickupOn: slot.day, withFlattening: flatten });
  expect(started.status).toBe(201);
  await onPaymentPage(started.body.paymentUrl, 'succeed');
  const back = await backFromPaymentPage(buyer.agent, started.body.orderId);
  expect(back.body.order.status).toBe('paid');
  return back.body.order as { id: number; totalCents: number; lines: { slabId: number; totalCents: number }[] };
}

describe('the office numbers reconcile with the orders', () => {
  it('wood, services and tax of every paid order, less every refund (office, partial, or made at the provider), add up to the orders to the cent', async () => {
    const admin = await t.signedInAs('admin', 'Office Keeper');
    const walnut = await logRow(t.db, 'black-walnut');
    const oak = await logRow(t.db, 'white-oak');
    const [w1, w2, w3] = [await slabRow(t.db, walnut, { thicknessIn: 2.5 }), await slabRow(t.db, walnut, { thicknessIn: 2 }), await slabRow(t.db, walnut)];
    const [o1, o2] = [await slabRow(t.db, oak, { thicknessIn: 2.5 }), await slabRow(t.db, oak)];

    const first = await boughtThroughCheckout([w1, o1], [w1.id, o1.id]);
    const second = await boughtThroughCheckout([w2, o2], [w2.id]);
    const third = await boughtThroughCheckout([w3]);
    // An attempt that was never paid must not count.
    const b = await t.signedInAs('buyer');
    const unpaid = await slabRow(t.db, oak);
    await hold(b.agent, unpaid.id);
    expect((await startCheckout(b.agent, { pickupWindowId: slot.window.id, pickupOn: slot.day })).status).toBe(201);

    const refund = (orderId: number, body: object) => admin.agent.post(`/api/office/orders/${orderId}/refunds`).set('Origin', TEST_ORIGIN)
      .set('Idempotency-Key', `reconcile-${orderId}-${Date.now()}`).send({ reason: 'Checking the numbers', ...body });
    // A whole line back (its slab back on sale), a partial amount (spread pro rata), and 1 cent (rounding at its smallest).
    const oakLine = first.lines.find((l) => l.slabId === o1.id)!;
    expect((await refund(first.id, { amountCents: oakLine.totalCents, slabIds: [o1.id] })).status).toBe(201);
    expect((await refund(second.id, { amountCents: 1_234 })).status).toBe(201);
    expect((await refund(second.id, { amountCents: 1 })).status).toBe(201);
    // A refund made in the provider's own dashboard reaches the shop only as a signed event.
    const chargeId = (await t.db.select().from(orders).where(eq(orders.id, third.id)))[0].chargeId!;
    await fakeProvider().refunds.create({ charge: chargeId, amount: 777 });
    const payload = JSON.stringify({ id: `evt_reconcile_${Date.now()}`, object: 'event', type: 'charge.refunded', data: { object: { id: chargeId, object: 'charge', amount_refunded: 777 } } });
    const signed = await request(t.app).post('/api/webhooks/payments').set('Content-Type', 'application/json')
      .set('Stripe-Signature', fakeProvider().webhooks.generateTestHeaderString({ payload, secret: TEST_WEBHOOK_SECRET })).send(payload);
    expect(signed.status).toBe(200);

    const numbers = (await admin.agent.get('/api/office/numbers')).body as MillNumbers;
    const paid = await t.db.select().from(orders).where(isNotNull(orders.paidAt));
    expect(paid).toHaveLength(3);
    const ordersTotal = paid.reduce((n, o) => n + o.totalCents, 0);
    const ordersRefunded = paid.reduce((n, o) => n + o.refundedCents, 0);
    expect(ordersRefunded).toBe(oakLine.totalCents + 1_234 + 1 + 777);
    const { totals } = numbers;
    expect(totals.woodCents + totals.servicesCents + totals.taxCents).toBe(ordersTotal);
    expect(totals.refundedWoodCents + totals.refundedServicesCents + totals.refundedTaxCents).toBe(ordersRefunded);
    expect(totals.revenueCents + totals.netTaxCents).toBe(ordersTotal - ordersRefunded);
    // Services are their own column: flattening on three slabs, never counted as wood.
    const lines = await t.db.select().from(orderLines);
    const paidLines = lines.filter((l) => paid.some((o) => o.id === l.orderId));
    expect(totals.servicesCents).toBe(paidLines.reduce((n, l) => n + l.servicesCents, 0));
    expect(totals.servicesCents).toBeGreaterThan(0);
    expect(totals.woodCents).toBe(paidLines.reduce((n, l) => n + l.slabCents, 0));
    // The month-and-species rows add up to the totals.
    const sumRows = (k: keyof MillNumbers['totals']) => numbers.sales.reduce((n, r) => n + r[k], 0);
    for (const k of Object.keys(totals) as (keyof MillNumbers['totals'])[]) expect(sumRows(k)).toBe(totals[k]);
    expect(numbers.sales.map((r) => r.speciesName).sort()).toEqual(['Black walnut', 'White oak']);
  }, 180_000);
});
