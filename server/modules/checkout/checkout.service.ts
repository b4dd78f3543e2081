import type { Db, Tx } from '../../db/client';
import { AppError } from '../../lib/errors';
import { recordAudit } from '../../lib/audit';
import type { SessionUser } from '../../lib/session';
import type { Payments } from '../../lib/payments';
import { queueEmail } from '../../lib/outbox';
import { orderConfirmationEmail } from '../../lib/email-templates';
import type { checkoutSchema } from '../../../shared/checkout';
import type { z } from 'zod';
import { loadPricingRules } from '../pricing/pricing.service';
import { withReadingsAndCovers, closeHolds } from '../holds/holds.repo';
import { quoteSlab } from '../pricing/slab-quote';
import { getLogger } from '../../lib/logger';
import { isUniqueViolation } from '../holds/unique-violation';
import { claimPickupPlace } from '../pickups/pickups.service';
import { orderEmailInput, orderView } from './order-view';
import * as repo from './checkout.repo';
import { moveSlabs } from '../slabs/slab-state';

type CheckoutInput = z.infer<typeof checkoutSchema>;
export type CheckoutDeps = { db: Db; payments: Payments; publicUrl: string };
type Order = NonNullable<Awaited<ReturnType<typeof repo.findOrder>>>;

/** Holds are kept at least this long while a payment is under way, so the sweep cannot free them mid-payment. */
const PAYMENT_GRACE_MS = 15 * 60_000;

export const orderCode = (id: number, at: Date) =>
  `SL-${String(at.getUTCFullYear() % 100).padStart(2, '0')}${String(at.getUTCMonth() + 1).padStart(2, '0')}-${String(id).padStart(4, '0')}`;
const chargeKey = (key: string) => `order-${key}`;

/** Step 1, one transaction: check holds and pickup place, snapshot prices, write a pending order. */
async function prepareOrder(db: Db, buyer: SessionUser, input: CheckoutInput, key: string, now: Date) {
  return db.transaction(async (tx) => {
    const held = await repo.lockBuyerHolds(tx, buyer.id, input.holdIds);
    if (input.holdIds && held.length !== new Set(input.holdIds).size) {
      throw new AppError(409, 'holds_changed', 'Some of those holds have ended or are not yours. Reload your reservations and try again.');
    }
    if (!held.length) throw new AppError(409, 'no_holds', 'You have no slabs on hold to pay for.');
    const lapsed = held.find((h) => h.hold.expiresAt <= now || h.slab.status !== 'held');
    if (lapsed) throw new AppError(409, 'hold_lapsed', `Your hold on slab ${lapsed.slab.code} has run out. Reserve it again if it is still for sale.`);
    const slabIds = held.map((h) => h.slab.id);
    const stray = input.withFlattening.filter((id) => !slabIds.includes(id));
    if (stray.length) throw new AppError(400, 'validation', 'Flattening can only be added to slabs in this order.', { withFlattening: ['Flattening can only be added to slabs in this order'] });
    if ((await repo.pendingLinesFor(tx, slabIds)).length) {
      throw new AppError(409, 'payment_in_progress', 'These slabs are already being paid for in another checkout. Wait a moment and reload.');
    }
    const window = await claimPickupPlace(tx, { windowId: input.pickupWindowId, day: input.pickupOn, now });

    const rules = await loadPricingRules(tx);
    const lines = (await withReadingsAndCovers(tx, held)).map(({ slab, species, latestMc }) => {
      const flatten = input.withFlattening.includes(slab.id);
      const q = quoteSlab(slab, species, latestMc, rules, flatten);
      if (flatten && !q.flattening.feasible) {
        throw new AppError(400, 'validation', `Slab ${slab.code} cannot be flattened: ${q.flattening.reason}`, { withFlattening: [`${slab.code}: ${q.flattening.reason}`] });
      }
      return {
        slabId: slab.id, status: 'pending', slabCode: slab.code, speciesName: species.name, boardFeet: q.breakdown.boardFeet,
        weightLb: q.weightLb, lengthIn: slab.lengthIn, priceBreakdown: { ...q.breakdown, weightAtMcPercent: q.mcPercent },
        withFlattening: flatten, slabCents: q.breakdown.slabCents, servicesCents: q.breakdown.flatteningCents, totalCents: q.breakdown.totalCents,
      };
    });
    const slabsCents = lines.reduce((t, l) => t + l.slabCents, 0);
    const servicesCents = lines.reduce((t, l) => t + l.servicesCents, 0);
    const order = await repo.insertOrder(tx, {
      code: `pending-${key}`, buyerId: buyer.id, status: 'pending-payment', slabsCents, servicesCents, totalCents: slabsCents + servicesCents,
      totalWeightLb: lines.reduce((t, l) => t + l.weightLb, 0), longestSlabIn: Math.max(...lines.map((l) => l.lengthIn)),
      loadingHelp: input.loadingHelp, pickupWindowId: window.id, pickupOn: input.pickupOn, idempotencyKey: key, createdAt: now,
    });
    const coded = await repo.updateOrder(tx, order.id, { code: orderCode(order.id, now) });
    await repo.insertLines(tx, lines.map((l) => ({ ...l, orderId: order.id })));
    const graceUntil = new Date(now.getTime() + PAYMENT_GRACE_MS);
    await repo.keepHoldsUntil(tx, held.filter((h) => h.hold.expiresAt < graceUntil).map((h) => h.hold.id), graceUntil);
    return { order: coded, holdIds: held.map((h) => h.hold.id), slabIds };
  });
}

