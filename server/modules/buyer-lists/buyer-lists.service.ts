import type { Db } from '../../db/client';
import { AppError, notFound, validationError } from '../../lib/errors';
import type { SessionUser } from '../../lib/session';
import { MAX_SAVED_SLABS, parseCompareIds, type MySlabMarks, type SavedSlab } from '../../../shared/buyer-lists';
import { PUBLIC_STATUSES, type SlabDetail, type SlabStatus } from '../../../shared/slabs';
import { findListRowsByIds } from '../slabs/catalogue.repo';
import { getSlabDetail, toListItem } from '../slabs/catalogue.service';
import { findActiveHoldOnSlab } from '../holds/holds.repo';
import * as repo from './buyer-lists.repo';

const isPublic = (status: string) => PUBLIC_STATUSES.includes(status as SlabStatus);

async function publicSlab(db: Db, slabId: number) {
  const slab = await repo.findSlabStatus(db, slabId);
  if (!slab || !isPublic(slab.status)) throw notFound('That slab');
  return slab;
}

export async function mySlabMarks(db: Db, userId: string): Promise<MySlabMarks> {
  const [saved, watched, held] = await Promise.all([repo.savedOf(db, userId), repo.openWatchesOf(db, userId), repo.activeHoldSlabIds(db, userId)]);
  return { savedSlabIds: saved.map((s) => s.slabId), watchedSlabIds: watched, heldSlabIds: held };
}

/** The buyer's saved slabs, newest first; a slab the yard has since withdrawn is left out. */
export async function listSavedSlabs(db: Db, userId: string): Promise<SavedSlab[]> {
  const saved = await repo.savedOf(db, userId);
  const rows = new Map((await findListRowsByIds(db, saved.map((s) => s.slabId))).map((r) => [r.id, r]));
  return saved.flatMap((s) => {
    const row = rows.get(s.slabId);
    return row && isPublic(row.status) ? [{ ...toListItem(row), savedAt: s.createdAt.toISOString() }] : [];
  });
}

export async function saveSlab(db: Db, buyer: SessionUser, slabId: number) {
  await publicSlab(db, slabId);
  if ((await repo.countSaved(db, buyer.id)) >= MAX_SAVED_SLABS) {
    throw new AppError(409, 'too_many_saved', `You can save up to ${MAX_SAVED_SLABS} slabs. Remove some you no longer need first.`);
  }
  await repo.insertSaved(db, buyer.id, slabId);
}

export async function unsaveSlab(db: Db, buyer: SessionUser, slabId: number) {
  await repo.deleteSaved(db, buyer.id, slabId);
}

/** Only a slab on hold for someone else can "come free"; every other case says what to do instead. */
export async function watchSlab(db: Db, buyer: SessionUser, slabId: number) {
  const slab = await publicSlab(db, slabId);
  if (slab.status === 'listed') throw new AppError(409, 'for_sale', `Slab ${slab.code} is for sale right now: you can reserve it.`);
  if (slab.status === 'sold' || slab.status === 'picked-up') throw new AppError(409, 'slab_sold', `Slab ${slab.code} is sold, so it will not come free.`);
  if (slab.status !== 'held') throw new AppError(409, 'not_for_sale', `Slab ${slab.code} is not for sale yet. Save it to find it again later.`);
  if ((await findActiveHoldOnSlab(db, slabId))?.buyerId === buyer.id) throw new AppError(409, 'already_yours', `You are holding slab ${slab.code} yourself.`);
  await repo.insertWatch(db, buyer.id, slabId);
}

export async function unwatchSlab(db: Db, buyer: SessionUser, slabId: number) {
  await repo.deleteOpenWatch(db, buyer.id, slabId);
}

/** Up to four slabs side by side; a slab no longer shown (withdrawn or gone) is named in `missingIds`. */
export async function compareSlabs(db: Db, rawIds: unknown, { includeHidden = false } = {}): Promise<{ items: SlabDetail[]; missingIds: number[] }> {
  const parsed = parseCompareIds(rawIds);
  if (!parsed.ok) throw validationError({ ids: [parsed.message] }, parsed.message);
  const found = await Promise.all(parsed.ids.map((id) => getSlabDetail(db, id, { includeHidden }).catch((e) => {
    if (e instanceof AppError && e.status === 404) return null;
    throw e;
  })));
  return {
    items: found.filter((s): s is SlabDetail => s !== null),
    missingIds: parsed.ids.filter((_id, i) => found[i] === null),
  };
}
