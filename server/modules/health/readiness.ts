import fs from 'node:fs';
import path from 'node:path';
import { sql } from 'drizzle-orm';
import type { Db } from '../../db/client';
import { MIGRATIONS_FOLDER } from '../../db/client';
import type { Mailer } from '../../lib/mail';
import type { Payments } from '../../lib/payments';
import { getLogger } from '../../lib/logger';

export type ReadinessDeps = {
  db: Db;
  mailer: Mailer;
  payments: Payments;
  /** True once the process has begun to shut down: not ready for new work. */
  isShuttingDown?: () => boolean;
  /** Each check's own limit; all run at once, so the whole answer takes about this long at most. */
  checkTimeoutMs?: number;
  /** A result is reused this long, so a burst of probes (several monitors, a proxy) costs one round of checks. */
  reuseMs?: number;
};

export type CheckResult = 'ok' | 'failed' | 'timed out';
export type Readiness = { ready: boolean; checks: { database: CheckResult; migrations: CheckResult; mail: CheckResult; payments: CheckResult } };

/** The newest migration this code ships; the database must have applied it. */
function newestMigrationMillis(): number {
  const journal = JSON.parse(fs.readFileSync(path.join(MIGRATIONS_FOLDER, 'meta/_journal.json'), 'utf8')) as { entries: { when: number }[] };
  return Math.max(...journal.entries.map((e) => e.when));
}

class MigrationsBehind extends Error {}

async function timed(name: string, work: () => Promise<unknown>, ms: number): Promise<CheckResult> {
  let timer: NodeJS.Timeout | undefined;
  const limit = new Promise<'timed out'>((resolve) => { timer = setTimeout(() => resolve('timed out'), ms); });
  try {
    const result = await Promise.race([work().then(() => 'ok' as const), limit]);
    if (result !== 'ok') getLogger().warn({ part: 'ready', check: name }, 'a readiness check timed out');
    return result;
  } catch (err) {
    getLogger().warn({ part: 'ready', check: name, reason: (err as Error).message }, 'a readiness check failed');
    return 'failed';
  } finally {
    clearTimeout(timer);
  }
}

/** Database answers, migrations applied, mail server and payment service reachable — checked at once. */
export async function checkReadiness({ db, mailer, payments, isShuttingDown, checkTimeoutMs = 800 }: ReadinessDeps): Promise<Readiness> {
  const newest = newestMigrationMillis();
  const [database, migrations, mail, pay] = await Promise.all([
    timed('database', () => db.execute(sql`select 1`), checkTimeoutMs),
    timed('migrations', async () => {
      const result = await db.execute(sql`select max(created_at) as newest from drizzle.__drizzle_migrations`);
      const rows = (Array.isArray(result) ? result : (result as { rows: unknown[] }).rows) as { newest: string | number | null }[];
      if (Number(rows[0]?.newest ?? 0) < newest) throw new MigrationsBehind('the database lacks the newest migration');
    }, checkTimeoutMs),
    timed('mail', () => mailer.verify(), checkTimeoutMs),
    timed('payments', () => payments.ping(), checkTimeoutMs),
  ]);
  const checks = { database, migrations, mail, payments: pay };
  const ready = !isShuttingDown?.() && Object.values(checks).every((c) => c === 'ok');
  return { ready, checks };
}

/**
 * checkReadiness shared between callers: probes arriving while a round runs wait for that round,
 * and its answer is reused for `reuseMs` (default 1 s). Shutting down is always reported at once.
 */
export function readinessChecker(deps: ReadinessDeps) {
  const reuseMs = deps.reuseMs ?? 1000;
  let last: { at: number; result: Promise<Readiness> } | null = null;
  return async (): Promise<Readiness> => {
    const now = Date.now();
    if (!last || now - last.at > reuseMs) last = { at: now, result: checkReadiness(deps) };
    const result = await last.result;
    return deps.isShuttingDown?.() ? { ...result, ready: false } : result;
  };
}
