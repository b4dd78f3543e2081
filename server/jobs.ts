import type { Db } from './db/client';
import type { Mailer } from './lib/mail';
import { getLogger } from './lib/logger';
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
  const running = new Set<Promise<unknown>>();
  let stopped = false;
  const timers = JOBS.map((job) => {
    let busy = false;
    const tick = () => {
      // A slow run is not stacked on by the next tick, and nothing starts once stopping has begun.
      if (busy || stopped) return;
      busy = true;
      const run = job.run(deps)
        .catch((err) => getLogger().error({ part: 'job', job: job.name, err }, 'a background job failed'))
        .finally(() => { busy = false; running.delete(run); });
      running.add(run);
    };
    tick();
    const t = setInterval(tick, job.everyMs);
    t.unref();
    return t;
  });
  return {
    /** Stops the timers and waits for runs already under way. */
    async stop() {
      stopped = true;
      timers.forEach(clearInterval);
      await Promise.allSettled([...running]);
    },
  };
}
