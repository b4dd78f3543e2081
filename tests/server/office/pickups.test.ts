import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { formatDay } from '../../../shared/dates';
import { and, eq } from 'drizzle-orm';
import { createTestApp, TEST_ORIGIN, waitForMail, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow } from '../../helpers/fixtures';
import { auditLog, closedDays, millSettings, orders, payments } from '../../../server/db/schema/index';
import { paidOrderRow, pickupWindowRow, slabStatus } from './order-fixtures';
import { amountRefundedOnFake, chargeOnFake } from './fake-provider';

let t: TestApp;
let admin: Awaited<ReturnType<TestApp['signedInAs']>>;
let buyer: Awaited<ReturnType<TestApp['signedInAs']>>;
let seq = 0;

const DAY = 86_400_000;
const dayFromNow = (n: number) => new Date(Date.now() + n * DAY).toISOString().slice(0, 10);
const weekdayOf = (day: string) => new Date(`${day}T00:00:00Z`).getUTCDay();

beforeAll(async () => {
  t = await createTestApp();
  admin = await t.signedInAs('admin', 'Rosalind Ashgrove');
  buyer = await t.signedInAs('buyer', 'Emrys Tollbright');
  await t.db.insert(millSettings).values({ id: 1, millName: 'Fernhollow Sawyers', yardAddress: '12 Kerf Road, Fernhollow', contactEmail: 'yard@fernhollow.test' });
});
afterAll(() => t.close());

async function orderOn(day: string, over: Partial<typeof orders.$inferInsert> = {}, capacity = 3) {
  const window = await pickupWindowRow(t.db, { weekday: weekdayOf(day), startsAt: '00:00', endsAt: '23:59', capacity });
  const log = await logRow(t.db, 'white-oak');
  const slab = await slabRow(t.db, log, { thicknessIn: 2.5, widthsIn: [26], lengthIn: 110 });
  const charge = await chargeOnFake(slab.priceCents, `pickup-test-${Date.now()}-${++seq}`);
  const order = await paidOrderRow(t.db, buyer.id, [slab], { pickupOn: day, pickupWindowId: window.id, chargeId: charge.chargeId, loadingHelp: true, ...over });
  return { order, slab, window, chargeId: charge.chargeId };
}

const post = (url: string, body: object = {}) => admin.agent.post(url).set('Origin', TEST_ORIGIN).send(body);

describe('GET /api/office/pickups', () => {
  it('groups the coming days by date and window, with buyer, slab codes, weight, longest slab and loading help', async () => {
    const day = dayFromNow(2);
    const { order, slab, window } = await orderOn(day);
    const res = await admin.agent.get(`/api/office/pickups?from=${dayFromNow(0)}&days=5`);
    expect(res.status).toBe(200);
    expect(res.body.dates).toHaveLength(5);
    const date = res.body.dates.find((d: { date: string }) => d.date === day);
    const slot = date.slots.find((s: { window: { id: number } }) => s.window?.id === window.id);
    expect(slot.orders).toEqual([expect.objectContaining({
      id: order.id, code: order.code, buyerName: 'Emrys Tollbright', buyerEmail: buyer.email, slabCodes: [slab.code],
      totalWeightLb: order.totalWeightLb, longestSlabIn: 110, loadingHelp: true, status: 'paid',
      // Two days ahead: "did not come" is not offered yet.
      pickupStarted: false,
    })]);
    expect(res.body.noShowRule).toBe('keep');
  });

  it('marks a closed day and refuses more than a month of days', async () => {
    const day = dayFromNow(3);
    await t.db.insert(closedDays).values({ day, note: 'Saw blade change' });
    const res = await admin.agent.get(`/api/office/pickups?from=${day}&days=1`);
    expect(res.body.dates[0]).toMatchObject({ date: day, closed: true, closedNote: 'Saw blade change' });
    expect((await admin.agent.get('/api/office/pickups?days=90')).status).toBe(400);
  });
});

describe('POST /api/office/orders/:id/picked-up', () => {
  it('stores who handed over and when, marks the slabs picked up and is audited; a second time is 409', async () => {
    const { order, slab } = await orderOn(dayFromNow(0));
    const before = Date.now();
    const res = await post(`/api/office/orders/${order.id}/picked-up`);
    expect(res.status).toBe(200);
    const [row] = await t.db.select().from(orders).where(eq(orders.id, order.id));
    expect(row).toMatchObject({ status: 'picked-up', pickedUpBy: admin.id });
    expect(row.pickedUpAt!.getTime()).toBeGreaterThanOrEqual(before - 1000);
    expect(await slabStatus(t.db, slab.id)).toBe('picked-up');
    const audit = await t.db.select().from(auditLog).where(and(eq(auditLog.action, 'order.picked-up'), eq(auditLog.entityId, String(order.id))));
    expect(audit).toHaveLength(1);
    expect((await post(`/api/office/orders/${order.id}/picked-up`)).status).toBe(409);
  });
});

