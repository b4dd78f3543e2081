import { sql } from 'drizzle-orm';
import type { Database, Tx } from './client';

/**
 * `npm run db:check`: is the database whole? Works the same on PGlite and on a PostgreSQL server.
 *
 * 1. Indexes: PostgreSQL's `amcheck` extension, `bt_index_check(index, heapallindexed => true)`
 *    on every btree index of the app's tables — it finds index entries out of order and table rows
 *    the index has lost (the damage two writers on one PGlite folder leave: a row a scan finds and
 *    an index lookup does not). If amcheck cannot be had (a server that does not allow the
 *    extension), the index step is skipped and the report says so.
 * 2. Constraints, read from the catalog so new ones are covered without touching this file:
 *    every CHECK re-evaluated against every row, every foreign key looked up, every unique index
 *    re-counted — with index scans turned off, so a damaged index cannot vouch for itself — and any
 *    constraint added NOT VALID validated with ALTER TABLE … VALIDATE CONSTRAINT.
 */

export type Finding = { what: string; problem: string };
export type IntegrityReport = {
  ok: boolean;
  indexesChecked: number;
  /** Why the index step was skipped, or null when amcheck ran. */
  indexCheckSkipped: string | null;
  constraintsChecked: number;
  damage: Finding[];
};

const ident = (name: string) => `"${name.replace(/"/g, '""')}"`;
const rowsOf = async <T>(db: Tx, query: ReturnType<typeof sql>) => ((await db.execute(query)) as unknown as { rows: T[] }).rows;
const errorText = (err: unknown) => {
  const e = err as { message?: string; cause?: { message?: string } };
  return e.cause?.message ?? e.message ?? String(err);
};

async function enableAmcheck(db: Tx): Promise<string | null> {
  try {
    await db.execute(sql`create extension if not exists amcheck`);
    return null;
  } catch (err) {
    return `amcheck is not available here (${errorText(err)}); indexes were not checked. `
      + 'On a PostgreSQL server, ask its administrator to run CREATE EXTENSION amcheck in this database.';
  }
}

async function checkIndexes(db: Tx, damage: Finding[]) {
  const indexes = await rowsOf<{ index: string; table: string }>(db, sql`
    select ic.relname as "index", t.relname as "table"
      from pg_index i
      join pg_class ic on ic.oid = i.indexrelid
      join pg_class t on t.oid = i.indrelid
      join pg_namespace n on n.oid = t.relnamespace
      join pg_am am on am.oid = ic.relam
     where n.nspname = 'public' and am.amname = 'btree' and i.indisvalid and i.indisready
     order by t.relname, ic.relname`);
  for (const { index, table } of indexes) {
    try {
      await db.execute(sql.raw(`select bt_index_check(index => '${ident(index).replace(/'/g, "''")}'::regclass, heapallindexed => true)`));
    } catch (err) {
      damage.push({ what: `index ${index} on ${table}`, problem: errorText(err) });
    }
  }
  return indexes.length;
}

type ConstraintRow = { name: string; table: string; type: 'c' | 'f' | 'u' | 'p'; def: string; validated: boolean };

