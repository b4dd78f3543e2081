import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { formatDay } from '../../../shared/dates';
import { eq } from 'drizzle-orm';
import { createTestApp, waitForMail, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow } from '../../helpers/fixtures';
import { holds, orderLines, orders, payments, slabs } from '../../../server/db/schema/index';
import { flushOutbox } from '../../../server/lib/outbox';
import { backFromPaymentPage, chargesForOrder, hold, millSettingsRow, newKey, onPaymentPage, pay, startCheckout, windowFor, YARD_ADDRESS } from './checkout-fixtures';

let t: TestApp;
let slot: Awaited<ReturnType<typeof windowFor>>;
beforeAll(async () => {
  t = await createTestApp();
  await millSettingsRow(t.db);
  slot = await windowFor(t.db, undefined, 20);
});
afterAll(async () => { await t.close(); });

const slabStatus = async (id: number) => (await t.db.select().from(slabs).where(eq(slabs.id, id)))[0].status;
const pickup = () => ({ pickupWindowId: slot.window.id, pickupOn: slot.day });

async function buyerHolding(count = 1, over = {}) {
  const log = await logRow(t.db, 'black-walnut');
  const list = [];
  for (let i = 0; i < count; i++) list.push(await slabRow(t.db, log, over));
  const buyer = await t.signedInAs('buyer', 'Odile Harnsby');
  const held = [];
  for (const s of list) held.push((await hold(buyer.agent, s.id)).body.hold);
  return { buyer, slabs: list, holds: held };
}

