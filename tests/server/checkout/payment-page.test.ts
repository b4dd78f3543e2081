import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { and, eq } from 'drizzle-orm';
import request from 'supertest';
import { createTestApp, TEST_ORIGIN, TEST_WEBHOOK_SECRET, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow } from '../../helpers/fixtures';
import { emailOutbox, holds, orders, payments, slabs } from '../../../server/db/schema/index';
import {
  backFromPaymentPage, chargesForOrder, fakeProvider, hold, millSettingsRow, onPaymentPage, receiveProviderEvents, startCheckout, windowFor,
} from './checkout-fixtures';
import { amountRefundedOnFake } from '../office/fake-provider';

let t: TestApp;
let slot: Awaited<ReturnType<typeof windowFor>>;
let events: Awaited<ReturnType<typeof receiveProviderEvents>>;
beforeAll(async () => {
  t = await createTestApp();
  await millSettingsRow(t.db);
  slot = await windowFor(t.db, undefined, 30);
  events = await receiveProviderEvents(t.app, TEST_WEBHOOK_SECRET);
});
afterAll(async () => { await events.stop(); await t.close(); });

const pickup = () => ({ pickupWindowId: slot.window.id, pickupOn: slot.day });
const readOrder = async (id: number) => (await t.db.select().from(orders).where(eq(orders.id, id)))[0];
const slabStatus = async (id: number) => (await t.db.select().from(slabs).where(eq(slabs.id, id)))[0].status;
const chargeRows = (orderId: number) => t.db.select().from(payments).where(and(eq(payments.orderId, orderId), eq(payments.kind, 'charge')));
const confirmations = async (orderId: number) => {
  const code = (await readOrder(orderId)).code;
  return (await t.db.select().from(emailOutbox).where(eq(emailOutbox.kind, 'order-confirmation'))).filter((m) => m.subject.includes(code));
};

async function buyerWithAttempt(over: Record<string, unknown> = {}, slabOver = {}) {
  const log = await logRow(t.db, 'black-walnut');
  const slab = await slabRow(t.db, log, slabOver);
  const buyer = await t.signedInAs('buyer', 'Tamsin Orlech');
  const held = (await hold(buyer.agent, slab.id)).body.hold;
  const started = await startCheckout(buyer.agent, { ...pickup(), loadingHelp: true, ...over });
  expect(started.status).toBe(201);
  return { buyer, slab, held, orderId: started.body.orderId as number, paymentUrl: started.body.paymentUrl as string, started };
}

/** Signs and posts an event exactly as the provider would, for repeat deliveries. */
function postEvent(type: string, sessionId: string, id = `evt_test_${Date.now()}`) {
  const payload = JSON.stringify({ id, object: 'event', type, data: { object: { id: sessionId, object: 'checkout.session' } } });
  const header = fakeProvider().webhooks.generateTestHeaderString({ payload, secret: TEST_WEBHOOK_SECRET });
  return request(t.app).post('/api/webhooks/payments').set('Content-Type', 'application/json').set('Stripe-Signature', header).send(payload);
}