async function checkConstraints(database: Database, damage: Finding[]) {
  const { db } = database;
  const constraints = await rowsOf<ConstraintRow>(db, sql`
    select c.conname as name, t.relname as "table", c.contype as type, pg_get_constraintdef(c.oid) as def, c.convalidated as validated
      from pg_constraint c join pg_class t on t.oid = c.conrelid join pg_namespace n on n.oid = t.relnamespace
     where n.nspname = 'public' and c.contype in ('c', 'f')
     order by t.relname, c.conname`);

  // NOT VALID constraints first: VALIDATE checks the old rows and, if they pass, marks the constraint valid.
  for (const c of constraints.filter((x) => !x.validated)) {
    try {
      await db.execute(sql.raw(`alter table ${ident(c.table)} validate constraint ${ident(c.name)}`));
    } catch (err) {
      damage.push({ what: `constraint ${c.name} on ${c.table}`, problem: errorText(err) });
    }
  }

  const fks = await rowsOf<{ name: string; table: string; parent: string; cols: string[]; pcols: string[] }>(db, sql`
    select c.conname as name, t.relname as "table", p.relname as parent,
           array(select a.attname::text from unnest(c.conkey) with ordinality k(n, i) join pg_attribute a on a.attrelid = c.conrelid and a.attnum = k.n order by k.i) as cols,
           array(select a.attname::text from unnest(c.confkey) with ordinality k(n, i) join pg_attribute a on a.attrelid = c.confrelid and a.attnum = k.n order by k.i) as pcols
      from pg_constraint c join pg_class t on t.oid = c.conrelid join pg_class p on p.oid = c.confrelid
      join pg_namespace n on n.oid = t.relnamespace
     where n.nspname = 'public' and c.contype = 'f'`);

  const uniques = await rowsOf<{ index: string; table: string; cols: string[] | null; pred: string | null }>(db, sql`
    select ic.relname as "index", t.relname as "table", pg_get_expr(i.indpred, i.indrelid) as pred,
           case when 0 = any(i.indkey::int2[]) then null else
             array(select a.attname::text from unnest(i.indkey::int2[]) with ordinality k(n, o) join pg_attribute a on a.attrelid = i.indrelid and a.attnum = k.n order by k.o) end as cols
      from pg_index i join pg_class ic on ic.oid = i.indexrelid join pg_class t on t.oid = i.indrelid
      join pg_namespace n on n.oid = t.relnamespace
     where n.nspname = 'public' and i.indisunique`);

  let checked = constraints.filter((c) => !c.validated).length;
  await db.transaction(async (tx) => {
    // Read the tables themselves: an index that lost rows must not answer for them.
    await tx.execute(sql`set local enable_indexscan = off`);
    await tx.execute(sql`set local enable_indexonlyscan = off`);
    await tx.execute(sql`set local enable_bitmapscan = off`);

    for (const c of constraints.filter((x) => x.type === 'c' && x.validated)) {
      const expr = c.def.replace(/^CHECK\s*/i, '').replace(/\s+NOT VALID$/i, '');
      const [{ n }] = await rowsOf<{ n: number }>(tx, sql.raw(`select count(*)::int as n from ${ident(c.table)} where not (${expr})`));
      checked++;
      if (n > 0) damage.push({ what: `constraint ${c.name} on ${c.table}`, problem: `${n} row(s) break ${c.def}` });
    }
    for (const fk of fks) {
      const notNull = fk.cols.map((col) => `c.${ident(col)} is not null`).join(' and ');
      const match = fk.cols.map((col, i) => `p.${ident(fk.pcols[i])} = c.${ident(col)}`).join(' and ');
      const [{ n }] = await rowsOf<{ n: number }>(tx, sql.raw(
        `select count(*)::int as n from ${ident(fk.table)} c where ${notNull} and not exists (select 1 from ${ident(fk.parent)} p where ${match})`));
      checked++;
      if (n > 0) damage.push({ what: `foreign key ${fk.name} on ${fk.table}`, problem: `${n} row(s) point at ${fk.parent} rows that do not exist` });
    }
    for (const u of uniques.filter((x) => x.cols?.length)) {
      const cols = u.cols!.map(ident).join(', ');
      const where = [...u.cols!.map((col) => `${ident(col)} is not null`), ...(u.pred ? [`(${u.pred})`] : [])].join(' and ');
      const [{ n }] = await rowsOf<{ n: number }>(tx, sql.raw(
        `select count(*)::int as n from (select 1 from ${ident(u.table)} where ${where} group by ${cols} having count(*) > 1) d`));
      checked++;
      if (n > 0) damage.push({ what: `unique index ${u.index} on ${u.table}`, problem: `${n} value(s) appear more than once` });
    }
  });
  return checked;
}

export async function checkIntegrity(database: Database): Promise<IntegrityReport> {
  const damage: Finding[] = [];
  const indexCheckSkipped = await enableAmcheck(database.db);
  const indexesChecked = indexCheckSkipped ? 0 : await checkIndexes(database.db, damage);
  const constraintsChecked = await checkConstraints(database, damage);
  return { ok: damage.length === 0, indexesChecked, indexCheckSkipped, constraintsChecked, damage };
}

/** The report as a person reads it at the terminal. */
export function formatIntegrityReport(r: IntegrityReport, where: string) {
  const lines = [`Integrity check of ${where}`];
  lines.push(r.indexCheckSkipped ? `  Indexes: NOT CHECKED — ${r.indexCheckSkipped}` : `  Indexes: ${r.indexesChecked} btree indexes checked with amcheck (every row looked up).`);
  lines.push(`  Constraints: ${r.constraintsChecked} checks, foreign keys and unique rules re-checked against the rows.`);
  if (r.ok) {
    lines.push('  Result: no damage found.');
  } else {
    lines.push(`  Result: DAMAGE FOUND (${r.damage.length}):`);
    for (const d of r.damage) lines.push(`    - ${d.what}: ${d.problem}`);
    lines.push('  Do not keep writing to this database. Restore the latest good backup (npm run db:restore), or rebuild a damaged index with REINDEX if only indexes are named above.');
  }
  return lines.join('\n');
}
