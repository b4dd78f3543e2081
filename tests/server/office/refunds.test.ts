import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { and, eq } from 'drizzle-orm';
import { createTestApp, TEST_ORIGIN, waitForMail, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow } from '../../helpers/fixtures';
import { auditLog, orderLines, orders, payments } from '../../../server/db/schema/index';
import { paidOrderRow, slabStatus } from './order-fixtures';
import { amountRefundedOnFake, chargeOnFake } from './fake-provider';

let t: TestApp;
let admin: Awaited<ReturnType<TestApp['signedInAs']>>;
let buyer: Awaited<ReturnType<TestApp['signedInAs']>>;
let keySeq = 0;
const key = () => `test-refund-key-${Date.now()}-${++keySeq}`;

beforeAll(async () => {
  t = await createTestApp();
  admin = await t.signedInAs('admin', 'Idony Farrant');
  buyer = await t.signedInAs('buyer', 'Caspian Woolery');
});
afterAll(() => t.close());

/** A paid order of two slabs with a real charge on the payment fake. */
async function paidOrder() {
  const log = await logRow(t.db, 'black-walnut');
  const a = await slabRow(t.db, log, { thicknessIn: 2, widthsIn: [20], lengthIn: 72 });
  const b = await slabRow(t.db, log, { thicknessIn: 2, widthsIn: [16], lengthIn: 60 });
  const amount = a.priceCents + b.priceCents;
  const charge = await chargeOnFake(amount, key());
  const order = await paidOrderRow(t.db, buyer.id, [a, b], { chargeId: charge.chargeId });
  return { order, a, b, chargeId: charge.chargeId };
}

const refund = (orderId: number, body: object, k = key()) =>
  admin.agent.post(`/api/office/orders/${orderId}/refunds`).set('Origin', TEST_ORIGIN).set('Idempotency-Key', k).send(body);

const refundRows = (orderId: number) => t.db.select().from(payments).where(and(eq(payments.orderId, orderId), eq(payments.kind, 'refund')));

describe('office orders and refunds: who may act', () => {
  it('a visitor gets 401 and a buyer or seller 403 on every order route', async () => {
    const { order } = await paidOrder();
    const routes = [
      ['get', '/api/office/orders'], ['get', `/api/office/orders/${order.id}`], ['post', `/api/office/orders/${order.id}/refunds`],
      ['get', '/api/office/pickups'], ['post', `/api/office/orders/${order.id}/picked-up`], ['post', `/api/office/orders/${order.id}/no-show`],
      ['post', `/api/office/orders/${order.id}/reschedule`],
    ] as const;
    const seller = await t.signedInAs('seller');
    for (const [method, url] of routes) {
      expect((await request(t.app)[method](url).set('Origin', TEST_ORIGIN).send({})).status, url).toBe(401);
      expect((await buyer.agent[method](url).set('Origin', TEST_ORIGIN).send({})).status, url).toBe(403);
      expect((await seller.agent[method](url).set('Origin', TEST_ORIGIN).send({})).status, url).toBe(403);
    }
    expect(await slabStatus(t.db, (await t.db.select().from(orderLines).where(eq(orderLines.orderId, order.id)))[0].slabId)).toBe('sold');
  });
});

describe('GET /api/office/orders', () => {
  it('lists orders by status and finds them by code, buyer or slab code; the detail shows the charge', async () => {
    const { order, b } = await paidOrder();
    const bySlab = await admin.agent.get(`/api/office/orders?q=${b.code}`);
    expect(bySlab.body.items.map((o: { id: number }) => o.id)).toEqual([order.id]);
    const byBuyer = await admin.agent.get('/api/office/orders?q=woolery&status=paid');
    expect(byBuyer.body.items.map((o: { id: number }) => o.id)).toContain(order.id);
    expect((await admin.agent.get('/api/office/orders?status=refunded')).body.items).toEqual([]);
    const detail = await admin.agent.get(`/api/office/orders/${order.id}`);
    expect(detail.body).toMatchObject({ code: order.code, buyerName: 'Caspian Woolery', refundableCents: order.totalCents, payments: [{ kind: 'charge', amountCents: order.totalCents }] });
    expect(detail.body.lines).toHaveLength(2);
  });
});

