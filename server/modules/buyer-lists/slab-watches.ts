import type { Tx } from '../../db/client';
import { queueEmail } from '../../lib/outbox';
import { slabFreeAgainEmail } from '../../lib/email-templates';
import * as repo from './buyer-lists.repo';

/**
 * Call after slabs went back on sale (a hold released or run out), inside that transaction:
 * everyone who asked about one of them gets one e-mail through the outbox.
 */
export async function tellWatchersSlabsAreFree(tx: Tx, slabIds: number[], { publicUrl = '', now = new Date() } = {}) {
  const claimed = await repo.claimWatchesOnListedSlabs(tx, slabIds, now);
  if (!claimed.length) return 0;
  const [people, slabRows] = await repo.mailingDetails(tx, [...new Set(claimed.map((c) => c.userId))], [...new Set(claimed.map((c) => c.slabId))]);
  const person = new Map(people.map((p) => [p.id, p]));
  const slab = new Map(slabRows.map((s) => [s.id, s]));
  for (const c of claimed) {
    const to = person.get(c.userId);
    const s = slab.get(c.slabId);
    if (!to || !s) continue;
    await queueEmail(tx, {
      to: to.email, kind: 'slab-free-again',
      content: slabFreeAgainEmail({ name: to.name, code: s.code, speciesName: s.speciesName, url: `${publicUrl}/slabs/${s.id}` }),
    });
  }
  return claimed.length;
}
