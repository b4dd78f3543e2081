import path from 'node:path';
import { spawnSync } from 'node:child_process';

const ROOT = path.resolve(import.meta.dirname, '../..');
const TSX = path.join(ROOT, 'node_modules/.bin/tsx');

/** Runs one of the npm scripts' files the way `npm run db:…` does, with its own environment. */
export function runScript(file: string, args: string[], env: Record<string, string>) {
  const clean = { ...process.env };
  delete clean.DATABASE_URL;
  const out = spawnSync(TSX, [path.join(ROOT, file), ...args], { cwd: ROOT, env: { ...clean, ...env }, encoding: 'utf8', timeout: 60_000 });
  return { code: out.status, stdout: out.stdout, stderr: out.stderr };
}