describe('checkout', () => {
  it('charges once, sells the slabs, converts the holds and e-mails the pickup details', async () => {
    const { buyer, slabs: [a, b] } = await buyerHolding(2);
    const res = await pay(buyer.agent, { ...pickup(), loadingHelp: true });
    expect(res.status).toBe(201);
    const order = res.body.order;
    expect(order.code).toMatch(/^SL-\d{4}-\d{4,}$/);
    expect(order.status).toBe('paid');
    expect(order.lines.map((l: { slabCode: string }) => l.slabCode).sort()).toEqual([a.code, b.code].sort());
    expect(order.totalCents).toBe(a.priceCents + b.priceCents);
    expect(order.lines[0].priceLines[0].code).toBe('base');
    expect(order.totalWeightLb).toBeGreaterThan(0);
    expect(order.longestSlabIn).toBe(96);
    expect(await slabStatus(a.id)).toBe('sold');
    expect((await t.db.select().from(holds).where(eq(holds.buyerId, buyer.id))).every((h) => h.status === 'converted')).toBe(true);
    const [payment] = await t.db.select().from(payments).where(eq(payments.orderId, order.id));
    expect(payment).toMatchObject({ kind: 'charge', status: 'succeeded', amountCents: order.totalCents });
    expect(payment.providerId).toMatch(/^ch_/);
    expect(await chargesForOrder(t.db, order.id)).toHaveLength(1);

    await flushOutbox(t.db, t.mailer);
    const mail = await waitForMail(buyer.email, (m) => m.subject.includes(order.code));
    expect(mail.text).toContain(a.code);
    expect(mail.text).toContain(`$${(order.totalCents / 100).toFixed(2)}`);
    expect(mail.text).toContain(`${formatDay(slot.day)}, 09:00–12:00`);
    expect(mail.text).toContain(YARD_ADDRESS);
    expect(mail.text).toContain('ratchet straps');
    expect(mail.html).toContain(a.code);
  });

  it('when the card is declined and the buyer turns back, nothing is sold, the holds stay and the attempt is not an order', async () => {
    const { buyer, slabs: [a], holds: [h] } = await buyerHolding();
    const started = await startCheckout(buyer.agent, { ...pickup(), loadingHelp: true });
    expect(started.status).toBe(201);
    const declined = await onPaymentPage(started.body.paymentUrl, 'decline');
    expect(declined.status).toBe(402);
    expect(declined.html).toContain('declined');
    const back = await backFromPaymentPage(buyer.agent, started.body.orderId, 'cancel');
    expect(back.body.order).toMatchObject({ status: 'abandoned', pickup: null, loadingHelp: false, paymentUrl: null });
    expect(await slabStatus(a.id)).toBe('held');
    const [kept] = await t.db.select().from(holds).where(eq(holds.id, h.id));
    expect(kept.status).toBe('active');
    expect((await buyer.agent.get('/api/orders')).body.orders).toEqual([]);
    // The page was closed at the provider, so it can no longer be paid.
    expect((await onPaymentPage(started.body.paymentUrl, 'succeed')).status).toBe(410);

    const retry = await pay(buyer.agent, pickup());
    expect(retry.status).toBe(201);
    expect(retry.body.order.status).toBe('paid');
    expect(await slabStatus(a.id)).toBe('sold');
    expect((await buyer.agent.get('/api/orders')).body.orders.map((o: { id: number }) => o.id)).toEqual([retry.body.order.id]);
  });

  it('the same Idempotency-Key twice gives the same attempt, one payment page and one charge', async () => {
    const { buyer } = await buyerHolding();
    const key = newKey();
    const first = await startCheckout(buyer.agent, pickup(), key);
    const second = await startCheckout(buyer.agent, pickup(), key);
    expect(first.status).toBe(201);
    expect(second.status).toBe(200);
    expect(second.body).toMatchObject({ orderId: first.body.orderId, paymentUrl: first.body.paymentUrl });
    await onPaymentPage(first.body.paymentUrl, 'succeed');
    await backFromPaymentPage(buyer.agent, first.body.orderId);
    const third = await startCheckout(buyer.agent, pickup(), key);
    expect(third.status).toBe(200);
    expect(third.body.order.status).toBe('paid');
    expect(await t.db.select().from(payments).where(eq(payments.orderId, first.body.orderId))).toHaveLength(1);
    expect(await chargesForOrder(t.db, first.body.orderId)).toHaveLength(1);
  });

  it('a double click (two requests at once with one key) makes one attempt and one charge', async () => {
    const { buyer } = await buyerHolding();
    const key = newKey();
    const both = await Promise.all([startCheckout(buyer.agent, pickup(), key), startCheckout(buyer.agent, pickup(), key)]);
    expect(both.map((r) => r.status).sort()).toContain(201);
    const mine = await t.db.select().from(orders).where(eq(orders.buyerId, buyer.id));
    expect(mine).toHaveLength(1);
    await onPaymentPage(both.find((r) => r.status === 201)!.body.paymentUrl, 'succeed');
    await backFromPaymentPage(buyer.agent, mine[0].id);
    expect(await chargesForOrder(t.db, mine[0].id)).toHaveLength(1);
  });

  it('paying for a slab already paid for is refused with 409', async () => {
    const { buyer, holds: [h] } = await buyerHolding();
    expect((await pay(buyer.agent, { ...pickup(), holdIds: [h.id] })).status).toBe(201);
    const again = await pay(buyer.agent, { ...pickup(), holdIds: [h.id] });
    expect(again.status).toBe(409);
    const paid = (await t.db.select().from(orders).where(eq(orders.buyerId, buyer.id))).filter((o) => o.status === 'paid');
    expect(paid).toHaveLength(1);
    // And the database itself refuses a second sold line for the slab, whatever the code path.
    const [line] = await t.db.select().from(orderLines).where(eq(orderLines.orderId, paid[0].id));
    const { id: _id, ...copy } = line;
    await expect(t.db.insert(orderLines).values(copy)).rejects.toThrow();
  });

  it('adds flattening as its own priced line, and refuses it on a slab too thin to flatten', async () => {
    const { buyer, slabs: [thick] } = await buyerHolding(1, { thicknessIn: 2 });
    const res = await pay(buyer.agent, { ...pickup(), withFlattening: [thick.id] });
    expect(res.status).toBe(201);
    const line = res.body.order.lines[0];
    expect(line.withFlattening).toBe(true);
    expect(line.servicesCents).toBeGreaterThan(0);
    expect(line.priceLines.at(-1).code).toBe('flattening');
    expect(res.body.order.totalCents).toBe(thick.priceCents + line.servicesCents);

    const other = await buyerHolding(1, { thicknessIn: 1.25 });
    const thin = await pay(other.buyer.agent, { ...pickup(), withFlattening: [other.slabs[0].id] });
    expect(thin.status).toBe(400);
    expect(thin.body.error.fieldErrors.withFlattening[0]).toMatch(/minimum finished thickness/);
    expect(await slabStatus(other.slabs[0].id)).toBe('held');
  });

  it('refuses a checkout without an Idempotency-Key (400) and from a visitor (401)', async () => {
    const { buyer } = await buyerHolding();
    const res = await buyer.agent.post('/api/checkout').set('Origin', 'http://localhost:3000').send({ ...pickup(), paymentMethod: 'card' });
    expect(res.status).toBe(400);
    const visitor = await (await import('supertest')).default(t.app).post('/api/checkout').set('Idempotency-Key', newKey()).send({ ...pickup(), paymentMethod: 'card' });
    expect(visitor.status).toBe(401);
  });
});

describe('orders', () => {
  it('a buyer sees their own orders; another buyer gets 404 for them', async () => {
    const { buyer } = await buyerHolding();
    const { body } = await pay(buyer.agent, pickup());
    const list = await buyer.agent.get('/api/orders');
    expect(list.body.orders.map((o: { id: number }) => o.id)).toContain(body.order.id);
    const detail = await buyer.agent.get(`/api/orders/${body.order.id}`);
    expect(detail.status).toBe(200);
    expect(detail.body.order.pickup).toMatchObject({ on: slot.day, startsAt: '09:00', yardAddress: YARD_ADDRESS });

    const stranger = await t.signedInAs('buyer');
    expect((await stranger.agent.get(`/api/orders/${body.order.id}`)).status).toBe(404);
    expect((await stranger.agent.get('/api/orders')).body.orders).toEqual([]);
    expect((await stranger.agent.get('/api/holds')).body.holds).toEqual([]);
  });
});
