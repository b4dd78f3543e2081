import { eq, inArray } from 'drizzle-orm';
import type { Db } from '../../../server/db/client';
import { orderLines, orders, payments, pickupWindows, slabs, species } from '../../../server/db/schema/index';
import { slabWeightLb } from '../../../shared/wood/index';

let seq = 0;
type Slab = typeof slabs.$inferSelect;

export async function pickupWindowRow(db: Db, over: Partial<typeof pickupWindows.$inferInsert> = {}) {
  const [row] = await db.insert(pickupWindows).values({ weekday: 6, startsAt: '09:00', endsAt: '12:00', capacity: 3, ...over }).returning();
  return row;
}

/**
 * Arranges a paid order for `slabList` the way checkout leaves it: order + sold lines + a charge
 * payment row, slabs marked sold. `chargeId` should be a real charge on the payment fake when the
 * test refunds it.
 */
export async function paidOrderRow(db: Db, buyerId: string, slabList: Slab[], over: Partial<typeof orders.$inferInsert> = {}) {
  const sp = await db.select().from(species).where(inArray(species.id, slabList.map((s) => s.speciesId)));
  const lines = slabList.map((s) => {
    const speciesRow = sp.find((x) => x.id === s.speciesId)!;
    const weightLb = slabWeightLb({ speciesSlug: speciesRow.slug, thicknessIn: s.thicknessIn, widthIn: s.widthIn, lengthIn: s.lengthIn, mcPercent: 12 });
    return { slab: s, speciesName: speciesRow.name, weightLb };
  });
  const total = slabList.reduce((n, s) => n + s.priceCents, 0);
  const [order] = await db.insert(orders).values({
    code: `SL-T${++seq}-${Date.now() % 100000}`, buyerId, status: 'paid', slabsCents: total, totalCents: total,
    totalWeightLb: lines.reduce((n, l) => n + l.weightLb, 0), longestSlabIn: Math.max(...slabList.map((s) => s.lengthIn)),
    idempotencyKey: `test-order-${seq}-${Math.random()}`, paidAt: new Date(), chargeId: null, ...over,
  }).returning();
  await db.insert(orderLines).values(lines.map(({ slab, speciesName, weightLb }) => ({
    orderId: order.id, slabId: slab.id, slabCode: slab.code, speciesName, boardFeet: slab.boardFeet, weightLb,
    lengthIn: slab.lengthIn, priceBreakdown: {}, slabCents: slab.priceCents, totalCents: slab.priceCents,
  })));
  await db.insert(payments).values({ orderId: order.id, kind: 'charge', providerId: order.chargeId, amountCents: total, status: 'succeeded' });
  await db.update(slabs).set({ status: 'sold' }).where(inArray(slabs.id, slabList.map((s) => s.id)));
  return order;
}

export async function slabStatus(db: Db, id: number) {
  const [row] = await db.select({ status: slabs.status }).from(slabs).where(eq(slabs.id, id));
  return row.status;
}
