import type { Db, Tx } from '../../db/client';
import { recordAudit } from '../../lib/audit';
import { getLogger } from '../../lib/logger';
import type { PaymentPageState, Payments } from '../../lib/payments';
import { queueEmail } from '../../lib/outbox';
import { orderConfirmationEmail } from '../../lib/email-templates';
import { closeHolds } from '../holds/holds.repo';
import { moveSlabs } from '../slabs/slab-state';
import { orderEmailInput } from './order-view';
import * as repo from './checkout.repo';

export type SettleDeps = { db: Db; payments: Payments; publicUrl: string };
type Order = NonNullable<Awaited<ReturnType<typeof repo.findOrder>>>;
export type SettleOutcome = 'paid' | 'abandoned' | 'open' | 'already-settled' | 'unknown';

export const chargeKey = (checkoutKey: string) => `order-${checkoutKey}`;

/** The attempt ended without money (declined and left, abandoned, expired): lines void, holds untouched. */
async function abandon(tx: Tx, order: Order, reason: string, chargeId?: string) {
  await repo.setLineStatus(tx, order.id, 'void');
  await repo.updateOrder(tx, order.id, { status: 'abandoned', paymentUrl: null });
  await repo.insertPayment(tx, {
    orderId: order.id, kind: 'charge', providerId: chargeId ?? null, amountCents: order.totalCents,
    status: chargeId ? 'refunded' : 'failed', reason, idempotencyKey: chargeKey(order.idempotencyKey), createdBy: order.buyerId,
  });
}

/** The money arrived: slabs sold, holds converted, order paid, confirmation queued — or, if the slabs are gone, false. */
async function complete(tx: Tx, deps: SettleDeps, order: Order, chargeId: string, now: Date) {
  const lines = await repo.linesOf(tx, order.id);
  const slabIds = lines.map((l) => l.slabId);
  // Checked before any write: every slab must still be held for this buyer.
  const held = await repo.activeHoldsOn(tx, order.buyerId, slabIds);
  if (held.length !== slabIds.length) return false;
  const sold = await moveSlabs(tx, slabIds, 'sold', 'sale', now);
  if (sold.length !== slabIds.length) throw new Error(`order ${order.code}: a held slab was not in the held state`);
  await repo.setLineStatus(tx, order.id, 'sold'); // the unique index refuses a second sale of any slab
  await closeHolds(tx, held.map((h) => h.id), 'converted', order.buyerId, now);
  await repo.updateOrder(tx, order.id, { status: 'paid', paidAt: now, chargeId, paymentUrl: null });
  await repo.insertPayment(tx, {
    orderId: order.id, kind: 'charge', providerId: chargeId, amountCents: order.totalCents, status: 'succeeded',
    idempotencyKey: chargeKey(order.idempotencyKey), createdBy: order.buyerId,
  });
  await recordAudit(tx, {
    actor: { id: order.buyerId, email: '' }, action: 'order.paid', entityType: 'order', entityId: order.id,
    before: { status: 'pending-payment' }, after: { status: 'paid', totalCents: order.totalCents, taxCents: order.taxCents, chargeId },
  });
  const mail = await orderEmailInput(tx, order.id, deps.publicUrl);
  await queueEmail(tx, { to: mail.to, kind: 'order-confirmation', content: orderConfirmationEmail(mail.input) });
  return true;
}

/** A paid page must be for this very attempt and amount; anything else is never taken as payment. */
function matches(order: Order, page: PaymentPageState) {
  return page.amountTotalCents === order.totalCents && page.metadata.orderId === String(order.id) && page.metadata.checkoutKey === order.idempotencyKey;
}

/**
 * Applies the provider's record of a payment page to its attempt. The buyer's return, the signed
 * event and a new checkout all come here; the order row is locked and only a pending attempt
 * changes, so the sale happens exactly once whichever arrives first.
 */
export async function applyPageState(deps: SettleDeps, page: PaymentPageState, now = new Date()): Promise<SettleOutcome> {
  return deps.db.transaction(async (tx): Promise<SettleOutcome> => {
    const order = await repo.lockOrderBySession(tx, page.sessionId);
    if (!order) return 'unknown';
    if (order.status !== 'pending-payment') return 'already-settled';
    if (page.status === 'complete' && page.paid && page.chargeId) {
      if (!matches(order, page)) {
        getLogger().error({ part: 'checkout', order: order.code, sessionId: page.sessionId }, 'a paid payment page does not match its order; not taken as payment');
        return 'open';
      }
      if (await complete(tx, deps, order, page.chargeId, now)) return 'paid';
      // Money taken but the slabs are no longer held for this buyer: give it back, then record that.
      // (Rare path: the refund is asked inside the transaction so a failure leaves the attempt pending to retry.)
      await deps.payments.refund({ chargeId: page.chargeId, amountCents: order.totalCents, idempotencyKey: `${chargeKey(order.idempotencyKey)}-undo`, reason: 'duplicate' });
      await abandon(tx, order, 'The slabs were no longer held when the payment arrived; the charge was refunded in full.', page.chargeId);
      return 'abandoned';
    }
    if (page.status === 'expired') {
      await abandon(tx, order, 'The payment was not completed.');
      return 'abandoned';
    }
    return 'open';
  });
}

/** Asks the provider about an attempt's page (the buyer came back) and applies the answer. */
export async function checkAttempt(deps: SettleDeps, sessionId: string) {
  return applyPageState(deps, await deps.payments.readPaymentPage(sessionId));
}

/** Closes an attempt's page at the provider first (so it cannot be paid later), then applies its final state. */
export async function closeAttempt(deps: SettleDeps, sessionId: string) {
  return applyPageState(deps, await deps.payments.closePaymentPage(sessionId));
}
