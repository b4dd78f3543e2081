/**
 * `npm run db:restore -- <file> [--force]` — puts a backup from `db:backup` back.
 * Refuses to overwrite a database that holds data unless --force; with --force on PGlite the old
 * data dir is kept beside the new one (renamed), never deleted.
 */
import fs from 'node:fs';
import path from 'node:path';
import { PGlite } from '@electric-sql/pglite';
import { lockDataDir } from '../server/db/data-dir-lock';
import { dbTarget, fail, isNonEmptyDir, parseArgs, runPgTool } from './db-target';

export async function restore(file: string, opts: { force?: boolean; env?: NodeJS.ProcessEnv } = {}) {
  if (!fs.existsSync(file)) throw new Error(`no backup file at ${file}`);
  const target = dbTarget(opts.env);
  if (target.kind === 'postgres') {
    const tables = runPgTool('psql', ['--tuples-only', '--no-align', '--command',
      "select count(*) from information_schema.tables where table_schema in ('public','drizzle')", target.url]).trim();
    if (Number(tables) > 0 && !opts.force) {
      throw new Error('The database at DATABASE_URL already has tables. Restoring replaces them: run again with --force if you mean it.');
    }
    runPgTool('pg_restore', ['--clean', '--if-exists', '--no-owner', '--single-transaction', '--dbname', target.url, file]);
    return { kind: target.kind, keptAs: null };
  }
  // The folder's lock is held from the first look to the last write: a running shop makes this refuse at once.
  const lock = await lockDataDir(target.dataDir, { purpose: 'a restore (npm run db:restore)' });
  let keptAs: string | null = null;
  try {
    if (isNonEmptyDir(target.dataDir)) {
      if (!opts.force) {
        throw new Error(`${target.dataDir} already holds a database. Restoring replaces it: run again with --force `
          + '(the current one is kept beside it, renamed).');
      }
      keptAs = `${target.dataDir}.before-restore-${new Date().toISOString().replace(/[:.]/g, '-')}`;
      fs.renameSync(target.dataDir, keptAs);
    }
    fs.mkdirSync(path.dirname(target.dataDir), { recursive: true });
    const bytes = fs.readFileSync(file);
    const pglite = new PGlite(target.dataDir, { loadDataDir: new Blob([bytes]) });
    await pglite.waitReady;
    // A backup that does not open as a database fails here, before anyone starts on it.
    await pglite.query('select 1');
    await pglite.close();
  } finally {
    await lock.release();
  }
  return { kind: target.kind, keptAs };
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const { file, force } = parseArgs(process.argv.slice(2));
  if (!file) fail('usage: npm run db:restore -- <file> [--force]');
  restore(file, { force })
    .then((r) => console.log(`Restored ${file} into the ${r.kind} database.${r.keptAs ? ` The previous one is kept at ${r.keptAs}.` : ''}`))
    .catch((err: Error) => fail(err.message));
}
