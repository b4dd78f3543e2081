import { and, asc, count, eq, gte, inArray, isNotNull, lte, notInArray } from 'drizzle-orm';
import type { Tx } from '../../db/client';
import { closedDays, millSettings, orders, pickupWindows } from '../../db/schema/index';

/** Orders that take a place in a pickup window. */
export const BOOKED_STATUSES = ['pending-payment', 'paid', 'picked-up'];

export const allWindows = (tx: Tx) => tx.select().from(pickupWindows).orderBy(asc(pickupWindows.weekday), asc(pickupWindows.startsAt));

export const closedDaysBetween = (tx: Tx, from: string, to: string) =>
  tx.select().from(closedDays).where(and(gte(closedDays.day, from), lte(closedDays.day, to))).orderBy(asc(closedDays.day));

export const allClosedDays = (tx: Tx) => tx.select().from(closedDays).orderBy(asc(closedDays.day));

export async function bookedCounts(tx: Tx, from: string, to: string) {
  const rows = await tx.select({ day: orders.pickupOn, windowId: orders.pickupWindowId, n: count() }).from(orders)
    .where(and(inArray(orders.status, BOOKED_STATUSES), gte(orders.pickupOn, from), lte(orders.pickupOn, to), isNotNull(orders.pickupWindowId)))
    .groupBy(orders.pickupOn, orders.pickupWindowId);
  return new Map(rows.map((r) => [`${r.day}|${r.windowId}`, r.n]));
}

/** Locks the window row so two checkouts cannot both take its last place. */
export async function lockWindow(tx: Tx, id: number) {
  const [row] = await tx.select().from(pickupWindows).where(eq(pickupWindows.id, id)).for('update');
  return row ?? null;
}

export async function countBooked(tx: Tx, windowId: number, day: string) {
  const [row] = await tx.select({ n: count() }).from(orders)
    .where(and(eq(orders.pickupWindowId, windowId), eq(orders.pickupOn, day), inArray(orders.status, BOOKED_STATUSES)));
  return row?.n ?? 0;
}

export async function isClosed(tx: Tx, day: string) {
  const [row] = await tx.select().from(closedDays).where(eq(closedDays.day, day));
  return row ?? null;
}

export async function readYardAddress(tx: Tx) {
  const [row] = await tx.select({ yardAddress: millSettings.yardAddress }).from(millSettings).where(eq(millSettings.id, 1));
  return row?.yardAddress ?? null;
}

export const updateYardAddress = (tx: Tx, yardAddress: string) =>
  tx.update(millSettings).set({ yardAddress, updatedAt: new Date() }).where(eq(millSettings.id, 1)).returning();

export const insertWindow = (tx: Tx, w: typeof pickupWindows.$inferInsert) => tx.insert(pickupWindows).values(w).returning();
export const updateWindow = (tx: Tx, id: number, w: Partial<typeof pickupWindows.$inferInsert>) =>
  tx.update(pickupWindows).set(w).where(eq(pickupWindows.id, id)).returning();

/** Windows no order points at, among `ids`: only these may be deleted outright. */
export async function unusedWindowIds(tx: Tx, ids: number[]) {
  if (!ids.length) return [];
  const used = await tx.selectDistinct({ id: orders.pickupWindowId }).from(orders).where(inArray(orders.pickupWindowId, ids));
  const usedIds = new Set(used.map((u) => u.id));
  return ids.filter((id) => !usedIds.has(id));
}
export const deleteWindows = (tx: Tx, ids: number[]) => ids.length ? tx.delete(pickupWindows).where(inArray(pickupWindows.id, ids)) : Promise.resolve();
export const deactivateWindows = (tx: Tx, ids: number[]) => ids.length ? tx.update(pickupWindows).set({ active: false }).where(inArray(pickupWindows.id, ids)) : Promise.resolve();

export async function replaceClosedDays(tx: Tx, days: { day: string; note: string }[]) {
  const keep = days.map((d) => d.day);
  await (keep.length ? tx.delete(closedDays).where(notInArray(closedDays.day, keep)) : tx.delete(closedDays));
  for (const d of days) {
    await tx.insert(closedDays).values(d).onConflictDoUpdate({ target: closedDays.day, set: { note: d.note } });
  }
}
