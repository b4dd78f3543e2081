import type { Db } from '../../db/client';
import { AppError, notFound } from '../../lib/errors';
import { recordAudit } from '../../lib/audit';
import type { SessionUser } from '../../lib/session';
import type { ActiveHold } from '../../../shared/office';
import { tellAboutRestOfSet } from '../holds/set-remainder';
import { tellWatchersSlabsAreFree } from '../buyer-lists/slab-watches';
import * as repo from './holds.repo';
import { moveSlab } from '../slabs/slab-state';

export async function listActiveHolds(db: Db): Promise<ActiveHold[]> {
  const rows = await repo.findActiveHolds(db);
  return rows.map((h) => ({ ...h, createdAt: h.createdAt.toISOString(), expiresAt: h.expiresAt.toISOString() }));
}

/** An admin lets a hold go by hand: the hold is closed and the slab is back on sale. */
export async function releaseHold(db: Db, actor: SessionUser, id: number, { publicUrl = '' } = {}) {
  return db.transaction(async (tx) => {
    const hold = await repo.findHoldForUpdate(tx, id);
    if (!hold) throw notFound('That hold');
    if (hold.status !== 'active') throw new AppError(409, 'hold_not_active', `That hold is already ${hold.status}; nothing to release.`);
    const closed = await repo.closeHold(tx, id, actor.id);
    // Only a slab still held goes back on sale; a sold slab stays sold.
    const relisted = Boolean(await moveSlab(tx, hold.slabId, 'listed', 'hold-ended'));
    if (relisted) await tellWatchersSlabsAreFree(tx, [hold.slabId], { publicUrl });
    await recordAudit(tx, {
      actor, action: 'hold.release', entityType: 'hold', entityId: id,
      before: { status: 'active', slabId: hold.slabId, buyerId: hold.buyerId }, after: { status: 'released', slabRelisted: relisted },
    });
    if (closed) await tellAboutRestOfSet(tx, [closed], 'released-by-office', actor, { publicUrl });
    return { id, status: 'released' as const, slabRelisted: relisted };
  });
}
