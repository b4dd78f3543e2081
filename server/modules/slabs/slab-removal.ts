import type { Db } from '../../db/client';
import { AppError, notFound } from '../../lib/errors';
import { recordAudit } from '../../lib/audit';
import type { SessionUser } from '../../lib/session';
import { removeRenditions } from '../photos/photo-files';
import * as repo from './yard-slabs.repo';

/** A foreign key still points at the row (Postgres 23503), whether the error comes bare or wrapped. */
function isStillReferenced(err: unknown): boolean {
  for (let e = err as { code?: string; cause?: unknown } | undefined; e; e = e.cause as typeof e) if (e.code === '23503') return true;
  return false;
}

const refuse = (code: string, why: string) =>
  new AppError(409, 'not_deletable', `Slab ${code} cannot be deleted: ${why}. Withdraw it instead, so its history stays.`);

/**
 * Removes a slab recorded by mistake, with its photos and readings. Only a slab no buyer ever saw
 * for sale qualifies: never listed, never held, never sold. The audit log keeps what was removed.
 */
export async function deleteSlab(db: Db, uploadsDir: string, actor: SessionUser, id: number) {
  const { keys, code } = await db.transaction(async (tx) => {
    const slab = await repo.lockSlab(tx, id);
    if (!slab) throw notFound('That slab');
    if (['listed', 'held', 'sold', 'picked-up'].includes(slab.status)) throw refuse(slab.code, 'it is or was on sale');
    if (slab.listedAt) throw refuse(slab.code, `it was put on sale on ${slab.listedAt.toISOString().slice(0, 10)}`);
    const traces = await repo.buyerTraces(tx, id);
    if (traces.lines) throw refuse(slab.code, 'it is on an order');
    if (traces.holds) throw refuse(slab.code, 'a buyer has held it');
    const photoKeys = await repo.photoKeysOf(tx, id);
    await repo.deleteSlabRow(tx, id);
    await recordAudit(tx, {
      actor, action: 'slab.delete', entityType: 'slab', entityId: id, after: null,
      before: {
        code: slab.code, logId: slab.logId, sequenceInLog: slab.sequenceInLog, status: slab.status, thicknessIn: slab.thicknessIn,
        widthsIn: slab.widthsIn, lengthIn: slab.lengthIn, yardStack: slab.yardStack, photos: photoKeys.length,
      },
    });
    return { keys: photoKeys, code: slab.code };
  }).catch((err) => {
    if (isStillReferenced(err)) throw new AppError(409, 'not_deletable', 'This slab is still linked to other records, so it cannot be deleted. Withdraw it instead.');
    throw err;
  });
  // Files go once the rows are gone for good; a leftover file is harmless, a missing one is not.
  await removeRenditions(uploadsDir, keys);
  return { deleted: code };
}

