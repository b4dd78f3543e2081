/**
 * `npm run db:reset [-- --force]` — empties the database and the photo folder so the next
 * `npm start` writes the demo data afresh. Refused while the shop runs on the folder. A PostgreSQL server
 * (DATABASE_URL) is only wiped with --force, since it may hold a real shop.
 */
import fs from 'node:fs';
import path from 'node:path';
import { lockDataDir } from '../server/db/data-dir-lock';
import { dbTarget, fail, parseArgs, runPgTool } from './db-target';

export async function resetDemo(opts: { force?: boolean; env?: NodeJS.ProcessEnv } = {}) {
  const target = dbTarget(opts.env);
  if (target.kind === 'postgres') {
    if (!opts.force) throw new Error('DATABASE_URL points at a PostgreSQL server; wiping it needs --force.');
    runPgTool('psql', ['--command', 'drop schema if exists public cascade; drop schema if exists drizzle cascade; create schema public;', target.url]);
  } else {
    // Refused at once while the shop (or a backup) holds the folder.
    const lock = await lockDataDir(target.dataDir, { purpose: 'a reset (npm run db:reset)' });
    try {
      fs.rmSync(target.dataDir, { recursive: true, force: true });
    } finally {
      await lock.release();
    }
  }
  // Photos go too (their rows are gone); the folder's .gitkeep stays so git still tracks it.
  if (fs.existsSync(target.uploadsDir)) {
    for (const entry of fs.readdirSync(target.uploadsDir)) {
      if (entry !== '.gitkeep') fs.rmSync(path.join(target.uploadsDir, entry), { recursive: true, force: true });
    }
  }
  return target.kind;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  resetDemo(parseArgs(process.argv.slice(2)))
    .then((kind) => console.log(`Emptied the ${kind} database and the uploads folder. \`npm start\` writes the demo data again.`))
    .catch((err: Error) => fail(err.message));
}
