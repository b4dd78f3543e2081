import { and, asc, desc, eq, exists, gte, ilike, inArray, isNotNull, lte, or, sql, type SQL } from 'drizzle-orm';
import type { Tx } from '../../db/client';
import { closedDays, millSettings, orderLines, orders, payments, pickupWindows, slabs, user } from '../../db/schema/index';

const escapeLike = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

const orderWithBuyer = {
  order: orders, buyerName: user.name, buyerEmail: user.email,
};

export async function findOrders(db: Tx, { status, q }: { status?: string; q?: string }) {
  const f: (SQL | undefined)[] = [];
  // A payment attempt is not an order: without a state asked for, only orders that were paid are listed.
  f.push(status ? eq(orders.status, status) : isNotNull(orders.paidAt));
  if (q) {
    const like = `%${escapeLike(q)}%`;
    f.push(or(
      ilike(orders.code, like), ilike(user.name, like), ilike(user.email, like),
      exists(db.select({ one: sql`1` }).from(orderLines).where(and(eq(orderLines.orderId, orders.id), ilike(orderLines.slabCode, like)))),
    ));
  }
  return db.select(orderWithBuyer).from(orders).innerJoin(user, eq(user.id, orders.buyerId))
    .where(f.length ? and(...f) : undefined).orderBy(desc(orders.createdAt), desc(orders.id)).limit(200);
}

export async function findOrder(db: Tx, id: number) {
  const [row] = await db.select(orderWithBuyer).from(orders).innerJoin(user, eq(user.id, orders.buyerId)).where(eq(orders.id, id));
  return row ?? null;
}

/** Locks the order row: money and status changes on one order happen one at a time. */
export async function lockOrder(db: Tx, id: number) {
  const [row] = await db.select().from(orders).where(eq(orders.id, id)).for('update');
  return row ?? null;
}

export function linesOf(db: Tx, orderIds: number[]) {
  if (!orderIds.length) return Promise.resolve([]);
  return db.select({ line: orderLines, slabStatus: slabs.status }).from(orderLines).innerJoin(slabs, eq(slabs.id, orderLines.slabId))
    .where(inArray(orderLines.orderId, orderIds)).orderBy(asc(orderLines.id));
}

export function paymentsOf(db: Tx, orderId: number) {
  return db.select().from(payments).where(eq(payments.orderId, orderId)).orderBy(asc(payments.createdAt), asc(payments.id));
}

export async function findWindow(db: Tx, id: number | null) {
  if (id === null) return null;
  const [row] = await db.select().from(pickupWindows).where(eq(pickupWindows.id, id));
  return row ?? null;
}

export const allWindows = (db: Tx) => db.select().from(pickupWindows).orderBy(asc(pickupWindows.weekday), asc(pickupWindows.startsAt));

export const closedDaysBetween = (db: Tx, from: string, to: string) =>
  db.select().from(closedDays).where(and(gte(closedDays.day, from), lte(closedDays.day, to)));

/** Orders due at the yard between two days (inclusive) that have been paid for. */
export function ordersForPickup(db: Tx, from: string, to: string) {
  return db.select(orderWithBuyer).from(orders).innerJoin(user, eq(user.id, orders.buyerId))
    .where(and(gte(orders.pickupOn, from), lte(orders.pickupOn, to), inArray(orders.status, ['paid', 'picked-up', 'no-show'])))
    .orderBy(asc(orders.pickupOn), asc(orders.code));
}

export async function readNoShowRule(db: Tx): Promise<'keep' | 'release-and-refund'> {
  const [row] = await db.select({ rule: millSettings.noShowRule }).from(millSettings).where(eq(millSettings.id, 1));
  return row?.rule === 'release-and-refund' ? 'release-and-refund' : 'keep';
}

export async function updateOrder(db: Tx, id: number, values: Partial<typeof orders.$inferInsert>) {
  const [row] = await db.update(orders).set(values).where(eq(orders.id, id)).returning();
  return row;
}

export function setLinesStatus(db: Tx, lineIds: number[], status: 'sold' | 'refunded') {
  if (!lineIds.length) return Promise.resolve();
  return db.update(orderLines).set({ status }).where(inArray(orderLines.id, lineIds));
}
