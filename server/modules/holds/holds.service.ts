import { randomUUID } from 'node:crypto';
import type { Db, Tx } from '../../db/client';
import { AppError, notFound } from '../../lib/errors';
import { recordAudit } from '../../lib/audit';
import type { SessionUser } from '../../lib/session';
import { queueEmail } from '../../lib/outbox';
import { holdExpiredEmail, holdPlacedEmail } from '../../lib/email-templates';
import { tellWatchersSlabsAreFree } from '../buyer-lists/slab-watches';
import { millDateTime } from '../pickups/slot-calendar';
import { photoUrls } from '../../../shared/photos';
import { DEFAULT_HOLD_HOURS, MAX_ACTIVE_HOLDS_PER_BUYER, type HoldStatus, type HoldView } from '../../../shared/holds';
import { roundBoardFeet } from '../../../shared/wood/index';
import { readMillSettings } from '../pricing/pricing.repo';
import { loadPricingRules } from '../pricing/pricing.service';
import { isUniqueViolation } from './unique-violation';
import { quoteSlab } from '../pricing/slab-quote';
import { assertOneSet } from '../matched-sets/matched-sets.service';
import { tellAboutRestOfSet } from './set-remainder';
import * as repo from './holds.repo';
import { moveSlab, moveSlabs } from '../slabs/slab-state';

export type HoldOptions = { holdHours?: number; now?: Date; publicUrl?: string };

const HELD_BY_OTHER = 'This slab is already on hold for another buyer.';

async function holdHoursFor(tx: Tx, override?: number) {
  if (override !== undefined) return override;
  return (await readMillSettings(tx))?.holdHours ?? DEFAULT_HOLD_HOURS;
}

/** Explains why a slab could not be moved to held: the conditional update found it in another state. */
async function refusal(tx: Tx, slabId: number, buyerId: string): Promise<AppError> {
  const slab = await repo.findSlab(tx, slabId);
  if (!slab || slab.status === 'withdrawn') return notFound('That slab');
  if (slab.status === 'held') {
    const hold = await repo.findActiveHoldOnSlab(tx, slabId);
    return hold?.buyerId === buyerId
      ? new AppError(409, 'already_yours', `You already hold slab ${slab.code}.`)
      : new AppError(409, 'slab_held', HELD_BY_OTHER);
  }
  if (slab.status === 'sold' || slab.status === 'picked-up') return new AppError(409, 'slab_sold', `Slab ${slab.code} is already sold.`);
  return new AppError(409, 'not_for_sale', `Slab ${slab.code} is not for sale yet.`);
}

/**
 * Holds each slab for the buyer, all or none. The conditional update (listed → held) and the
 * unique index on active holds make sure exactly one buyer wins a race.
 */
async function holdSlabs(db: Db, buyer: SessionUser, slabIds: number[], opts: HoldOptions) {
  const now = opts.now ?? new Date();
  try {
    return await db.transaction(async (tx) => {
      const active = await repo.countActiveHolds(tx, buyer.id);
      if (active + slabIds.length > MAX_ACTIVE_HOLDS_PER_BUYER) {
        throw new AppError(409, 'too_many_holds', `You can hold up to ${MAX_ACTIVE_HOLDS_PER_BUYER} slabs at once. Check out or release some first.`);
      }
      const hours = await holdHoursFor(tx, opts.holdHours);
      const expiresAt = new Date(now.getTime() + hours * 3_600_000);
      const groupId = slabIds.length > 1 ? randomUUID() : null;
      const created = [];
      for (const slabId of slabIds) {
        if (!(await moveSlab(tx, slabId, 'held', 'hold', now))) throw await refusal(tx, slabId, buyer.id);
        created.push(await repo.insertHold(tx, { slabId, buyerId: buyer.id, groupId, expiresAt, createdAt: now }));
      }
      const held = await repo.slabLabels(tx, slabIds);
      await queueEmail(tx, {
        to: buyer.email, kind: 'hold-placed',
        content: holdPlacedEmail({ name: buyer.name, slabs: held, until: millDateTime(expiresAt), url: `${opts.publicUrl ?? ''}/reservations` }),
      });
      return created;
    });
  } catch (err) {
    if (isUniqueViolation(err)) throw new AppError(409, 'slab_held', HELD_BY_OTHER);
    throw err;
  }
}

export async function placeHold(db: Db, buyer: SessionUser, slabId: number, opts: HoldOptions = {}) {
  const [hold] = await holdSlabs(db, buyer, [slabId], opts);
  return hold;
}

