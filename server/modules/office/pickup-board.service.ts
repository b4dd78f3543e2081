import { randomUUID } from 'node:crypto';
import type { Db } from '../../db/client';
import { AppError, notFound } from '../../lib/errors';
import { recordAudit } from '../../lib/audit';
import type { SessionUser } from '../../lib/session';
import { queueEmail } from '../../lib/outbox';
import { pickupRescheduledEmail } from '../../lib/email-templates';
import { formatWindow } from '../../../shared/pickups';
import type { PickupBoard, PickupDay, PickupOrder, PickupSlot, OrderStatus, RescheduleInput } from '../../../shared/office';
import { readYardAddress } from '../pickups/pickups.repo';
import { claimPickupPlace } from '../pickups/pickups.service';
import { addDays, millDay, windowStart } from '../pickups/slot-calendar';
import * as repo from './orders.repo';
import { moveEverySlab } from '../slabs/slab-state';
import { getOrderDetail } from './orders.service';
import { issueRefund, sendQueuedMail, type RefundDeps } from './refunds.service';

const view = (w: { id: number; weekday: number; startsAt: string; endsAt: string; capacity: number }) =>
  ({ id: w.id, weekday: w.weekday, startsAt: w.startsAt, endsAt: w.endsAt, capacity: w.capacity });

/** Today and the coming days, each split by weekly window, with the orders due in it. */
export async function pickupBoard(db: Db, q: { from?: string; days: number }, now = new Date()): Promise<PickupBoard> {
  const from = q.from ?? millDay(now);
  const to = addDays(from, q.days - 1);
  const [windows, closed, rows, noShowRule] = await Promise.all([
    repo.allWindows(db), repo.closedDaysBetween(db, from, to), repo.ordersForPickup(db, from, to), repo.readNoShowRule(db),
  ]);
  const lines = await repo.linesOf(db, rows.map((r) => r.order.id));
  const dates: PickupDay[] = [];
  for (let i = 0; i < q.days; i++) {
    const date = addDays(from, i);
    const weekday = new Date(`${date}T00:00:00Z`).getUTCDay();
    const closedDay = closed.find((c) => c.day === date);
    const dayOrders = rows.filter((r) => r.order.pickupOn === date);
    const windowIds = new Set([
      ...windows.filter((w) => w.active && w.weekday === weekday).map((w) => w.id),
      ...dayOrders.map((r) => r.order.pickupWindowId).filter((id): id is number => id !== null),
    ]);
    const slots: PickupSlot[] = windows.filter((w) => windowIds.has(w.id)).sort((a, b) => a.startsAt.localeCompare(b.startsAt)).map((w) => ({
      window: view(w), orders: dayOrders.filter((r) => r.order.pickupWindowId === w.id).map((r) => toPickupOrder(r, lines)),
    }));
    const loose = dayOrders.filter((r) => r.order.pickupWindowId === null || !windowIds.has(r.order.pickupWindowId));
    if (loose.length) slots.push({ window: null, orders: loose.map((r) => toPickupOrder(r, lines)) });
    dates.push({ date, closed: Boolean(closedDay), closedNote: closedDay?.note ?? '', slots });
  }
  return { from, days: q.days, noShowRule, windows: windows.filter((w) => w.active).map(view), dates };
}

type OrderRow = Awaited<ReturnType<typeof repo.ordersForPickup>>[number];
function toPickupOrder({ order, buyerName, buyerEmail }: OrderRow, lines: Awaited<ReturnType<typeof repo.linesOf>>): PickupOrder {
  return {
    id: order.id, code: order.code, status: order.status as OrderStatus, buyerName, buyerEmail,
    slabCodes: lines.filter((l) => l.line.orderId === order.id && l.line.status === 'sold').map((l) => l.line.slabCode),
    totalWeightLb: order.totalWeightLb, longestSlabIn: order.longestSlabIn, loadingHelp: order.loadingHelp, pickedUpAt: order.pickedUpAt?.toISOString() ?? null,
  };
}

const soldSlabIds = async (db: Parameters<typeof repo.linesOf>[0], orderId: number) =>
  (await repo.linesOf(db, [orderId])).filter((l) => l.line.status === 'sold').map((l) => l.line.slabId);

/** The buyer collected: remember who handed the slabs over and when. */
export async function markPickedUp(db: Db, actor: SessionUser, orderId: number, now = new Date()) {
  await db.transaction(async (tx) => {
    const order = await repo.lockOrder(tx, orderId);
    if (!order) throw notFound('That order');
    if (order.status !== 'paid' && order.status !== 'no-show') {
      throw new AppError(409, 'not_awaiting_pickup', `Order ${order.code} is ${order.status}; only a paid order waiting at the yard can be marked picked up.`);
    }
    const slabIds = await soldSlabIds(tx, orderId);
    await repo.updateOrder(tx, orderId, { status: 'picked-up', pickedUpAt: now, pickedUpBy: actor.id });
    await moveEverySlab(tx, slabIds, 'picked-up', 'pickup', now);
    await recordAudit(tx, { actor, action: 'order.picked-up', entityType: 'order', entityId: orderId, before: { status: order.status }, after: { status: 'picked-up', pickedUpAt: now.toISOString(), slabIds } });
  });
  return getOrderDetail(db, orderId);
}

