import { eq } from 'drizzle-orm';
import type { Db } from '../../db/client';
import { orders, payments } from '../../db/schema/index';
import { pendingRefundCents } from '../office/refunds.repo';
import { recordRefundAllocation } from '../office/refund-allocation';
import { recordAudit } from '../../lib/audit';
import type { PaymentEvent } from '../../lib/payments';
import { checkAttempt, type SettleDeps } from '../checkout/payment-settlement';

/**
 * Applies a verified provider event. Each handler sets state from the event's own totals, so a
 * repeated delivery changes nothing the second time.
 */
export async function applyPaymentEvent(deps: SettleDeps, event: PaymentEvent) {
  if (event.type === 'other') return { handled: false };
  if (event.type === 'charge.refunded' || event.type === 'charge.dispute.created') return applyChargeEvent(deps.db, event);
  // A page was paid or expired: the event only says which page; the provider's record of it (read through the SDK) decides.
  const outcome = await checkAttempt(deps, event.sessionId);
  return { handled: outcome !== 'unknown' };
}

async function applyChargeEvent(db: Db, event: Extract<PaymentEvent, { type: 'charge.refunded' | 'charge.dispute.created' }>) {
  return db.transaction(async (tx) => {
    const [order] = await tx.select().from(orders).where(eq(orders.chargeId, event.chargeId)).for('update');
    if (!order) return { handled: false };
    const before = { status: order.status, refundedCents: order.refundedCents, disputed: order.disputed };
    let after = before;
    if (event.type === 'charge.refunded') {
      // Refunds the shop asked for are already (or about to be) recorded; only money refunded elsewhere is new here.
      const known = order.refundedCents + (await pendingRefundCents(tx, order.id));
      const extra = Math.min(order.totalCents, event.amountRefundedCents) - known;
      if (extra > 0) {
        const refundedCents = order.refundedCents + extra;
        const status = refundedCents >= order.totalCents ? 'refunded' : order.status;
        after = { ...before, refundedCents, status };
        await tx.update(orders).set({ refundedCents, status }).where(eq(orders.id, order.id));
        const [payment] = await tx.insert(payments).values({
          orderId: order.id, kind: 'refund', providerId: event.id, amountCents: extra, status: 'succeeded',
          reason: 'Refunded at the payment provider', idempotencyKey: `provider-event:${event.id}`,
        }).onConflictDoNothing().returning();
        if (payment) await recordRefundAllocation(tx, { orderId: order.id, paymentId: payment.id, amountCents: extra, fullLineIds: [] });
      }
    } else {
      after = { ...before, disputed: true };
      await tx.update(orders).set({ disputed: true }).where(eq(orders.id, order.id));
    }
    if (JSON.stringify(before) !== JSON.stringify(after)) {
      await recordAudit(tx, { actor: null, action: `payment-event.${event.type}`, entityType: 'order', entityId: order.id, before, after: { ...after, eventId: event.id } });
    }
    return { handled: true };
  });
}
