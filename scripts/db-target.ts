import fs from 'node:fs';
import path from 'node:path';
import { spawnSync } from 'node:child_process';
import { readEnv } from '../server/env';

/** Where the scripts act: the PGlite data dir under DATA_DIR, or the DATABASE_URL server. */
export function dbTarget(source: NodeJS.ProcessEnv = process.env) {
  const env = readEnv(source);
  return env.DATABASE_URL
    ? ({ kind: 'postgres', url: env.DATABASE_URL, uploadsDir: env.UPLOADS_DIR } as const)
    : ({ kind: 'pglite', dataDir: path.resolve(env.DATA_DIR, 'pglite'), uploadsDir: env.UPLOADS_DIR } as const);
}

export function parseArgs(argv: string[]) {
  const flags = new Set(argv.filter((a) => a.startsWith('--')));
  const [file] = argv.filter((a) => !a.startsWith('--'));
  return { file, force: flags.has('--force') };
}

/** A data dir with files in it (an empty or missing dir is safe to write into). */
export function isNonEmptyDir(dir: string) {
  return fs.existsSync(dir) && fs.readdirSync(dir).length > 0;
}

/** Runs a PostgreSQL client tool (pg_dump, pg_restore, psql); throws with its stderr on failure. */
export function runPgTool(tool: string, args: string[]) {
  const out = spawnSync(tool, args, { encoding: 'utf8' });
  if (out.error) throw new Error(`${tool} could not run (${out.error.message}); install the PostgreSQL client tools`);
  if (out.status !== 0) throw new Error(`${tool} failed: ${out.stderr.trim()}`);
  return out.stdout;
}

export function fail(message: string): never {
  console.error(message);
  process.exit(1);
}