/** Slabs of one book-matched set as the yard marked it (at least two of its members), held together. */
export async function placeMatchedSet(db: Db, buyer: SessionUser, slabIds: number[], opts: HoldOptions = {}) {
  const found = await repo.findLogNeighbours(db, slabIds);
  if (found.length !== slabIds.length) throw notFound('One of those slabs');
  await assertOneSet(db, slabIds);
  return holdSlabs(db, buyer, slabIds, opts);
}

export async function listHolds(db: Db, buyerId: string, now = new Date()): Promise<HoldView[]> {
  const [rows, rules] = await Promise.all([repo.findActiveHoldsWithSlabs(db, buyerId), loadPricingRules(db)]);
  return rows.filter((r) => r.hold.expiresAt > now).map(({ hold, slab, species, latestMc, coverKey }) => {
    const quote = quoteSlab(slab, species, latestMc, rules);
    return {
      id: hold.id, slabId: hold.slabId, groupId: hold.groupId, status: hold.status as HoldStatus,
      createdAt: hold.createdAt.toISOString(), expiresAt: hold.expiresAt.toISOString(),
      slab: {
        code: slab.code, speciesName: species.name, thicknessIn: slab.thicknessIn, widthIn: Math.round(slab.widthIn * 10) / 10,
        lengthIn: slab.lengthIn, boardFeet: roundBoardFeet(slab.boardFeet), priceCents: quote.breakdown.slabCents,
        weightLb: Math.round(quote.weightLb), coverThumbUrl: coverKey ? photoUrls(coverKey).thumbUrl : null,
        flattening: quote.flattening,
      },
    };
  });
}

/** The owner gives a hold up (or an admin lifts it): the slab goes back on sale. */
export async function releaseHold(db: Db, actor: SessionUser, holdId: number, { publicUrl = '' } = {}) {
  return db.transaction(async (tx) => {
    const hold = await repo.findHold(tx, holdId);
    const isAdmin = actor.role === 'admin';
    if (!hold || (hold.buyerId !== actor.id && !isAdmin)) throw notFound('That hold');
    if (hold.status !== 'active') throw new AppError(409, 'hold_closed', 'That hold has already ended.');
    const [closed] = await repo.closeHolds(tx, [hold.id], 'released', actor.id);
    if (!closed) throw new AppError(409, 'hold_closed', 'That hold has already ended.');
    await moveSlabs(tx, [hold.slabId], 'listed', 'hold-ended');
    await tellWatchersSlabsAreFree(tx, [hold.slabId], { publicUrl });
    if (hold.buyerId !== actor.id) {
      await recordAudit(tx, { actor, action: 'hold.release', entityType: 'hold', entityId: hold.id, before: { status: 'active' }, after: { status: 'released' } });
    }
    await tellAboutRestOfSet(tx, [closed], hold.buyerId === actor.id ? 'released-by-buyer' : 'released-by-office', actor, { publicUrl });
    return closed;
  });
}

/** Ends holds whose time ran out: slabs back on sale, each buyer told once (through the outbox). */
export async function releaseExpiredHolds(db: Db, { now = new Date(), publicUrl = '' } = {}) {
  return db.transaction(async (tx) => {
    const expired = await repo.findExpiredHolds(tx, now);
    if (!expired.length) return { released: 0 };
    const closed = await repo.closeHolds(tx, expired.map((e) => e.hold.id), 'expired', 'system', now);
    const closedIds = new Set(closed.map((h) => h.id));
    const done = expired.filter((e) => closedIds.has(e.hold.id));
    await moveSlabs(tx, done.map((e) => e.hold.slabId), 'listed', 'hold-ended', now);
    await tellAboutRestOfSet(tx, closed, 'expired', null, { publicUrl });
    await tellWatchersSlabsAreFree(tx, done.map((e) => e.hold.slabId), { publicUrl, now });
    const byBuyer = new Map<string, typeof done>();
    for (const e of done) byBuyer.set(e.buyerEmail, [...(byBuyer.get(e.buyerEmail) ?? []), e]);
    for (const [email, items] of byBuyer) {
      const content = holdExpiredEmail({ name: items[0].buyerName, slabs: items.map((i) => ({ code: i.slabCode, speciesName: i.speciesName })), url: `${publicUrl}/` });
      await queueEmail(tx, { to: email, kind: 'hold-expired', content });
    }
    return { released: done.length };
  });
}
