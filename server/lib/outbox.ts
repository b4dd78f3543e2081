import { and, asc, eq, lte } from 'drizzle-orm';
import type { Db, Tx } from '../db/client';
import { emailOutbox } from '../db/schema/index';
import type { EmailContent } from './email-templates';
import type { Mailer } from './mail';
import { getLogger } from './logger';

/** After this many failed sends a row is parked as 'failed' (kept, never deleted) for a person to look at. */
export const MAX_ATTEMPTS = 8;
/** A claimed row is invisible to other senders for this long, so a crashed sender's row is retried later. */
const CLAIM_MS = 5 * 60_000;

/** Backoff: 30 s, 1 min, 2 min, … capped at one hour. */
export const retryDelayMs = (attempts: number) => Math.min(60 * 60_000, 30_000 * 2 ** Math.max(0, attempts - 1));

/** Queues an e-mail. Call it with the transaction of the change it reports, so both exist or neither. */
export async function queueEmail(tx: Tx, { to, kind, content, sendAfter }: { to: string; kind: string; content: EmailContent; sendAfter?: Date }) {
  await tx.insert(emailOutbox).values({
    toAddress: to, kind, subject: content.subject, html: content.html, text: content.text,
    ...(sendAfter ? { sendAfter } : {}),
  });
}

let flushing: Promise<{ sent: number; failed: number }> | null = null;

/**
 * Sends due rows. Each row is claimed first (its send_after pushed forward), so two senders never
 * mail the same row; a failure records the error and schedules the next try with backoff.
 */
export function flushOutbox(db: Db, mailer: Mailer, { now = new Date(), limit = 25 } = {}) {
  // One flush at a time in this process; a caller arriving mid-flush waits for that one and then runs its own.
  const run = async () => {
    const due = await db.select({ id: emailOutbox.id }).from(emailOutbox)
      .where(and(eq(emailOutbox.status, 'pending'), lte(emailOutbox.sendAfter, now)))
      .orderBy(asc(emailOutbox.id)).limit(limit);
    let sent = 0;
    let failed = 0;
    for (const { id } of due) {
      const [row] = await db.update(emailOutbox)
        .set({ sendAfter: new Date(now.getTime() + CLAIM_MS) })
        .where(and(eq(emailOutbox.id, id), eq(emailOutbox.status, 'pending'), lte(emailOutbox.sendAfter, now)))
        .returning();
      if (!row) continue;
      try {
        await mailer.send({ to: row.toAddress, subject: row.subject, html: row.html, text: row.text });
        await db.update(emailOutbox).set({ status: 'sent', sentAt: new Date(), attempts: row.attempts + 1, lastError: null }).where(eq(emailOutbox.id, id));
        sent++;
      } catch (err) {
        const attempts = row.attempts + 1;
        const message = (err as Error).message ?? String(err);
        const giveUp = attempts >= MAX_ATTEMPTS;
        getLogger().warn({ part: 'outbox', emailId: id, kind: row.kind, to: row.toAddress, attempt: attempts, reason: message, parked: giveUp },
          giveUp ? 'an e-mail failed too often and is parked as failed' : 'an e-mail failed; it will be retried');
        await db.update(emailOutbox).set({
          attempts, lastError: message.slice(0, 500), status: giveUp ? 'failed' : 'pending',
          sendAfter: new Date(now.getTime() + retryDelayMs(attempts)),
        }).where(eq(emailOutbox.id, id));
        failed++;
      }
    }
    return { sent, failed };
  };
  const next = (flushing ?? Promise.resolve()).catch(() => undefined).then(run);
  flushing = next;
  return next.finally(() => { if (flushing === next) flushing = null; });
}
