import { and, asc, eq } from 'drizzle-orm';
import type { Tx } from '../../db/client';
import { holds, slabs, user } from '../../db/schema/index';

export function findActiveHolds(db: Tx) {
  return db.select({
    id: holds.id, slabId: holds.slabId, slabCode: slabs.code, buyerName: user.name, buyerEmail: user.email,
    groupId: holds.groupId, createdAt: holds.createdAt, expiresAt: holds.expiresAt,
  }).from(holds).innerJoin(slabs, eq(slabs.id, holds.slabId)).innerJoin(user, eq(user.id, holds.buyerId))
    .where(eq(holds.status, 'active')).orderBy(asc(holds.expiresAt));
}

export async function findHoldForUpdate(db: Tx, id: number) {
  const [row] = await db.select().from(holds).where(eq(holds.id, id)).for('update');
  return row ?? null;
}

export async function closeHold(db: Tx, id: number, closedBy: string) {
  const [row] = await db.update(holds).set({ status: 'released', closedAt: new Date(), closedBy })
    .where(and(eq(holds.id, id), eq(holds.status, 'active'))).returning();
  return row ?? null;
}
