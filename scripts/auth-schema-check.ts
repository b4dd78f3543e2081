/**
 * Compares the tables the auth library's CLI would generate with our hand-kept
 * server/db/schema/auth.ts, column by column. Run: `npx tsx scripts/auth-schema-check.ts`.
 * Exit code 1 when they differ in a way not listed in INTENDED below.
 *
 * The CLI targets Node 22; on Node 20 it needs Object.groupBy, so it is started with a small shim.
 */
import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { getTableConfig, type PgTable } from 'drizzle-orm/pg-core';
import * as ours from '../server/db/schema/auth';

/** Differences we keep on purpose, with the reason. */
const INTENDED: Record<string, string> = {
  'user.role default': 'a DB default of buyer, so a row written outside the auth library is never a staff account',
};

const root = path.resolve(import.meta.dirname, '..');
const outDir = fs.mkdtempSync(path.join(os.tmpdir(), 'auth-cli-'));
const outFile = path.join(outDir, 'auth-generated.ts');
// The CLI (pinned) is fetched when this check runs: it declares Node 22, so as a dependency it would
// make every `npm install` on Node 20 warn.
execFileSync('npx', ['--yes', 'auth@1.7.7', 'generate', '--config', 'scripts/auth-cli-config.ts', '--output', outFile, '--yes'], {
  cwd: root,
  stdio: 'inherit',
  env: { ...process.env, NODE_OPTIONS: `${process.env.NODE_OPTIONS ?? ''} --import ${pathToFileURL(path.join(root, 'scripts/node20-groupby-polyfill.mjs')).href}` },
});
// The generated file imports drizzle-orm; copy it inside the repo so that import resolves.
const local = path.join(root, 'scripts', `.auth-cli-${process.pid}.ts`);
fs.copyFileSync(outFile, local);
let generated: Record<string, unknown>;
try {
  generated = await import(pathToFileURL(local).href);
} finally {
  fs.rmSync(local, { force: true });
  fs.rmSync(outDir, { recursive: true, force: true });
}

type ColumnFacts = { type: string; notNull: boolean; hasDefault: boolean; primary: boolean; unique: boolean };
const describe = (table: PgTable) => {
  const cfg = getTableConfig(table);
  const columns = new Map<string, ColumnFacts>();
  for (const c of cfg.columns) {
    columns.set(c.name, { type: c.getSQLType(), notNull: c.notNull, hasDefault: c.hasDefault, primary: c.primary, unique: c.isUnique });
  }
  const fks = cfg.foreignKeys.map((fk) => { const r = fk.reference(); return `${r.columns.map((c) => c.name)}->${getTableConfig(r.foreignTable).name}(${fk.onDelete})`; }).sort();
  const indexes = cfg.indexes.map((i) => i.config.name).sort();
  return { name: cfg.name, columns, fks, indexes };
};

const problems: string[] = [];
const notes: string[] = [];
const isTable = (v: unknown): v is PgTable => !!v && typeof v === 'object' && Symbol.for('drizzle:IsDrizzleTable') in (v as object);
for (const [key, value] of Object.entries(generated)) {
  if (!isTable(value)) continue;
  const theirs = describe(value);
  const mine = (ours as Record<string, unknown>)[key];
  if (!isTable(mine)) { problems.push(`missing table ${theirs.name}`); continue; }
  const our = describe(mine);
  for (const [col, facts] of theirs.columns) {
    const o = our.columns.get(col);
    if (!o) { problems.push(`${theirs.name}.${col} is missing`); continue; }
    for (const k of Object.keys(facts) as (keyof ColumnFacts)[]) {
      if (facts[k] === o[k]) continue;
      const label = `${theirs.name}.${col} ${k === 'hasDefault' ? 'default' : k}`;
      if (INTENDED[label]) notes.push(`${label}: ours ${o[k]}, CLI ${facts[k]} — kept: ${INTENDED[label]}`);
      else problems.push(`${label}: ours ${o[k]}, CLI ${facts[k]}`);
    }
  }
  for (const col of our.columns.keys()) if (!theirs.columns.has(col)) problems.push(`${theirs.name}.${col} is extra in ours`);
  if (theirs.fks.join() !== our.fks.join()) problems.push(`${theirs.name} foreign keys: ours ${our.fks}, CLI ${theirs.fks}`);
  if (theirs.indexes.join() !== our.indexes.join()) problems.push(`${theirs.name} indexes: ours ${our.indexes}, CLI ${theirs.indexes}`);
}

for (const n of notes) console.log(`note: ${n}`);
if (problems.length) {
  console.error(`auth schema differs from the CLI's:\n  ${problems.join('\n  ')}`);
  process.exit(1);
}
console.log('auth schema matches the CLI output (tables, columns, keys, indexes).');
