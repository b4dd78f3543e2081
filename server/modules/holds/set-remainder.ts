import { and, asc, eq, inArray } from 'drizzle-orm';
import type { Tx } from '../../db/client';
import { holds, slabs, user } from '../../db/schema/index';
import { recordAudit } from '../../lib/audit';
import type { SessionUser } from '../../lib/session';
import { queueEmail } from '../../lib/outbox';
import { layout } from '../../lib/email-templates';
import { millDateTime } from '../pickups/slot-calendar';

export type SetMemberLeft = 'released-by-buyer' | 'released-by-office' | 'expired' | 'refunded';

const WHY: Record<SetMemberLeft, string> = {
  'released-by-buyer': 'was released from your holds',
  'released-by-office': 'was released by the mill office',
  expired: 'ran out of hold time',
  refunded: 'was refunded',
};

/**
 * One slab of a book-matched set held together left the set's holds. The rule (decided once): the
 * rest of the set STAYS HELD for the same buyer until its own expiry — the buyer may still want them —
 * and nobody is left guessing: the buyer gets an e-mail naming what left, what stays held and until
 * when, and the office change log records the same on the slab. Holds closed together (a whole set
 * expiring at once) leave no rest, so nothing is sent.
 */
export async function tellAboutRestOfSet(
  tx: Tx, closed: Array<{ slabId: number; groupId: string | null }>, why: SetMemberLeft,
  actor: Pick<SessionUser, 'id' | 'email'> | null, { publicUrl = '' } = {},
) {
  const groups = [...new Set(closed.flatMap((h) => (h.groupId ? [h.groupId] : [])))];
  for (const groupId of groups) {
    const rest = await tx.select({ slabId: holds.slabId, code: slabs.code, expiresAt: holds.expiresAt, email: user.email, name: user.name })
      .from(holds).innerJoin(slabs, eq(slabs.id, holds.slabId)).innerJoin(user, eq(user.id, holds.buyerId))
      .where(and(eq(holds.groupId, groupId), eq(holds.status, 'active'))).orderBy(asc(slabs.sequenceInLog));
    if (!rest.length) continue;
    const goneIds = closed.filter((h) => h.groupId === groupId).map((h) => h.slabId);
    const gone = await tx.select({ id: slabs.id, code: slabs.code }).from(slabs).where(inArray(slabs.id, goneIds));
    const goneCodes = gone.map((g) => g.code);
    const until = new Date(Math.min(...rest.map((r) => r.expiresAt.getTime())));
    const restCodes = rest.map((r) => r.code);
    const title = `Your book-matched set: slab ${goneCodes.join(' and ')} is no longer held`;
    await queueEmail(tx, {
      to: rest[0].email, kind: 'matched-set-remainder',
      content: layout(title, [
        `Hello ${rest[0].name},`,
        `Slab ${goneCodes.join(' and ')} of the book-matched set you reserved ${WHY[why]}.`,
        `The rest of the set — ${restCodes.join(', ')} — stays held for you until ${millDateTime(until)} (mill time). Check out before then to keep ${restCodes.length === 1 ? 'it' : 'them'}; if you only wanted the whole set, release ${restCodes.length === 1 ? 'it' : 'them'} from your reservations so another buyer can have ${restCodes.length === 1 ? 'it' : 'them'}.`,
      ], { label: 'Your reservations', url: `${publicUrl}/reservations` }),
    });
    for (const g of gone) {
      await recordAudit(tx, {
        actor, action: 'matched-set.rest-still-held', entityType: 'slab', entityId: g.id,
        before: null, after: { why, restSlabCodes: restCodes, heldUntil: until.toISOString() },
      });
    }
  }
}