/**
 * The buyer did not come. The order is marked first (so a second click finds it no longer paid);
 * what follows is the mill's own rule (mill_settings.noShowRule): keep the slabs for the buyer, or
 * put them back on sale and refund what is left.
 */
export async function markNoShow(deps: RefundDeps, actor: SessionUser, orderId: number, now = new Date()) {
  const { db } = deps;
  const rule = await repo.readNoShowRule(db);
  const order = await db.transaction(async (tx) => {
    const o = await repo.lockOrder(tx, orderId);
    if (!o) throw notFound('That order');
    if (o.status !== 'paid') throw new AppError(409, 'not_awaiting_pickup', `Order ${o.code} is ${o.status}; only a paid order waiting at the yard can be marked as a no-show.`);
    const window = await repo.findWindow(tx, o.pickupWindowId);
    if (o.pickupOn && windowStart(o.pickupOn, window?.startsAt ?? '00:00') > now) {
      throw new AppError(409, 'too_early', `The pickup for order ${o.code} has not started yet (${o.pickupOn}).`);
    }
    await repo.updateOrder(tx, orderId, { status: 'no-show' });
    await recordAudit(tx, { actor, action: 'order.no-show', entityType: 'order', entityId: orderId, before: { status: o.status }, after: { status: 'no-show', rule } });
    return o;
  });
  const left = order.totalCents - order.refundedCents;
  if (rule === 'release-and-refund' && left > 0) {
    try {
      await issueRefund(deps, actor, orderId, {
        amountCents: left, reason: 'Not collected in the booked pickup window', returnSlabsTo: 'listed',
        slabIds: await soldSlabIds(db, orderId), idempotencyKey: `office-no-show:${orderId}:${randomUUID()}`,
      }, { keepStatus: 'no-show' });
    } catch (err) {
      const why = err instanceof AppError ? err.message : 'the payment service did not answer';
      throw new AppError(502, 'no_show_refund_failed', `Order ${order.code} is marked as a no-show, but the refund did not go through (${why}). Refund it from the order page.`);
    }
  }
  return { rule, order: await getOrderDetail(db, orderId) };
}

/** Moves a pickup to another window and day, within that window's places, and tells the buyer. */
export async function reschedulePickup(deps: RefundDeps, actor: SessionUser, orderId: number, input: RescheduleInput, now = new Date()) {
  const { db } = deps;
  await db.transaction(async (tx) => {
    const order = await repo.lockOrder(tx, orderId);
    if (!order) throw notFound('That order');
    if (order.status !== 'paid' && order.status !== 'no-show') {
      throw new AppError(409, 'not_awaiting_pickup', `Order ${order.code} is ${order.status}; only an order still waiting at the yard can be rescheduled.`);
    }
    if (order.pickupWindowId === input.pickupWindowId && order.pickupOn === input.pickupOn && order.status === 'paid') {
      throw new AppError(400, 'validation', 'The order is already booked for that time.', { pickupOn: ['Choose a different day or window.'] });
    }
    const window = await claimPickupPlace(tx, { windowId: input.pickupWindowId, day: input.pickupOn, now });
    const oldWindow = await repo.findWindow(tx, order.pickupWindowId);
    const previous = order.pickupOn ? `${order.pickupOn}${oldWindow ? `, ${formatWindow(oldWindow)}` : ''}` : null;
    await repo.updateOrder(tx, orderId, { pickupWindowId: window.id, pickupOn: input.pickupOn, status: 'paid', reminderSentAt: null });
    await recordAudit(tx, {
      actor, action: 'order.reschedule', entityType: 'order', entityId: orderId,
      before: { status: order.status, pickupOn: order.pickupOn, pickupWindowId: order.pickupWindowId },
      after: { status: 'paid', pickupOn: input.pickupOn, pickupWindowId: window.id },
    });
    const buyer = (await repo.findOrder(tx, orderId))!;
    await queueEmail(tx, {
      to: buyer.buyerEmail, kind: 'pickup-rescheduled',
      content: pickupRescheduledEmail({
        name: buyer.buyerName, code: order.code, previous,
        pickup: { yardAddress: (await readYardAddress(tx)) ?? 'the yard', on: input.pickupOn, startsAt: window.startsAt, endsAt: window.endsAt },
      }),
    });
  });
  await sendQueuedMail(deps);
  return getOrderDetail(db, orderId);
}
