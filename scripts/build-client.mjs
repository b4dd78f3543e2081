// `npm start`'s first step: builds the client with Vite only when its sources changed since the
// last build. A content hash of every input is kept in dist/.build-stamp; `--always` builds anyway.
// Plain JavaScript on purpose: it runs before anything else and must start fast.
import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { spawnSync } from 'node:child_process';

/** Everything the built client depends on (shared/ holds the schemas and wood math it imports). */
export const CLIENT_INPUTS = ['src', 'shared', 'public', 'index.html', 'vite.config.ts', 'tsconfig.json', 'package-lock.json'];
export const STAMP = '.build-stamp';

function* files(root, rel) {
  const full = path.join(root, rel);
  if (!fs.existsSync(full)) return;
  if (fs.statSync(full).isFile()) { yield rel; return; }
  for (const name of fs.readdirSync(full).sort()) yield* files(root, path.join(rel, name));
}

/** One hash over the names and contents of every client input. */
export function clientSourceHash(root) {
  const hash = crypto.createHash('sha256');
  for (const input of CLIENT_INPUTS) {
    for (const rel of files(root, input)) {
      hash.update(`${rel.split(path.sep).join('/')}\0`);
      hash.update(fs.readFileSync(path.join(root, rel)));
      hash.update('\0');
    }
  }
  return hash.digest('hex');
}

/** True when dist/ is missing, or was built from other sources than those in the tree now. */
export function needsBuild(root, outDir = path.join(root, 'dist')) {
  const stamp = path.join(outDir, STAMP);
  if (!fs.existsSync(path.join(outDir, 'index.html')) || !fs.existsSync(stamp)) return true;
  return fs.readFileSync(stamp, 'utf8').trim() !== clientSourceHash(root);
}

function main() {
  const root = process.cwd();
  const always = process.argv.includes('--always');
  if (!always && !needsBuild(root)) {
    console.log('Client unchanged since the last build: using dist/.');
    return;
  }
  const hash = clientSourceHash(root);
  const vite = path.join(root, 'node_modules', 'vite', 'bin', 'vite.js');
  const run = spawnSync(process.execPath, [vite, 'build'], { stdio: 'inherit' });
  if (run.status !== 0) process.exit(run.status ?? 1);
  // The hash is of the sources as they were when the build started: an edit made during the build triggers the next one.
  fs.writeFileSync(path.join(root, 'dist', STAMP), `${hash}\n`);
}

if (import.meta.url === `file://${process.argv[1]}`) main();
