import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import request from 'supertest';
import { createTestApp, TEST_WEBHOOK_SECRET, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow } from '../../helpers/fixtures';
import { orders } from '../../../server/db/schema/index';
import { fakeProvider, hold, millSettingsRow, pay, windowFor } from '../checkout/checkout-fixtures';

let t: TestApp;
let order: { id: number; totalCents: number };
let chargeId: string;
beforeAll(async () => {
  t = await createTestApp();
  await millSettingsRow(t.db);
  const { window, day } = await windowFor(t.db);
  const slab = await slabRow(t.db, await logRow(t.db, 'black-walnut'));
  const buyer = await t.signedInAs('buyer');
  await hold(buyer.agent, slab.id);
  order = (await pay(buyer.agent, { pickupWindowId: window.id, pickupOn: day })).body.order;
  chargeId = (await t.db.select().from(orders).where(eq(orders.id, order.id)))[0].chargeId!;
});
afterAll(async () => { await t.close(); });

function send(event: object, secret = TEST_WEBHOOK_SECRET) {
  const payload = JSON.stringify(event);
  const header = fakeProvider().webhooks.generateTestHeaderString({ payload, secret });
  return request(t.app).post('/api/webhooks/payments').set('Content-Type', 'application/json').set('Stripe-Signature', header).send(payload);
}

const readOrder = async () => (await t.db.select().from(orders).where(eq(orders.id, order.id)))[0];

describe('payment provider events', () => {
  it('a forged signature is refused with 400 and changes nothing', async () => {
    const res = await send({ id: 'evt_forged', object: 'event', type: 'charge.refunded', data: { object: { id: chargeId, object: 'charge', amount_refunded: order.totalCents } } }, 'whsec_not_ours');
    expect(res.status).toBe(400);
    expect((await readOrder()).refundedCents).toBe(0);
    const unsigned = await request(t.app).post('/api/webhooks/payments').set('Content-Type', 'application/json').send('{}');
    expect(unsigned.status).toBe(400);
  });

  it('a signed partial refund records the refunded amount; a full one marks the order refunded', async () => {
    const partial = await send({ id: 'evt_1', object: 'event', type: 'charge.refunded', data: { object: { id: chargeId, object: 'charge', amount_refunded: 500 } } });
    expect(partial.status).toBe(200);
    expect(await readOrder()).toMatchObject({ refundedCents: 500, status: 'paid' });
    await send({ id: 'evt_2', object: 'event', type: 'charge.refunded', data: { object: { id: chargeId, object: 'charge', amount_refunded: order.totalCents } } });
    expect(await readOrder()).toMatchObject({ refundedCents: order.totalCents, status: 'refunded' });
  });

  it('a signed dispute marks the order disputed', async () => {
    const res = await send({ id: 'evt_3', object: 'event', type: 'charge.dispute.created', data: { object: { id: 'dp_1', object: 'dispute', charge: chargeId } } });
    expect(res.status).toBe(200);
    expect((await readOrder()).disputed).toBe(true);
  });

  it('the payments client refunds a charge on the fake (the interface the office refunds use)', async () => {
    const r = await t.payments.refund({ chargeId, amountCents: 100, idempotencyKey: `test-refund-${Date.now()}` });
    expect(r.refundId).toMatch(/^re_/);
    expect(r.amountCents).toBe(100);
  });
});
