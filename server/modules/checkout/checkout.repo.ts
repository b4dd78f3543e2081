import { and, asc, desc, eq, inArray, isNotNull, isNull } from 'drizzle-orm';
import type { Tx } from '../../db/client';
import { holds, orderLines, orders, payments, pickupWindows, slabs, species, user } from '../../db/schema/index';

export async function findOrderByKey(tx: Tx, idempotencyKey: string) {
  const [row] = await tx.select().from(orders).where(eq(orders.idempotencyKey, idempotencyKey));
  return row ?? null;
}

export async function findOrder(tx: Tx, id: number) {
  const [row] = await tx.select().from(orders).where(eq(orders.id, id));
  return row ?? null;
}

/** The buyer's active holds (all, or the listed ones) with slab and species, locked for this checkout. */
export function lockBuyerHolds(tx: Tx, buyerId: string, holdIds?: number[]) {
  return tx.select({ hold: holds, slab: slabs, species }).from(holds)
    .innerJoin(slabs, eq(slabs.id, holds.slabId)).innerJoin(species, eq(species.id, slabs.speciesId))
    .where(and(eq(holds.buyerId, buyerId), eq(holds.status, 'active'), holdIds ? inArray(holds.id, holdIds) : undefined))
    .orderBy(asc(holds.id)).for('update', { of: holds });
}

/** Lines of unfinished checkouts for these slabs: a second checkout must not pay for them too. */
export function pendingLinesFor(tx: Tx, slabIds: number[]) {
  if (!slabIds.length) return Promise.resolve([]);
  return tx.select({ slabId: orderLines.slabId, orderId: orderLines.orderId, sessionId: orders.checkoutSessionId }).from(orderLines)
    .innerJoin(orders, eq(orders.id, orderLines.orderId))
    .where(and(inArray(orderLines.slabId, slabIds), eq(orderLines.status, 'pending')));
}

/** The buyer's active holds (all, or the listed ones), without locking: a look before a checkout starts. */
export const buyerHeldSlabIds = (tx: Tx, buyerId: string, holdIds?: number[]) =>
  tx.select({ slabId: holds.slabId }).from(holds)
    .where(and(eq(holds.buyerId, buyerId), eq(holds.status, 'active'), holdIds ? inArray(holds.id, holdIds) : undefined));

/** Locks the attempt behind a payment page: settling it happens once, whoever gets here first. */
export async function lockOrderBySession(tx: Tx, sessionId: string) {
  const [row] = await tx.select().from(orders).where(eq(orders.checkoutSessionId, sessionId)).for('update');
  return row ?? null;
}

/** Active holds of this buyer on these slabs (the ones a paid attempt converts). */
export const activeHoldsOn = (tx: Tx, buyerId: string, slabIds: number[]) =>
  tx.select({ id: holds.id }).from(holds).where(and(eq(holds.buyerId, buyerId), eq(holds.status, 'active'), inArray(holds.slabId, slabIds))).for('update');

export async function insertOrder(tx: Tx, values: typeof orders.$inferInsert) {
  const [row] = await tx.insert(orders).values(values).returning();
  return row;
}

export async function updateOrder(tx: Tx, id: number, values: Partial<typeof orders.$inferInsert>) {
  const [row] = await tx.update(orders).set(values).where(eq(orders.id, id)).returning();
  return row;
}

export const insertLines = (tx: Tx, rows: (typeof orderLines.$inferInsert)[]) => tx.insert(orderLines).values(rows).returning();
export const setLineStatus = (tx: Tx, orderId: number, status: string) => tx.update(orderLines).set({ status }).where(eq(orderLines.orderId, orderId));
export const linesOf = (tx: Tx, orderId: number) => tx.select().from(orderLines).where(eq(orderLines.orderId, orderId)).orderBy(asc(orderLines.id));

export const keepHoldsUntil = (tx: Tx, ids: number[], until: Date) =>
  tx.update(holds).set({ expiresAt: until }).where(and(inArray(holds.id, ids), eq(holds.status, 'active')));

export const insertPayment = (tx: Tx, values: typeof payments.$inferInsert) => tx.insert(payments).values(values).returning();
export async function findPaymentByKey(tx: Tx, key: string) {
  const [row] = await tx.select().from(payments).where(eq(payments.idempotencyKey, key));
  return row ?? null;
}

/** The buyer's orders: only attempts that were paid (a declined or abandoned attempt is not an order). */
export const ordersOfBuyer = (tx: Tx, buyerId: string) =>
  tx.select({ order: orders, window: pickupWindows }).from(orders).leftJoin(pickupWindows, eq(pickupWindows.id, orders.pickupWindowId))
    .where(and(eq(orders.buyerId, buyerId), isNotNull(orders.paidAt))).orderBy(desc(orders.createdAt), desc(orders.id));

export async function orderWithWindow(tx: Tx, id: number) {
  const [row] = await tx.select({ order: orders, window: pickupWindows, buyerEmail: user.email, buyerName: user.name }).from(orders)
    .leftJoin(pickupWindows, eq(pickupWindows.id, orders.pickupWindowId)).innerJoin(user, eq(user.id, orders.buyerId))
    .where(eq(orders.id, id));
  return row ?? null;
}

/** Paid orders collected on `day` whose reminder has not gone out yet. */
export const ordersToRemind = (tx: Tx, day: string) =>
  tx.select({ id: orders.id }).from(orders)
    .where(and(eq(orders.status, 'paid'), eq(orders.pickupOn, day), isNull(orders.reminderSentAt))).for('update');

export const countLinesByOrder = (tx: Tx, orderIds: number[]) =>
  orderIds.length ? tx.select({ orderId: orderLines.orderId }).from(orderLines).where(inArray(orderLines.orderId, orderIds)) : Promise.resolve([]);
