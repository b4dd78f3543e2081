import type { Db } from '../../db/client';
import { AppError, notFound, validationError } from '../../lib/errors';
import { recordAudit } from '../../lib/audit';
import type { SessionUser } from '../../lib/session';
import type { Payments } from '../../lib/payments';
import type { Mailer } from '../../lib/mail';
import { flushOutbox, queueEmail } from '../../lib/outbox';
import { refundIssuedEmail } from '../../lib/email-templates';
import { formatCents } from '../../../shared/wood/index';
import type { CreateRefundInput } from '../../../shared/office';
import * as orders from './orders.repo';
import * as repo from './refunds.repo';
import { moveSlabs } from '../slabs/slab-state';
import { getLogger } from '../../lib/logger';
import { getOrderDetail, toPaymentView } from './orders.service';
import { recordRefundAllocation } from './refund-allocation';

export type RefundDeps = { db: Db; payments: Payments; mailer: Mailer; publicUrl?: string; trustedOrigins?: string[] };
export type RefundRequest = Required<Omit<CreateRefundInput, 'slabIds'>> & { slabIds: number[]; idempotencyKey: string };

const REFUNDABLE_STATUSES = ['paid', 'picked-up', 'no-show', 'refunded'];

/** Step 1, in one transaction: check the amount against what is left and write the refund down as pending. */
async function reserveRefund(db: Db, actor: SessionUser | null, orderId: number, r: RefundRequest) {
  return db.transaction(async (tx) => {
    const order = await orders.lockOrder(tx, orderId);
    if (!order) throw notFound('That order');
    const existing = await repo.findPaymentByKey(tx, r.idempotencyKey);
    if (existing) return { order, payment: existing, replay: true as const };
    if (!order.paidAt || !order.chargeId || !REFUNDABLE_STATUSES.includes(order.status)) {
      throw new AppError(409, 'not_refundable', 'This order was never paid, so there is nothing to refund.');
    }
    const left = order.totalCents - order.refundedCents - (await repo.pendingRefundCents(tx, orderId));
    if (r.amountCents > left) {
      const msg = left <= 0 ? 'This order has already been refunded in full.' : `At most ${formatCents(left)} can still be refunded on this order.`;
      throw validationError({ amountCents: [msg] }, msg);
    }
    const lines = (await orders.linesOf(tx, [orderId])).map((l) => l.line);
    const chosen = lines.filter((l) => r.slabIds.includes(l.slabId));
    const unknown = r.slabIds.filter((id) => !chosen.some((l) => l.slabId === id && l.status === 'sold'));
    if (unknown.length) throw validationError({ slabIds: ['Choose only slabs of this order that are not refunded yet.'] });
    const linesCents = chosen.reduce((n, l) => n + l.totalCents, 0);
    if (r.amountCents < linesCents) {
      const msg = `Refunding those slabs in full needs at least ${formatCents(linesCents)}.`;
      throw validationError({ amountCents: [msg] }, msg);
    }
    const payment = await repo.insertPendingRefund(tx, { orderId, amountCents: r.amountCents, reason: r.reason, idempotencyKey: r.idempotencyKey, createdBy: actor?.id ?? null });
    return { order, payment, replay: false as const };
  });
}

/**
 * Refunds money on an order. The refund is written as pending before the provider is asked, so two
 * clicks can never both pass the "what is left" check; the same idempotency key is handed to the
 * provider, so a retried request cannot refund twice there either. Fully refunded lines free their
 * slabs (back on sale or withdrawn), the order's totals move, the buyer is e-mailed, the change is audited.
 */
export async function issueRefund(deps: RefundDeps, actor: SessionUser | null, orderId: number, r: RefundRequest, opts: { keepStatus?: string; action?: string } = {}) {
  const { db } = deps;
  const { order, payment, replay } = await reserveRefund(db, actor, orderId, r);
  if (replay) {
    if (payment.orderId !== orderId || payment.amountCents !== r.amountCents) {
      throw new AppError(409, 'idempotency_mismatch', 'This request key was already used for a different refund. Reload the page and try again.');
    }
    if (payment.status === 'pending') throw new AppError(409, 'refund_in_progress', 'This refund is still being processed. Reload the page in a moment.');
    if (payment.status === 'failed') throw new AppError(409, 'refund_failed', 'This refund attempt failed earlier. Reload the page and start a new one.');
    return { replayed: true, refund: toPaymentView(payment), order: await getOrderDetail(db, orderId) };
  }

  let providerRefundId: string;
  try {
    const result = await deps.payments.refund({ chargeId: order.chargeId!, amountCents: r.amountCents, idempotencyKey: r.idempotencyKey, reason: 'requested_by_customer' });
    providerRefundId = result.refundId;
  } catch (err) {
    await repo.settleRefund(db, payment.id, { status: 'failed' });
    throw err;
  }

  const settled = await db.transaction(async (tx) => {
    const current = (await orders.lockOrder(tx, orderId))!;
    const row = await repo.settleRefund(tx, payment.id, { status: 'succeeded', providerId: providerRefundId });
    const lines = (await orders.linesOf(tx, [orderId])).map((l) => l.line).filter((l) => r.slabIds.includes(l.slabId) && l.status === 'sold');
    await recordRefundAllocation(tx, { orderId, paymentId: payment.id, amountCents: r.amountCents, fullLineIds: lines.map((l) => l.id) });
    await orders.setLinesStatus(tx, lines.map((l) => l.id), 'refunded');
    // The money has gone back already: a slab that is somehow elsewhere is left where it is, never blocks the record.
    await moveSlabs(tx, lines.map((l) => l.slabId), r.returnSlabsTo, 'refund');
    const refundedCents = current.refundedCents + r.amountCents;
    const status = opts.keepStatus ?? (refundedCents >= current.totalCents ? 'refunded' : current.status);
    await orders.updateOrder(tx, orderId, { refundedCents, status });
    await recordAudit(tx, {
      actor, action: opts.action ?? 'order.refund', entityType: 'order', entityId: orderId,
      before: { status: current.status, refundedCents: current.refundedCents },
      after: { status, refundedCents, amountCents: r.amountCents, reason: r.reason, slabCodes: lines.map((l) => l.slabCode), slabsReturnedTo: lines.length ? r.returnSlabsTo : null, providerRefundId },
    });
    const buyer = await orders.findOrder(tx, orderId);
    await queueEmail(tx, {
      to: buyer!.buyerEmail, kind: 'refund-issued',
      content: refundIssuedEmail({
        name: buyer!.buyerName, code: current.code, amountCents: r.amountCents, reason: r.reason,
        slabCodes: lines.map((l) => l.slabCode), fullyRefunded: refundedCents >= current.totalCents,
      }),
    });
    return row;
  });
  await sendQueuedMail(deps);
  return { replayed: false, refund: toPaymentView(settled), order: await getOrderDetail(db, orderId) };
}

/** Sends the queued e-mail now; if the mail server is down the row stays queued for the next try. */
export async function sendQueuedMail({ db, mailer }: { db: Db; mailer: Mailer }) {
  await flushOutbox(db, mailer).catch((err) => getLogger().warn({ part: 'office', reason: (err as Error).message }, 'sending queued e-mail failed'));
}
