/**
 * `npm run db:backup -- <file>` — checks the database (as `npm run db:check` does) and, only if it
 * is whole, writes it to one file. PGlite: a gzip tarball of the data folder (PGlite's own dump),
 * taken while holding the folder's lock, so a running shop makes it refuse at once. Server:
 * `pg_dump --format=custom`. Photos live in UPLOADS_DIR as plain files: copy that folder beside the backup.
 */
import fs from 'node:fs';
import path from 'node:path';
import { openDatabase, type Database } from '../server/db/client';
import { checkIntegrity, formatIntegrityReport, type IntegrityReport } from '../server/db/integrity-check';
import { dbTarget, fail, parseArgs, runPgTool } from './db-target';

export type BackupOptions = {
  env?: NodeJS.ProcessEnv;
  /** The integrity check to run first (tests hand in their own to prove the refusal path). */
  check?: (database: Database) => Promise<IntegrityReport>;
  log?: (line: string) => void;
};

export class DamagedDatabaseError extends Error {}

async function checkFirst(database: Database, where: string, opts: BackupOptions) {
  const report = await (opts.check ?? checkIntegrity)(database);
  const text = formatIntegrityReport(report, where);
  if (!report.ok) {
    throw new DamagedDatabaseError(`${text}\nNo backup was written: a backup of a damaged database would carry the damage along.`);
  }
  (opts.log ?? console.log)(text);
}

export async function backup(file: string, opts: BackupOptions = {}) {
  const target = dbTarget(opts.env);
  fs.mkdirSync(path.dirname(path.resolve(file)), { recursive: true });
  if (target.kind === 'postgres') {
    const database = await openDatabase({ databaseUrl: target.url });
    try {
      await checkFirst(database, 'the PostgreSQL database (DATABASE_URL)', opts);
    } finally {
      await database.close();
    }
    runPgTool('pg_dump', ['--format=custom', '--no-owner', '--file', file, target.url]);
    return { kind: target.kind, bytes: fs.statSync(file).size };
  }
  if (!fs.existsSync(path.join(target.dataDir, 'PG_VERSION'))) throw new Error(`no database in ${target.dataDir}`);
  // Opening takes the folder's lock (refused at once while the shop runs) and keeps it until close.
  const database = await openDatabase({ dataDir: target.dataDir, purpose: 'a backup (npm run db:backup)', amcheck: true });
  try {
    await checkFirst(database, target.dataDir, opts);
    const dump = await database.pglite!.dumpDataDir('gzip');
    // Written beside the target first, then renamed: a half-written backup never carries the name.
    const partial = `${file}.partial`;
    fs.writeFileSync(partial, Buffer.from(await dump.arrayBuffer()));
    fs.renameSync(partial, file);
  } finally {
    await database.close();
  }
  return { kind: target.kind, bytes: fs.statSync(file).size };
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const { file } = parseArgs(process.argv.slice(2));
  if (!file) fail('usage: npm run db:backup -- <file>');
  backup(file)
    .then((r) => console.log(`Backed up the ${r.kind} database to ${file} (${(r.bytes / 1024).toFixed(0)} KiB). Copy the uploads folder too: it holds the photos.`))
    .catch((err: Error) => fail(err.message));
}
