/**
 * `npm run db:backup -- <file> [--force]` — writes the whole database to one file.
 * PGlite: a gzip tarball of the data dir (PGlite's own dump). Server: `pg_dump --format=custom`.
 * Photos live in UPLOADS_DIR as plain files: copy that folder beside the backup.
 */
import fs from 'node:fs';
import path from 'node:path';
import { PGlite } from '@electric-sql/pglite';
import { dbTarget, fail, looksOpen, parseArgs, runPgTool } from './db-target';

export async function backup(file: string, opts: { force?: boolean; env?: NodeJS.ProcessEnv } = {}) {
  const target = dbTarget(opts.env);
  fs.mkdirSync(path.dirname(path.resolve(file)), { recursive: true });
  if (target.kind === 'postgres') {
    runPgTool('pg_dump', ['--format=custom', '--no-owner', '--file', file, target.url]);
    return { kind: target.kind, bytes: fs.statSync(file).size };
  }
  if (!fs.existsSync(path.join(target.dataDir, 'PG_VERSION'))) throw new Error(`no database in ${target.dataDir}`);
  if (looksOpen(target.dataDir) && !opts.force) {
    throw new Error(`The database in ${target.dataDir} looks open (is Stickerline running?). Stop the server first; `
      + 'if it is stopped (for example after a crash), run again with --force.');
  }
  const pglite = new PGlite(target.dataDir);
  await pglite.waitReady;
  const dump = await pglite.dumpDataDir('gzip');
  await pglite.close();
  // Written beside the target first, then renamed: a half-written backup never carries the name.
  const partial = `${file}.partial`;
  fs.writeFileSync(partial, Buffer.from(await dump.arrayBuffer()));
  fs.renameSync(partial, file);
  return { kind: target.kind, bytes: fs.statSync(file).size };
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const { file, force } = parseArgs(process.argv.slice(2));
  if (!file) fail('usage: npm run db:backup -- <file> [--force]');
  backup(file, { force })
    .then((r) => console.log(`Backed up the ${r.kind} database to ${file} (${(r.bytes / 1024).toFixed(0)} KiB). Copy the uploads folder too: it holds the photos.`))
    .catch((err: Error) => fail(err.message));
}
