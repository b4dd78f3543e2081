import { and, inArray } from 'drizzle-orm';
import type { Tx } from '../../db/client';
import { slabs } from '../../db/schema/index';
import { AppError } from '../../lib/errors';
import { SLAB_START_STATUSES, slabMoveSources, YARD_STATUS_LABELS, type SlabMoveCause } from '../../../shared/slab-input';
import type { SlabStatus } from '../../../shared/slabs';

/**
 * The one owner of a slab's state. Holds, checkout, pickup, refunds, the office and the yard all
 * move slabs through here, along the one table of allowed moves (shared/slab-input SLAB_MOVES);
 * nothing else writes `slabs.status` (tests/server/slabs/slab-state.test.ts keeps it so).
 *
 * Every move is one conditional UPDATE (`… where status in <allowed sources>`), so of two requests
 * racing for one slab exactly one moves it and the other sees that it did not.
 */

export type Moved = { id: number; code: string };

/**
 * Moves the slabs that are in a state `cause` may move to `to`; returns the ones it moved (a slab in
 * any other state — or already moved by a racing request — is left alone and left out).
 */
export async function moveSlabs(tx: Tx, ids: number[], to: SlabStatus, cause: SlabMoveCause, now = new Date()): Promise<Moved[]> {
  const from = slabMoveSources(to, cause);
  if (!ids.length || !from.length) return [];
  return tx.update(slabs)
    .set({ status: to, updatedAt: now, ...(cause === 'yard' && to === 'listed' ? { listedAt: now } : {}) })
    .where(and(inArray(slabs.id, ids), inArray(slabs.status, from)))
    .returning({ id: slabs.id, code: slabs.code });
}

/** Moves one slab or nothing; null when it was not in a state `cause` may move from. */
export async function moveSlab(tx: Tx, id: number, to: SlabStatus, cause: SlabMoveCause, now = new Date()) {
  const [moved] = await moveSlabs(tx, [id], to, cause, now);
  return moved ?? null;
}

/** Moves every slab or throws 409 naming the ones that were not where the move starts. */
export async function moveEverySlab(tx: Tx, ids: number[], to: SlabStatus, cause: SlabMoveCause, now = new Date()) {
  const unique = [...new Set(ids)];
  const moved = await moveSlabs(tx, unique, to, cause, now);
  if (moved.length === unique.length) return moved;
  const stuck = await tx.select({ code: slabs.code, status: slabs.status }).from(slabs)
    .where(inArray(slabs.id, unique.filter((id) => !moved.some((m) => m.id === id))));
  const list = stuck.map((s) => `${s.code} (${YARD_STATUS_LABELS[s.status as SlabStatus] ?? s.status})`).join(', ');
  throw new AppError(409, 'slab_state', `These slabs cannot become “${YARD_STATUS_LABELS[to]}” now: ${list || 'they no longer exist'}.`);
}

/** The status a new slab starts with (drying unless the yard says it is already dry). */
export function startingStatus(requested?: SlabStatus): SlabStatus {
  const status = requested ?? 'drying';
  if (!(SLAB_START_STATUSES as readonly SlabStatus[]).includes(status)) {
    throw new AppError(400, 'validation', 'A new slab starts as drying or ready', { status: ['A new slab starts as drying or ready'] });
  }
  return status;
}