describe('card payment through the hosted payment page', () => {
  it('checkout answers 201 with the attempt id and the payment page; the page lists one line per slab and per service', async () => {
    const { orderId, paymentUrl, started, buyer, slab } = await buyerWithAttempt({ withFlattening: [] }, { thicknessIn: 2 });
    expect(paymentUrl).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/pay\/cs_test_/);
    expect(started.body.order).toMatchObject({ id: orderId, status: 'pending-payment', pickup: null, loadingHelp: false });
    const view = (await buyer.agent.get(`/api/orders/${orderId}`)).body.order;
    expect(view).toMatchObject({ status: 'pending-payment', taxCents: 0, totalCents: slab.priceCents, paymentUrl });
    expect(view.lines).toHaveLength(1);
    const session = await fakeProvider().checkout.sessions.retrieve((await readOrder(orderId)).checkoutSessionId!);
    expect(session.metadata).toMatchObject({ orderId: String(orderId) });
    expect(session.amount_total).toBe(slab.priceCents);
    const page = await (await fetch(paymentUrl)).text();
    expect(page).toContain('Local test payment page');
    expect(page).toContain(`Black walnut slab ${slab.code}`.replace('Black walnut', view.lines[0].speciesName));

    const other = await buyerWithAttempt({}, { thicknessIn: 2 });
    const flattened = await startCheckout(other.buyer.agent, { ...pickup(), withFlattening: [other.slab.id] });
    const s2 = await fakeProvider().checkout.sessions.retrieve((await readOrder(flattened.body.orderId)).checkoutSessionId!);
    expect(s2.amount_total).toBe(flattened.body.order.totalCents);
    expect(flattened.body.order.servicesCents).toBeGreaterThan(0);
    const html = await (await fetch(flattened.body.paymentUrl)).text();
    expect(html).toContain(`Flattening, slab ${other.slab.code}`);
  });

  it('when the signed event arrives before the buyer returns, the order is paid once; the return changes nothing', async () => {
    const { buyer, orderId, paymentUrl, slab, held } = await buyerWithAttempt();
    const page = await onPaymentPage(paymentUrl, 'succeed', 'now');
    expect(page.status).toBe(303);
    expect(page.location).toBe(`${TEST_ORIGIN}/orders/${orderId}?payment=returned`);
    expect(await readOrder(orderId)).toMatchObject({ status: 'paid' });
    const back = await backFromPaymentPage(buyer.agent, orderId);
    expect(back.body.order).toMatchObject({ status: 'paid', loadingHelp: true, pickup: { on: slot.day } });
    expect(await slabStatus(slab.id)).toBe('sold');
    expect((await t.db.select().from(holds).where(eq(holds.id, held.id)))[0].status).toBe('converted');
    expect(await chargeRows(orderId)).toHaveLength(1);
    expect(await chargesForOrder(t.db, orderId)).toHaveLength(1);
    expect(await confirmations(orderId)).toHaveLength(1);
    expect((await buyer.agent.get('/api/orders')).body.orders.map((o: { id: number }) => o.id)).toEqual([orderId]);
  });

  it('when the buyer returns before the event, the server verifies the page itself; the late event changes nothing', async () => {
    const { buyer, orderId, paymentUrl } = await buyerWithAttempt();
    await onPaymentPage(paymentUrl, 'succeed', 'hold');
    expect((await readOrder(orderId)).status).toBe('pending-payment');
    const back = await backFromPaymentPage(buyer.agent, orderId);
    expect(back.body.order.status).toBe('paid');
    const released = await onPaymentPage(paymentUrl, 'release');
    expect(released.status).toBe(303);
    const order = await readOrder(orderId);
    expect(order.status).toBe('paid');
    expect(order.chargeId).toMatch(/^ch_/);
    expect(await chargeRows(orderId)).toHaveLength(1);
    expect(await confirmations(orderId)).toHaveLength(1);
  });

  it('a duplicate completed event is applied once', async () => {
    const { orderId, paymentUrl } = await buyerWithAttempt();
    await onPaymentPage(paymentUrl, 'succeed', 'hold');
    const sessionId = (await readOrder(orderId)).checkoutSessionId!;
    const first = await postEvent('checkout.session.completed', sessionId, 'evt_dup_1');
    const again = await postEvent('checkout.session.completed', sessionId, 'evt_dup_1');
    expect([first.status, again.status]).toEqual([200, 200]);
    expect((await readOrder(orderId)).status).toBe('paid');
    expect(await chargeRows(orderId)).toHaveLength(1);
    expect(await confirmations(orderId)).toHaveLength(1);
  });

  it('a forged completed event is refused and sells nothing; an event for an unpaid page sells nothing either', async () => {
    const { orderId, slab } = await buyerWithAttempt();
    const sessionId = (await readOrder(orderId)).checkoutSessionId!;
    const payload = JSON.stringify({ id: 'evt_forged', object: 'event', type: 'checkout.session.completed', data: { object: { id: sessionId } } });
    const forged = await request(t.app).post('/api/webhooks/payments').set('Content-Type', 'application/json')
      .set('Stripe-Signature', fakeProvider().webhooks.generateTestHeaderString({ payload, secret: 'whsec_someone_else' })).send(payload);
    expect(forged.status).toBe(400);
    // Correctly signed, but the page was never paid: the provider's own record decides.
    expect((await postEvent('checkout.session.completed', sessionId)).status).toBe(200);
    expect((await readOrder(orderId)).status).toBe('pending-payment');
    expect(await slabStatus(slab.id)).toBe('held');
  });

  it('an abandoned payment closes the attempt, leaves the holds as they were and never shows as an order', async () => {
    const { buyer, orderId, paymentUrl, slab, held } = await buyerWithAttempt();
    const page = await onPaymentPage(paymentUrl, 'abandon');
    expect(page.status).toBe(303);
    expect(page.location).toBe(`${TEST_ORIGIN}/orders/${orderId}?payment=cancelled`);
    // The expired event already closed it; the buyer's return answers the same.
    expect((await readOrder(orderId)).status).toBe('abandoned');
    const back = await backFromPaymentPage(buyer.agent, orderId, 'cancel');
    expect(back.body.order).toMatchObject({ status: 'abandoned', pickup: null, loadingHelp: false });
    const [h] = await t.db.select().from(holds).where(eq(holds.id, held.id));
    expect(h.status).toBe('active');
    expect(h.expiresAt.getTime()).toBe(new Date(held.expiresAt).getTime());
    expect(await slabStatus(slab.id)).toBe('held');
    expect((await buyer.agent.get('/api/orders')).body.orders).toEqual([]);
    expect(await chargesForOrder(t.db, orderId)).toHaveLength(0);
  });

  it('a new checkout closes the buyer\'s earlier open payment page for the same slabs, so it can never be paid', async () => {
    const { buyer, orderId, paymentUrl } = await buyerWithAttempt();
    const second = await startCheckout(buyer.agent, pickup());
    expect(second.status).toBe(201);
    expect((await readOrder(orderId)).status).toBe('abandoned');
    expect((await onPaymentPage(paymentUrl, 'succeed')).status).toBe(410);
    await onPaymentPage(second.body.paymentUrl, 'succeed');
    expect((await readOrder(second.body.orderId)).status).toBe('paid');
  });

  it('a paid order is refunded through the SDK against the payment page\'s charge', async () => {
    const { buyer, orderId, paymentUrl, slab } = await buyerWithAttempt();
    await onPaymentPage(paymentUrl, 'succeed');
    await backFromPaymentPage(buyer.agent, orderId);
    const admin = await t.signedInAs('admin', 'Office Keeper');
    const res = await admin.agent.post(`/api/office/orders/${orderId}/refunds`).set('Origin', TEST_ORIGIN).set('Idempotency-Key', `refund-${Date.now()}`)
      .send({ amountCents: slab.priceCents, reason: 'Buyer changed plans', slabIds: [slab.id], returnSlabsTo: 'listed' });
    expect(res.status).toBe(201);
    const order = await readOrder(orderId);
    expect(order).toMatchObject({ status: 'refunded', refundedCents: slab.priceCents });
    expect(await amountRefundedOnFake(order.chargeId!)).toBe(slab.priceCents);
    expect(await slabStatus(slab.id)).toBe('listed');
  });

  it('another buyer cannot check or cancel someone else\'s payment (404)', async () => {
    const { orderId } = await buyerWithAttempt();
    const stranger = await t.signedInAs('buyer');
    expect((await backFromPaymentPage(stranger.agent, orderId)).status).toBe(404);
    expect((await backFromPaymentPage(stranger.agent, orderId, 'cancel')).status).toBe(404);
    expect((await readOrder(orderId)).status).toBe('pending-payment');
  });

  it('the office order list leaves attempts out unless asked for them by state', async () => {
    const { orderId, paymentUrl } = await buyerWithAttempt();
    await onPaymentPage(paymentUrl, 'abandon');
    const admin = await t.signedInAs('admin');
    const ids = async (query = '') => (await admin.agent.get(`/api/office/orders${query}`)).body.items.map((o: { id: number }) => o.id);
    expect(await ids()).not.toContain(orderId);
    expect(await ids('?status=abandoned')).toContain(orderId);
    expect((await admin.agent.get(`/api/office/orders/${orderId}`)).body.status).toBe('abandoned');
  });
});