/** Step 3, one transaction: the charge went through — slabs sold, holds converted, order paid, mail queued. */
async function completeOrder(deps: CheckoutDeps, buyer: SessionUser, prepared: Awaited<ReturnType<typeof prepareOrder>>, chargeId: string, now: Date) {
  const { order, holdIds, slabIds } = prepared;
  await deps.db.transaction(async (tx) => {
    const sold = await moveSlabs(tx, slabIds, 'sold', 'sale', now);
    if (sold.length !== slabIds.length) throw new AppError(409, 'slab_gone', 'One of these slabs is no longer held for you.');
    await repo.setLineStatus(tx, order.id, 'sold'); // the unique index refuses a second sale of any slab
    await closeHolds(tx, holdIds, 'converted', buyer.id, now);
    await repo.updateOrder(tx, order.id, { status: 'paid', paidAt: now, chargeId });
    await repo.insertPayment(tx, { orderId: order.id, kind: 'charge', providerId: chargeId, amountCents: order.totalCents, status: 'succeeded', idempotencyKey: chargeKey(order.idempotencyKey), createdBy: buyer.id });
    await recordAudit(tx, { actor: buyer, action: 'order.paid', entityType: 'order', entityId: order.id, before: { status: 'pending-payment' }, after: { status: 'paid', totalCents: order.totalCents, chargeId } });
    const mail = await orderEmailInput(tx, order.id, deps.publicUrl);
    await queueEmail(tx, { to: mail.to, kind: 'order-confirmation', content: orderConfirmationEmail(mail.input) });
  });
}

/** The payment did not happen (or was undone): the order is closed, its lines void, the holds stay with the buyer. */
async function failOrder(db: Db, order: Order, reason: string, chargeId?: string) {
  await db.transaction(async (tx: Tx) => {
    await repo.setLineStatus(tx, order.id, 'void');
    await repo.updateOrder(tx, order.id, { status: 'cancelled' });
    await repo.insertPayment(tx, {
      orderId: order.id, kind: 'charge', providerId: chargeId ?? null, amountCents: order.totalCents,
      status: chargeId ? 'refunded' : 'failed', reason, idempotencyKey: chargeKey(order.idempotencyKey), createdBy: order.buyerId,
    });
  });
}

/** A repeated request with a key already used: answer with the first outcome, never charge again. */
async function replay(db: Db, buyer: SessionUser, order: Order) {
  if (order.buyerId !== buyer.id) throw new AppError(409, 'key_in_use', 'This checkout key belongs to another checkout. Reload the page and try again.');
  if (order.status === 'pending-payment') throw new AppError(409, 'payment_in_progress', 'This payment is still being processed. Wait a moment and check your orders.');
  if (order.status === 'cancelled') {
    const payment = await repo.findPaymentByKey(db, chargeKey(order.idempotencyKey));
    throw new AppError(402, 'payment_failed', payment?.reason || 'The payment did not go through. Your holds are kept — try again.');
  }
  return { order: await orderView(db, order.id), replayed: true };
}

export async function checkout(deps: CheckoutDeps, buyer: SessionUser, input: CheckoutInput, key: string, now = new Date()) {
  const existing = await repo.findOrderByKey(deps.db, key);
  if (existing) return replay(deps.db, buyer, existing);
  let prepared: Awaited<ReturnType<typeof prepareOrder>>;
  try {
    prepared = await prepareOrder(deps.db, buyer, input, key, now);
  } catch (err) {
    // Two requests with one key raced: the loser answers with the winner's outcome.
    const raced = isUniqueViolation(err) ? await repo.findOrderByKey(deps.db, key) : null;
    if (raced) return replay(deps.db, buyer, raced);
    throw err;
  }
  const { order } = prepared;
  let chargeId: string;
  try {
    ({ chargeId } = await deps.payments.charge({
      amountCents: order.totalCents, source: input.cardToken, idempotencyKey: chargeKey(key),
      description: `Stickerline order ${order.code}`, metadata: { orderId: String(order.id), orderCode: order.code, checkoutKey: key },
    }));
  } catch (err) {
    await failOrder(deps.db, order, err instanceof AppError ? err.message : 'The payment service could not be reached.');
    throw err;
  }
  try {
    await completeOrder(deps, buyer, prepared, chargeId, now);
  } catch (err) {
    // Money taken but the sale could not be recorded: give the money back before reporting.
    getLogger().error({ part: 'checkout', order: order.code, chargeId, err }, 'an order could not be completed after its charge; refunding');
    await deps.payments.refund({ chargeId, amountCents: order.totalCents, idempotencyKey: `${chargeKey(key)}-undo`, reason: 'duplicate' });
    await failOrder(deps.db, order, 'The sale could not be completed; the charge was refunded.', chargeId);
    if (err instanceof AppError) throw err;
    throw new AppError(409, 'sale_failed', 'These slabs could not be sold to you; the charge was refunded in full.');
  }
  return { order: await orderView(deps.db, order.id), replayed: false };
}
