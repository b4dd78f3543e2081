import type { Db } from './db/client';
import type { Mailer } from './lib/mail';
import { flushOutbox } from './lib/outbox';
import { releaseExpiredHolds } from './modules/holds/holds.service';
import { queuePickupReminders } from './modules/checkout/pickup-reminders';

export type JobDeps = { db: Db; mailer: Mailer; publicUrl: string };
type Job = { name: string; everyMs: number; run(deps: JobDeps): Promise<unknown> };

/** Periodic work (expired holds, queued e-mail, reminders). Each job also runs once at start. */
const JOBS: Job[] = [
  { name: 'expired-holds', everyMs: 60_000, run: ({ db, publicUrl }) => releaseExpiredHolds(db, { publicUrl }) },
  { name: 'outbox', everyMs: 15_000, run: ({ db, mailer }) => flushOutbox(db, mailer) },
  // Hourly is plenty: each order is reminded once, the day before its pickup date.
  { name: 'pickup-reminders', everyMs: 60 * 60_000, run: ({ db, publicUrl }) => queuePickupReminders(db, { publicUrl }) },
];

export function startBackgroundJobs(deps: JobDeps) {
  const timers = JOBS.map((job) => {
    const tick = () => job.run(deps).catch((err) => console.error(`[job ${job.name}]`, err));
    void tick();
    const t = setInterval(tick, job.everyMs);
    t.unref();
    return t;
  });
  return { stop: () => timers.forEach(clearInterval) };
}
