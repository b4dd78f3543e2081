import { and, eq, sql } from 'drizzle-orm';
import type { Tx } from '../../db/client';
import { payments } from '../../db/schema/index';

export async function findPaymentByKey(db: Tx, key: string) {
  const [row] = await db.select().from(payments).where(eq(payments.idempotencyKey, key));
  return row ?? null;
}

/** Refunds sent to the provider whose answer has not been recorded yet; they count against what is left. */
export async function pendingRefundCents(db: Tx, orderId: number) {
  const [row] = await db.select({ n: sql<number>`coalesce(sum(${payments.amountCents}), 0)::int` }).from(payments)
    .where(and(eq(payments.orderId, orderId), eq(payments.kind, 'refund'), eq(payments.status, 'pending')));
  return row.n;
}

export async function insertPendingRefund(db: Tx, v: { orderId: number; amountCents: number; reason: string; idempotencyKey: string; createdBy: string | null }) {
  const [row] = await db.insert(payments).values({ ...v, kind: 'refund', status: 'pending' }).returning();
  return row;
}

export async function settleRefund(db: Tx, id: number, v: { status: 'succeeded' | 'failed'; providerId?: string | null }) {
  const [row] = await db.update(payments).set(v).where(eq(payments.id, id)).returning();
  return row;
}