describe('POST /api/office/orders/:id/no-show', () => {
  it('with the rule "keep", the order is marked and the slabs stay the buyer\'s, no money moves', async () => {
    const { order, slab, chargeId } = await orderOn(dayFromNow(-1));
    const res = await post(`/api/office/orders/${order.id}/no-show`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ rule: 'keep', order: { status: 'no-show', refundedCents: 0 } });
    expect(await slabStatus(t.db, slab.id)).toBe('sold');
    expect(await amountRefundedOnFake(chargeId)).toBe(0);
  });

  it('with the rule "release-and-refund", the slabs go back on sale and the rest is refunded and e-mailed', async () => {
    await t.db.update(millSettings).set({ noShowRule: 'release-and-refund' }).where(eq(millSettings.id, 1));
    try {
      const { order, slab, chargeId } = await orderOn(dayFromNow(-1));
      const res = await post(`/api/office/orders/${order.id}/no-show`);
      expect(res.status).toBe(200);
      expect(res.body).toMatchObject({ rule: 'release-and-refund', order: { status: 'no-show', refundedCents: order.totalCents } });
      expect(await slabStatus(t.db, slab.id)).toBe('listed');
      expect(await amountRefundedOnFake(chargeId)).toBe(order.totalCents);
      const refunds = await t.db.select().from(payments).where(and(eq(payments.orderId, order.id), eq(payments.kind, 'refund')));
      expect(refunds).toHaveLength(1);
      await waitForMail(buyer.email, (m) => m.subject.startsWith('Refund') && m.subject.includes(order.code));
      expect((await post(`/api/office/orders/${order.id}/no-show`)).status).toBe(409);
    } finally {
      await t.db.update(millSettings).set({ noShowRule: 'keep' }).where(eq(millSettings.id, 1));
    }
  });

  it('offers "did not come" only once the booked window has begun at the mill', async () => {
    const yesterday = dayFromNow(-1);
    const { order } = await orderOn(yesterday);
    const res = await admin.agent.get(`/api/office/pickups?from=${yesterday}&days=1`);
    const listed = res.body.dates[0].slots.flatMap((s: { orders: { id: number }[] }) => s.orders).find((o: { id: number }) => o.id === order.id);
    expect(listed.pickupStarted).toBe(true);
  });

  it('refuses to mark a no-show before the pickup day', async () => {
    const { order } = await orderOn(dayFromNow(4));
    const res = await post(`/api/office/orders/${order.id}/no-show`);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('too_early');
  });
});

describe('POST /api/office/orders/:id/reschedule', () => {
  it('moves the pickup to a window with room and e-mails the buyer', async () => {
    const { order } = await orderOn(dayFromNow(1));
    const target = dayFromNow(5);
    const window = await pickupWindowRow(t.db, { weekday: weekdayOf(target), startsAt: '13:00', endsAt: '16:00', capacity: 2 });
    const res = await post(`/api/office/orders/${order.id}/reschedule`, { pickupWindowId: window.id, pickupOn: target });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ pickupOn: target, pickupWindow: { id: window.id } });
    const mail = await waitForMail(buyer.email, (m) => m.subject === `New pickup time for order ${order.code}`);
    expect(mail.text).toContain(`${formatDay(target)}, 13:00–16:00`);
    expect((await t.db.select().from(auditLog).where(eq(auditLog.action, 'order.reschedule'))).length).toBeGreaterThan(0);
  });

  it('refuses a window that is already full with 409 and leaves the order where it was', async () => {
    const full = dayFromNow(6);
    const { window } = await orderOn(full, {}, 1);
    const { order } = await orderOn(dayFromNow(1));
    const res = await post(`/api/office/orders/${order.id}/reschedule`, { pickupWindowId: window.id, pickupOn: full });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('window_full');
    const [row] = await t.db.select().from(orders).where(eq(orders.id, order.id));
    expect(row.pickupOn).toBe(dayFromNow(1));
  });

  it('refuses a closed day and a day the window does not run on', async () => {
    const closed = dayFromNow(8);
    await t.db.insert(closedDays).values({ day: closed, note: 'Yard inventory' });
    const window = await pickupWindowRow(t.db, { weekday: weekdayOf(closed) });
    const { order } = await orderOn(dayFromNow(1));
    const onClosed = await post(`/api/office/orders/${order.id}/reschedule`, { pickupWindowId: window.id, pickupOn: closed });
    expect(onClosed.status).toBe(400);
    expect(onClosed.body.error.message).toMatch(/closed/);
    const wrongDay = await post(`/api/office/orders/${order.id}/reschedule`, { pickupWindowId: window.id, pickupOn: dayFromNow(9) });
    expect(wrongDay.status).toBe(400);
  });
});
