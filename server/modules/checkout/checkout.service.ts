import type { Db, Tx } from '../../db/client';
import { AppError } from '../../lib/errors';
import type { SessionUser } from '../../lib/session';
import type { Payments } from '../../lib/payments';
import type { checkoutSchema } from '../../../shared/checkout';
import type { z } from 'zod';
import { loadPricingRules } from '../pricing/pricing.service';
import { withReadingsAndCovers } from '../holds/holds.repo';
import { quoteSlab } from '../pricing/slab-quote';
import { isUniqueViolation } from '../holds/unique-violation';
import { claimPickupPlace } from '../pickups/pickups.service';
import { orderView } from './order-view';
import { taxRuleFor } from '../sales-terms/sales-terms.service';
import { taxForLines } from '../../../shared/sales-terms';
import { chargeKey, closeAttempt } from './payment-settlement';
import * as repo from './checkout.repo';

type CheckoutInput = z.infer<typeof checkoutSchema>;
export type CheckoutDeps = { db: Db; payments: Payments; publicUrl: string };
type Order = NonNullable<Awaited<ReturnType<typeof repo.findOrder>>>;

/** A payment page lives 31 minutes (the provider's shortest is 30); holds outlast it, so the sweep cannot free them mid-payment. */
const PAGE_LIFETIME_MS = 31 * 60_000;
const PAYMENT_GRACE_MS = PAGE_LIFETIME_MS + 5 * 60_000;

export const orderCode = (id: number, at: Date) =>
  `SL-${String(at.getUTCFullYear() % 100).padStart(2, '0')}${String(at.getUTCMonth() + 1).padStart(2, '0')}-${String(id).padStart(4, '0')}`;

/** One transaction: check holds and pickup place, snapshot prices, write a pending order. */
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
    // Sales tax is computed here once, on the server, and stored: every later view reads these numbers.
    const rule = await taxRuleFor(tx, buyer.id);
    const tax = taxForLines(lines, rule);
    const taxed = lines.map((l, i) => ({ ...l, taxCents: tax.perLine[i], totalCents: l.slabCents + l.servicesCents + tax.perLine[i] }));
    const slabsCents = lines.reduce((t, l) => t + l.slabCents, 0);
    const servicesCents = lines.reduce((t, l) => t + l.servicesCents, 0);
    const order = await repo.insertOrder(tx, {
      code: `pending-${key}`, buyerId: buyer.id, status: 'pending-payment', slabsCents, servicesCents,
      taxCents: tax.taxCents, taxExemptCertificate: rule.certificate, totalCents: slabsCents + servicesCents + tax.taxCents,
      totalWeightLb: lines.reduce((t, l) => t + l.weightLb, 0), longestSlabIn: Math.max(...lines.map((l) => l.lengthIn)),
      loadingHelp: input.loadingHelp, pickupWindowId: window.id, pickupOn: input.pickupOn, idempotencyKey: key, createdAt: now,
    });
    const coded = await repo.updateOrder(tx, order.id, { code: orderCode(order.id, now) });
    await repo.insertLines(tx, taxed.map((l) => ({ ...l, orderId: order.id })));
    const graceUntil = new Date(now.getTime() + PAYMENT_GRACE_MS);
    await repo.keepHoldsUntil(tx, held.filter((h) => h.hold.expiresAt < graceUntil).map((h) => h.hold.id), graceUntil);
    return { order: coded, holdIds: held.map((h) => h.hold.id), slabIds };
  });
}

/** The attempt could not reach the payment page: closed at once, holds kept. */
async function failAttempt(db: Db, order: Order, reason: string) {
  await db.transaction(async (tx: Tx) => {
    await repo.setLineStatus(tx, order.id, 'void');
    await repo.updateOrder(tx, order.id, { status: 'abandoned' });
    await repo.insertPayment(tx, {
      orderId: order.id, kind: 'charge', providerId: null, amountCents: order.totalCents, status: 'failed', reason,
      idempotencyKey: chargeKey(order.idempotencyKey), createdBy: order.buyerId,
    });
  });
}

/** A repeated request with a key already used: answer with the first outcome, never open a second page. */
async function replay(db: Db, buyer: SessionUser, order: Order) {
  if (order.buyerId !== buyer.id) throw new AppError(409, 'key_in_use', 'This checkout key belongs to another checkout. Reload the page and try again.');
  if (order.status === 'abandoned') {
    const payment = await repo.findPaymentByKey(db, chargeKey(order.idempotencyKey));
    throw new AppError(409, 'attempt_closed', payment?.reason || 'This payment attempt has ended. Your holds are kept — start the checkout again.');
  }
  return { order: await orderView(db, order.id), paymentUrl: order.paymentUrl, replayed: true };
}

/**
 * Earlier unfinished attempts on these slabs by this buyer (the tab was closed, the back button was
 * pressed): their pages are closed at the provider first, so they can never be paid later. If one
 * turns out to be paid, it becomes the order and this checkout finds nothing left to pay for.
 */
async function closeEarlierAttempts(deps: CheckoutDeps, buyer: SessionUser, holdIds?: number[]) {
  const slabIds = (await repo.buyerHeldSlabIds(deps.db, buyer.id, holdIds)).map((h) => h.slabId);
  const sessions = new Set((await repo.pendingLinesFor(deps.db, slabIds)).map((l) => l.sessionId).filter((id): id is string => !!id));
  for (const sessionId of sessions) await closeAttempt(deps, sessionId);
}

const pageLines = (lines: Awaited<ReturnType<typeof repo.linesOf>>) => lines.flatMap((l) => [
  { name: `${l.speciesName} slab ${l.slabCode}`, amountCents: l.slabCents },
  ...(l.servicesCents > 0 ? [{ name: `Flattening, slab ${l.slabCode}`, amountCents: l.servicesCents }] : []),
]);

export async function checkout(deps: CheckoutDeps, buyer: SessionUser, input: CheckoutInput, key: string, now = new Date()) {
  const existing = await repo.findOrderByKey(deps.db, key);
  if (existing) return replay(deps.db, buyer, existing);
  await closeEarlierAttempts(deps, buyer, input.holdIds);
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
  const lines = await repo.linesOf(deps.db, order.id);
  let page: { sessionId: string; url: string };
  try {
    page = await deps.payments.openPaymentPage({
      idempotencyKey: `page-${key}`,
      lines: [...pageLines(lines), ...(order.taxCents > 0 ? [{ name: 'Sales tax', amountCents: order.taxCents }] : [])],
      successUrl: `${deps.publicUrl}/orders/${order.id}?payment=returned`,
      cancelUrl: `${deps.publicUrl}/orders/${order.id}?payment=cancelled`,
      customerEmail: buyer.email, expiresAt: new Date(now.getTime() + PAGE_LIFETIME_MS),
      metadata: { orderId: String(order.id), orderCode: order.code, checkoutKey: key },
    });
  } catch (err) {
    await failAttempt(deps.db, order, err instanceof AppError ? err.message : 'The payment service could not be reached.');
    throw err;
  }
  await repo.updateOrder(deps.db, order.id, { checkoutSessionId: page.sessionId, paymentUrl: page.url });
  return { order: await orderView(deps.db, order.id), paymentUrl: page.url, replayed: false };
}
