import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import request from 'supertest';
import { createTestApp, TEST_ORIGIN, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow } from '../../helpers/fixtures';
import { orderLines, orders, refundLines } from '../../../server/db/schema/index';
import { flushOutbox } from '../../../server/lib/outbox';
import { waitForMail } from '../../helpers/test-app';
import { backFromPaymentPage, fakeProvider, hold, millSettingsRow, onPaymentPage, startCheckout, windowFor } from './checkout-fixtures';
import { salesTaxCents } from '../../../shared/money';

let t: TestApp;
let admin: Awaited<ReturnType<TestApp['signedInAs']>>;
let slot: Awaited<ReturnType<typeof windowFor>>;
const TERMS = {
  salesTaxPercent: 7.25, taxWood: true, taxFlattening: false,
  policy: 'Slabs are sold as seen. Cancel before your pickup day for a full refund; after pickup, no returns.',
  phone: '(555) 014-2290', yardHours: 'Tue–Sat 8:00–16:00',
};
beforeAll(async () => {
  t = await createTestApp();
  await millSettingsRow(t.db);
  slot = await windowFor(t.db, undefined, 30);
  admin = await t.signedInAs('admin', 'Office Keeper');
  expect((await admin.agent.put('/api/office/sales-terms').set('Origin', TEST_ORIGIN).send(TERMS)).status).toBe(200);
});
afterAll(() => t.close());

async function checkoutOf(buyer: Awaited<ReturnType<TestApp['signedInAs']>>, flatten: boolean) {
  const slab = await slabRow(t.db, await logRow(t.db, 'black-walnut'), { thicknessIn: 2.5 });
  await hold(buyer.agent, slab.id);
  const res = await startCheckout(buyer.agent, { pickupWindowId: slot.window.id, pickupOn: slot.day, withFlattening: flatten ? [slab.id] : [] });
  expect(res.status).toBe(201);
  return { slab, res };
}

describe('sales tax', () => {
  it('is computed once on the server at the mill rate on what the mill taxes (wood here, not flattening), as its own line everywhere', async () => {
    const buyer = await t.signedInAs('buyer', 'Hollis Brandt');
    const { slab, res } = await checkoutOf(buyer, true);
    const order = res.body.order;
    // 7.25 % of the wood only, rounded once half away from zero (shared/money salesTaxCents).
    const expected = salesTaxCents(slab.priceCents, 7250);
    expect(expected).toBeGreaterThan(0);
    expect(order.taxCents).toBe(expected);
    expect(order.servicesCents).toBeGreaterThan(0);
    expect(order.totalCents).toBe(order.slabsCents + order.servicesCents + expected);
    // The payment page has the tax as its own line and asks for the same total.
    const session = await fakeProvider().checkout.sessions.retrieve(await sessionOf(order.id));
    expect(session.amount_total).toBe(order.totalCents);
    expect(await (await fetch(res.body.paymentUrl)).text()).toContain('Sales tax');
    const [line] = await t.db.select().from(orderLines).where(eq(orderLines.orderId, order.id));
    expect(line.taxCents).toBe(expected);

    await onPaymentPage(res.body.paymentUrl, 'succeed');
    const paid = (await backFromPaymentPage(buyer.agent, order.id)).body.order;
    expect(paid).toMatchObject({ status: 'paid', taxCents: expected, totalCents: order.totalCents });
    await flushOutbox(t.db, t.mailer);
    const mail = await waitForMail(buyer.email, (m) => m.subject.includes(order.code));
    expect(mail.text).toContain(`Sales tax: $${(expected / 100).toFixed(2)}`);
  });

  it('a buyer whose resale certificate the office approved pays no tax; a submitted one not yet approved does not count', async () => {
    const buyer = await t.signedInAs('buyer', 'Marit Quell');
    const submit = await buyer.agent.put('/api/account/resale-certificate').set('Origin', TEST_ORIGIN).send({ number: 'RS-4471-0932' });
    expect(submit.status).toBe(200);
    expect(submit.body.certificate).toMatchObject({ number: 'RS-4471-0932', status: 'submitted' });
    const before = await checkoutOf(buyer, false);
    expect(before.res.body.order.taxCents).toBeGreaterThan(0);
    await backFromPaymentPage(buyer.agent, before.res.body.orderId, 'cancel');

    const list = await admin.agent.get('/api/office/resale-certificates');
    const cert = list.body.items.find((c: { buyerEmail: string }) => c.buyerEmail === buyer.email);
    expect(cert).toMatchObject({ status: 'submitted', buyerName: 'Marit Quell' });
    const approve = await admin.agent.post(`/api/office/resale-certificates/${cert.id}/review`).set('Origin', TEST_ORIGIN).send({ decision: 'approved' });
    expect(approve.body.certificate.status).toBe('approved');

    const after = await checkoutOf(buyer, false);
    expect(after.res.body.order).toMatchObject({ taxCents: 0, taxExemptCertificate: 'RS-4471-0932' });
    expect(after.res.body.order.totalCents).toBe(after.res.body.order.slabsCents);
    // A changed number goes back to the office before it counts again.
    await buyer.agent.put('/api/account/resale-certificate').set('Origin', TEST_ORIGIN).send({ number: 'RS-4471-0999' });
    expect((await buyer.agent.get('/api/account/resale-certificate')).body.certificate.status).toBe('submitted');
  });

  it('tax is refunded pro rata with a partial refund', async () => {
    const buyer = await t.signedInAs('buyer', 'Ondrej Vall');
    const { res } = await checkoutOf(buyer, false);
    await onPaymentPage(res.body.paymentUrl, 'succeed');
    const order = (await backFromPaymentPage(buyer.agent, res.body.orderId)).body.order;
    const half = Math.floor(order.totalCents / 2);
    const r = await admin.agent.post(`/api/office/orders/${order.id}/refunds`).set('Origin', TEST_ORIGIN).set('Idempotency-Key', `tax-refund-${Date.now()}`)
      .send({ amountCents: half, reason: 'A crack found at pickup' });
    expect(r.status).toBe(201);
    const { totals } = (await admin.agent.get('/api/office/numbers')).body;
    // Half the money back is (to the cent) half the tax back.
    const orderTax = order.taxCents;
    const share = (await t.db.select().from(refundLines)).reduce((n, l) => n + l.taxCents, 0);
    expect(Math.abs(share - (orderTax * half) / order.totalCents)).toBeLessThanOrEqual(1);
    expect(totals.refundedTaxCents).toBe(share);
  });

  it('the terms are public; only the office may change them, and bad values are field errors', async () => {
    const pub = await request(t.app).get('/api/sales-terms');
    expect(pub.status).toBe(200);
    expect(pub.body).toMatchObject({ ...TERMS, yardAddress: expect.any(String), contactEmail: 'yard@brackwater.test' });
    const buyer = await t.signedInAs('buyer');
    expect((await buyer.agent.put('/api/office/sales-terms').set('Origin', TEST_ORIGIN).send(TERMS)).status).toBe(403);
    const bad = await admin.agent.put('/api/office/sales-terms').set('Origin', TEST_ORIGIN).send({ ...TERMS, salesTaxPercent: 7.2555, phone: '' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fieldErrors).sort()).toEqual(['phone', 'salesTaxPercent']);
    const empty = await admin.agent.put('/api/office/sales-terms').set('Origin', TEST_ORIGIN).send({ ...TERMS, salesTaxPercent: null });
    expect(empty.status).toBe(400);
  });
});

async function sessionOf(orderId: number) {
  return (await t.db.select().from(orders).where(eq(orders.id, orderId)))[0].checkoutSessionId!;
}
