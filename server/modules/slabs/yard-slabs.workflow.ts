import type { Tx } from '../../db/client';
import { AppError } from '../../lib/errors';
import { readMillSettings } from '../pricing/pricing.repo';
import { canStaffMove, isWellAboveTarget, SLAB_TRANSITIONS, wetListingMessage, YARD_STATUS_LABELS as STATUS_LABELS } from '../../../shared/slab-input';
import type { SlabStatus } from '../../../shared/slabs';
import * as repo from './yard-slabs.repo';

const DAY_MS = 86_400_000;

/** Refuses a status change the workflow table does not allow staff to make. */
export function assertStaffMove(from: SlabStatus, to: SlabStatus) {
  if (from === to || canStaffMove(from, to)) return;
  const legal = SLAB_TRANSITIONS[from].filter((s) => canStaffMove(from, s));
  const why = ['held', 'sold', 'picked-up'].includes(to)
    ? `“${STATUS_LABELS[to]}” is set by holds, checkout and pickup, not by editing a slab.`
    : legal.length
      ? `From “${STATUS_LABELS[from]}” a slab can go to: ${legal.map((s) => `“${STATUS_LABELS[s]}”`).join(', ')}.`
      : `A slab that is “${STATUS_LABELS[from]}” cannot be changed here.`;
  const message = `A slab cannot go from ${from} to ${to}. ${why}`;
  throw new AppError(409, 'illegal_transition', message, { status: [message] });
}

/**
 * A slab may be listed for sale only with at least one photo and a moisture reading no older than
 * the mill's limit, so buyers never see a bare or stale listing. Names everything that is missing.
 */
export async function assertPublishable(tx: Tx, slabId: number, now = new Date()) {
  const [photos, reading, settings] = await Promise.all([
    repo.photoCountOf(tx, slabId), repo.latestReadingOf(tx, slabId), readMillSettings(tx),
  ]);
  const maxDays = settings?.maxReadingAgeDays ?? 60;
  const missing: string[] = [];
  if (photos < 1) missing.push('at least one photo');
  if (!reading) missing.push(`a moisture reading (none recorded; one from the last ${maxDays} days is needed)`);
  else {
    const ageDays = Math.floor((now.getTime() - Date.parse(`${reading.measuredOn}T00:00:00Z`)) / DAY_MS);
    if (ageDays > maxDays) missing.push(`a moisture reading from the last ${maxDays} days (the latest is ${ageDays} days old, from ${reading.measuredOn})`);
  }
  if (missing.length) {
    const message = `To list this slab for sale it needs ${missing.join(' and ')}.`;
    throw new AppError(409, 'not_ready_to_list', message, { status: [message] });
  }
}

/**
 * Listing a slab well above the mill's target MC needs a second "yes". Returns the reading that was
 * confirmed (for the audit record), or null when no confirmation was needed.
 */
export async function assertDryEnoughOrConfirmed(tx: Tx, slabId: number, confirmed: boolean): Promise<number | null> {
  const [reading, settings] = await Promise.all([repo.latestReadingOf(tx, slabId), readMillSettings(tx)]);
  const target = settings?.targetMcPercent ?? 8;
  if (!reading || !isWellAboveTarget(reading.mcPercent, target)) return null;
  if (confirmed) return reading.mcPercent;
  const message = wetListingMessage(reading.mcPercent, target);
  throw new AppError(409, 'confirm_wet_listing', message, { status: [message] });
}
