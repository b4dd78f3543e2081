/**
 * `npm run db:check` — checks the database's indexes (amcheck) and constraints and prints a report;
 * exits 1 when it finds damage. PGlite: the data folder is locked while it runs, so stop the shop first.
 */
import fs from 'node:fs';
import path from 'node:path';
import { openDatabase, type Database } from '../server/db/client';
import { checkIntegrity, formatIntegrityReport, type IntegrityReport } from '../server/db/integrity-check';
import { dbTarget, fail } from './db-target';

/** Opens the target database (PGlite with amcheck loaded), runs the check, closes it again. */
export async function runCheck(env: NodeJS.ProcessEnv = process.env): Promise<{ report: IntegrityReport; text: string }> {
  const target = dbTarget(env);
  if (target.kind === 'pglite' && !fs.existsSync(path.join(target.dataDir, 'PG_VERSION'))) throw new Error(`no database in ${target.dataDir}`);
  const database: Database = target.kind === 'postgres'
    ? await openDatabase({ databaseUrl: target.url })
    : await openDatabase({ dataDir: target.dataDir, purpose: 'an integrity check (npm run db:check)', amcheck: true });
  try {
    const report = await checkIntegrity(database);
    return { report, text: formatIntegrityReport(report, target.kind === 'postgres' ? 'the PostgreSQL database (DATABASE_URL)' : target.dataDir) };
  } finally {
    await database.close();
  }
}

if (import.meta.url === `file://${process.argv[1]}`) {
  runCheck()
    .then(({ report, text }) => {
      console.log(text);
      process.exit(report.ok ? 0 : 1);
    })
    .catch((err: Error) => fail(err.message));
}
