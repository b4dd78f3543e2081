import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import request from 'supertest';
import { createTestApp, TEST_ORIGIN, waitForMail, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow } from '../../helpers/fixtures';
import { auditLog, closedDays, orders, pickupWindows } from '../../../server/db/schema/index';
import { listPickupSlots } from '../../../server/modules/pickups/pickups.service';
import { queuePickupReminders } from '../../../server/modules/checkout/pickup-reminders';
import { flushOutbox } from '../../../server/lib/outbox';
import { formatDay } from '../../../shared/dates';
import { daysFromNow, hold, millSettingsRow, pay, weekdayOf, windowFor, YARD_ADDRESS } from '../checkout/checkout-fixtures';

let t: TestApp;
beforeAll(async () => { t = await createTestApp(); await millSettingsRow(t.db); });
afterAll(async () => { await t.close(); });

describe('pickup slots', () => {
  it('lists each window on its weekday with places left, skipping closed days and times already past', async () => {
    const { window } = await windowFor(t.db, daysFromNow(0), 2, { startsAt: '00:00', endsAt: '00:30' });
    const closed = daysFromNow(7);
    await t.db.insert(closedDays).values({ day: closed, note: 'Yard stocktake' });
    const now = new Date(`${daysFromNow(0)}T06:00:00Z`);
    const { slots } = await listPickupSlots(t.db, { days: 15, now });
    const mine = slots.filter((s) => s.windowId === window.id).map((s) => s.date);
    // today's 00:00 window has begun, day 7 is closed, day 14 is the next one
    expect(mine).toEqual([daysFromNow(14)]);
    expect(slots.find((s) => s.windowId === window.id)).toMatchObject({ remaining: 2, full: false, capacity: 2 });
    expect(slots.every((s) => weekdayOf(s.date) === s.weekday)).toBe(true);
  });

  it('when a window is full it shows no places and checkout answers 409', async () => {
    const { window, day } = await windowFor(t.db, daysFromNow(4), 1);
    const log = await logRow(t.db, 'black-walnut');
    const [a, b] = [await slabRow(t.db, log), await slabRow(t.db, log)];
    const first = await t.signedInAs('buyer');
    const second = await t.signedInAs('buyer');
    await hold(first.agent, a.id);
    await hold(second.agent, b.id);
    expect((await pay(first.agent, { pickupWindowId: window.id, pickupOn: day })).status).toBe(201);

    const res = await second.agent.get('/api/pickup-slots').query({ days: 10 });
    expect(res.body.slots.find((s: { windowId: number; date: string }) => s.windowId === window.id && s.date === day)).toMatchObject({ remaining: 0, full: true });
    const refused = await pay(second.agent, { pickupWindowId: window.id, pickupOn: day });
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toMatch(/full/);
  });

  it('refuses a closed day or a date that is not the window’s weekday with 400', async () => {
    const { window, day } = await windowFor(t.db, daysFromNow(5), 3);
    await t.db.insert(closedDays).values({ day, note: 'Blade day' });
    const slab = await slabRow(t.db, await logRow(t.db, 'black-walnut'));
    const buyer = await t.signedInAs('buyer');
    await hold(buyer.agent, slab.id);
    const closed = await pay(buyer.agent, { pickupWindowId: window.id, pickupOn: day });
    expect(closed.status).toBe(400);
    expect(closed.body.error.message).toMatch(/closed/);
    const wrongDay = await pay(buyer.agent, { pickupWindowId: window.id, pickupOn: daysFromNow(6) });
    expect(wrongDay.status).toBe(400);
  });
});

describe('pickup settings', () => {
  const settings = (over = {}) => ({
    yardAddress: '12 Sawpit Row, Brackwater',
    windows: [{ weekday: 3, startsAt: '14:00', endsAt: '17:00', capacity: 4, active: true }],
    closedDays: [{ day: '2031-01-01', note: 'New Year' }],
    ...over,
  });

  it('an admin saves the yard address, windows and closed days, with an audit record', async () => {
    const admin = await t.signedInAs('admin');
    const res = await admin.agent.put('/api/pickup-settings').set('Origin', TEST_ORIGIN).send(settings());
    expect(res.status).toBe(200);
    expect(res.body.yardAddress).toBe('12 Sawpit Row, Brackwater');
    expect(res.body.windows.some((w: { weekday: number; startsAt: string }) => w.weekday === 3 && w.startsAt === '14:00')).toBe(true);
    expect(res.body.closedDays).toEqual([{ day: '2031-01-01', note: 'New Year' }]);
    const audits = await t.db.select().from(auditLog).where(eq(auditLog.action, 'pickup-settings.update'));
    expect(audits).toHaveLength(1);
    // Windows that orders point at are switched off rather than deleted.
    const remaining = await t.db.select().from(pickupWindows);
    const booked = await t.db.select({ id: orders.pickupWindowId }).from(orders);
    for (const b of booked) expect(remaining.find((w) => w.id === b.id)?.active).toBe(false);
    await admin.agent.put('/api/pickup-settings').set('Origin', TEST_ORIGIN).send(settings({ yardAddress: YARD_ADDRESS }));
  });

  it('answers 400 with field errors for a window that ends before it starts', async () => {
    const admin = await t.signedInAs('admin');
    const res = await admin.agent.put('/api/pickup-settings').set('Origin', TEST_ORIGIN)
      .send(settings({ windows: [{ weekday: 1, startsAt: '15:00', endsAt: '09:00', capacity: 2, active: true }] }));
    expect(res.status).toBe(400);
    expect(res.body.error.fieldErrors['windows.0.endsAt']).toBeDefined();
  });

  it('refuses buyers (403) and visitors (401)', async () => {
    const buyer = await t.signedInAs('buyer');
    expect((await buyer.agent.get('/api/pickup-settings')).status).toBe(403);
    expect((await buyer.agent.put('/api/pickup-settings').set('Origin', TEST_ORIGIN).send(settings())).status).toBe(403);
    expect((await request(t.app).get('/api/pickup-settings')).status).toBe(401);
  });
});

describe('pickup reminders', () => {
  it('e-mails the buyer the day before the window, once', async () => {
    const { window, day } = await windowFor(t.db, daysFromNow(2), 5);
    await t.db.update(pickupWindows).set({ active: true }).where(eq(pickupWindows.id, window.id));
    const slab = await slabRow(t.db, await logRow(t.db, 'black-walnut'));
    const buyer = await t.signedInAs('buyer');
    await hold(buyer.agent, slab.id);
    const { body } = await pay(buyer.agent, { pickupWindowId: window.id, pickupOn: day });
    expect(body.order.status).toBe('paid');

    const dayBefore = new Date(`${daysFromNow(1)}T08:00:00Z`);
    expect((await queuePickupReminders(t.db, { now: dayBefore })).queued).toBe(1);
    expect((await queuePickupReminders(t.db, { now: dayBefore })).queued).toBe(0);
    await flushOutbox(t.db, t.mailer);
    const mail = await waitForMail(buyer.email, (m) => m.subject.startsWith('Tomorrow'));
    expect(mail.text).toContain(slab.code);
    // Dates are written one way for people (shared/dates.ts): "Sat 5 Dec 2026".
    expect(mail.text).toContain(`${formatDay(day)}, 09:00–12:00`);
  });
});
