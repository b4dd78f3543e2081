import { eq, inArray, sql } from 'drizzle-orm';
import type { Tx } from '../../db/client';
import { orderLines, refundLines } from '../../db/schema/index';
import { allocateRefund, type LineMoney } from '../../../shared/money';

/** What each line of an order still holds: paid wood, services and tax less what refunds took from it. */
export async function remainingLineMoney(tx: Tx, orderId: number): Promise<LineMoney[]> {
  const lines = await tx.select().from(orderLines).where(eq(orderLines.orderId, orderId));
  if (!lines.length) return [];
  const taken = await tx.select({
    lineId: refundLines.orderLineId,
    wood: sql<number>`sum(${refundLines.woodCents})::int`, services: sql<number>`sum(${refundLines.servicesCents})::int`, tax: sql<number>`sum(${refundLines.taxCents})::int`,
  }).from(refundLines).where(inArray(refundLines.orderLineId, lines.map((l) => l.id))).groupBy(refundLines.orderLineId);
  // Attempts' void lines never held money.
  return lines.filter((l) => l.status !== 'void' && l.status !== 'pending').map((l) => {
    const t = taken.find((x) => x.lineId === l.id);
    return {
      lineId: l.id,
      woodCents: l.slabCents - Number(t?.wood ?? 0),
      servicesCents: l.servicesCents - Number(t?.services ?? 0),
      taxCents: l.taxCents - Number(t?.tax ?? 0),
    };
  });
}

/**
 * Writes down which wood, services and tax a refund gave back, line by line (lines refunded in
 * full first, the rest pro rata), in the refund's own transaction.
 */
export async function recordRefundAllocation(tx: Tx, { orderId, paymentId, amountCents, fullLineIds }: { orderId: number; paymentId: number; amountCents: number; fullLineIds: number[] }) {
  const parts = allocateRefund(await remainingLineMoney(tx, orderId), fullLineIds, amountCents);
  if (parts.length) await tx.insert(refundLines).values(parts.map((p) => ({ paymentId, orderLineId: p.lineId, woodCents: p.woodCents, servicesCents: p.servicesCents, taxCents: p.taxCents })));
  return parts;
}