describe('POST /api/office/orders/:id/refunds', () => {
  it('refuses more than was paid minus what was already refunded, and refunds nothing', async () => {
    const { order, chargeId } = await paidOrder();
    const tooMuch = await refund(order.id, { amountCents: order.totalCents + 1, reason: 'Customer changed their mind' });
    expect(tooMuch.status).toBe(400);
    expect(tooMuch.body.error.fieldErrors.amountCents[0]).toMatch(/At most \$/);
    expect((await refund(order.id, { amountCents: 1000, reason: 'Small split on one end' })).status).toBe(201);
    const rest = await refund(order.id, { amountCents: order.totalCents - 999, reason: 'Customer changed their mind' });
    expect(rest.status).toBe(400);
    expect(await refundRows(order.id)).toHaveLength(1);
    expect(await amountRefundedOnFake(chargeId)).toBe(1000);
  });

  it('a repeated request with the same key refunds once, here and at the provider', async () => {
    const { order, chargeId } = await paidOrder();
    const k = key();
    const first = await refund(order.id, { amountCents: 1500, reason: 'Check found in one end' }, k);
    const second = await refund(order.id, { amountCents: 1500, reason: 'Check found in one end' }, k);
    expect(first.status).toBe(201);
    expect(second.status).toBe(200);
    expect(second.body.replayed).toBe(true);
    expect(second.body.refund.id).toBe(first.body.refund.id);
    const rows = await refundRows(order.id);
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ amountCents: 1500, status: 'succeeded', createdBy: admin.id, reason: 'Check found in one end' });
    expect(await amountRefundedOnFake(chargeId)).toBe(1500);
    const [o] = await t.db.select().from(orders).where(eq(orders.id, order.id));
    expect(o.refundedCents).toBe(1500);
  });

  it('two clicks arriving together with the same key still refund once', async () => {
    const { order, chargeId } = await paidOrder();
    const k = key();
    const results = await Promise.all([1, 2].map(() => refund(order.id, { amountCents: 700, reason: 'Double click' }, k)));
    expect(results.map((r) => r.status).sort()).not.toContain(500);
    expect(results.some((r) => r.status === 201)).toBe(true);
    expect(await refundRows(order.id)).toHaveLength(1);
    expect(await amountRefundedOnFake(chargeId)).toBe(700);
  });

  it('a partial refund without chosen slabs keeps the slabs sold and the order paid', async () => {
    const { order, a, b } = await paidOrder();
    const res = await refund(order.id, { amountCents: 2000, reason: 'Price match' });
    expect(res.status).toBe(201);
    expect(res.body.order).toMatchObject({ status: 'paid', refundedCents: 2000, refundableCents: order.totalCents - 2000 });
    expect(await slabStatus(t.db, a.id)).toBe('sold');
    expect(await slabStatus(t.db, b.id)).toBe('sold');
    expect(res.body.order.lines.every((l: { status: string }) => l.status === 'sold')).toBe(true);
  });

  it('refunding a slab in full puts it back on sale, frees it for a new buyer, e-mails the customer and is audited', async () => {
    const { order, a, b } = await paidOrder();
    const res = await refund(order.id, { amountCents: a.priceCents, reason: 'Hidden crack found at pickup', slabIds: [a.id], returnSlabsTo: 'listed' });
    expect(res.status).toBe(201);
    expect(await slabStatus(t.db, a.id)).toBe('listed');
    expect(await slabStatus(t.db, b.id)).toBe('sold');
    const lines = await t.db.select().from(orderLines).where(eq(orderLines.orderId, order.id));
    expect(lines.find((l) => l.slabId === a.id)!.status).toBe('refunded');
    // The one-sale-per-slab index no longer blocks a new sale of this slab.
    const other = await t.signedInAs('buyer');
    const resale = await paidOrderRow(t.db, other.id, [{ ...a, status: 'listed' }]);
    expect(resale.id).toBeGreaterThan(order.id);
    const mail = await waitForMail(buyer.email, (m) => m.subject.includes(order.code) && m.subject.startsWith('Refund'));
    expect(mail.text).toContain('Hidden crack found at pickup');
    const audit = await t.db.select().from(auditLog).where(and(eq(auditLog.entityType, 'order'), eq(auditLog.entityId, String(order.id))));
    expect(audit).toContainEqual(expect.objectContaining({ action: 'order.refund', actorId: admin.id, before: { status: 'paid', refundedCents: 0 } }));
  });

  it('refunding everything with every slab marks the order refunded; the admin may withdraw the slabs instead', async () => {
    const { order, a, b, chargeId } = await paidOrder();
    const res = await refund(order.id, { amountCents: order.totalCents, reason: 'Order cancelled by the mill', slabIds: [a.id, b.id], returnSlabsTo: 'withdrawn' });
    expect(res.status).toBe(201);
    expect(res.body.order).toMatchObject({ status: 'refunded', refundedCents: order.totalCents, refundableCents: 0 });
    expect(await slabStatus(t.db, a.id)).toBe('withdrawn');
    expect(await slabStatus(t.db, b.id)).toBe('withdrawn');
    expect(await amountRefundedOnFake(chargeId)).toBe(order.totalCents);
  });

  it('refuses a full-slab refund smaller than the slab, slabs from another order, a missing reason or a missing key', async () => {
    const { order, a } = await paidOrder();
    const { b: foreign } = await paidOrder();
    const small = await refund(order.id, { amountCents: 100, reason: 'Crack', slabIds: [a.id] });
    expect(small.status).toBe(400);
    expect(small.body.error.fieldErrors.amountCents).toBeDefined();
    expect((await refund(order.id, { amountCents: 100, reason: 'Crack', slabIds: [foreign.id] })).body.error.fieldErrors.slabIds).toBeDefined();
    expect((await refund(order.id, { amountCents: 100, reason: '' })).body.error.fieldErrors.reason).toBeDefined();
    const noKey = await admin.agent.post(`/api/office/orders/${order.id}/refunds`).set('Origin', TEST_ORIGIN).send({ amountCents: 100, reason: 'Crack' });
    expect(noKey.status).toBe(400);
    expect(await refundRows(order.id)).toHaveLength(0);
  });
});
