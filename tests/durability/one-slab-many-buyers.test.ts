import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { and, eq } from 'drizzle-orm';
import { createTestApp, type TestApp } from '../helpers/test-app';
import { logRow, slabRow } from '../helpers/fixtures';
import { holds, orderLines, orders, payments } from '../../server/db/schema/index';
import { backFromPaymentPage, chargesForKeys, hold, millSettingsRow, newKey, onPaymentPage, startCheckout, windowFor } from '../server/checkout/checkout-fixtures';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
  await millSettingsRow(t.db);
});
afterAll(() => t.close());

type Buyer = Awaited<ReturnType<TestApp['signedInAs']>>;

describe('one slab, many buyers at the same moment', () => {
  it('when 50 buyers reserve the same slab at once, exactly one gets the hold and 49 get a clear 409', async () => {
    const slab = await slabRow(t.db, await logRow(t.db, 'black-walnut'));
    const buyers: Buyer[] = [];
    for (let i = 0; i < 50; i++) buyers.push(await t.signedInAs('buyer'));

    const answers = await Promise.all(buyers.map((b) => hold(b.agent, slab.id).send({})));

    const statuses = answers.map((r) => r.status);
    expect(statuses.filter((s) => s === 201)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(49);
    for (const r of answers.filter((a) => a.status === 409)) expect(r.body.error.message).toMatch(/\w/);
    const active = await t.db.select().from(holds).where(and(eq(holds.slabId, slab.id), eq(holds.status, 'active')));
    expect(active).toHaveLength(1);
    const winner = buyers[statuses.indexOf(201)];
    expect(active[0].buyerId).toBe(winner.id);
  }, 300_000);

  it('when one buyer starts paying for the same held slab ten times at once (ten keys) and pays every page offered, one order is paid and charged once', async () => {
    const slab = await slabRow(t.db, await logRow(t.db, 'white-oak'));
    const { window, day } = await windowFor(t.db, undefined, 20);
    const buyer = await t.signedInAs('buyer');
    const held = await hold(buyer.agent, slab.id).send({});
    expect(held.status).toBe(201);
    const body = { holdIds: [held.body.hold.id], pickupWindowId: window.id, pickupOn: day };

    const keys = Array.from({ length: 10 }, () => newKey());
    const answers = await Promise.all(keys.map((key) => startCheckout(buyer.agent, body, key)));
    for (const s of answers.map((r) => r.status)) expect([201, 409]).toContain(s);
    // Every page the buyer was given is paid for, as fast as possible: at most one can take money.
    const offered = answers.filter((r) => r.status === 201);
    expect(offered.length).toBeGreaterThanOrEqual(1);
    await Promise.all(offered.map((r) => onPaymentPage(r.body.paymentUrl, 'succeed')));
    await Promise.all(offered.map((r) => backFromPaymentPage(buyer.agent, r.body.orderId)));

    const sold = await t.db.select().from(orderLines).where(and(eq(orderLines.slabId, slab.id), eq(orderLines.status, 'sold')));
    expect(sold).toHaveLength(1);
    const [order] = await t.db.select().from(orders).where(eq(orders.id, sold[0].orderId));
    expect(order.status).toBe('paid');
    const paidRows = await t.db.select().from(payments).where(and(eq(payments.kind, 'charge'), eq(payments.status, 'succeeded')));
    expect(paidRows.filter((p) => p.orderId === order.id)).toHaveLength(1);
    expect(await chargesForKeys(keys)).toHaveLength(1);
  }, 300_000);
});
