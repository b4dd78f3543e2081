import type { Db } from './db/client';
import type { Mailer } from './lib/mail';

export type JobDeps = { db: Db; mailer: Mailer; publicUrl: string };
type Job = { name: string; everyMs: number; run(deps: JobDeps): Promise<unknown> };

/** Periodic work (expired holds, queued e-mail, reminders). Each job also runs once at start. */
const JOBS: Job[] = [];

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
