import fs from 'node:fs';
import { PGlite } from '@electric-sql/pglite';
import { amcheck } from '@electric-sql/pglite/contrib/amcheck';
import pg from 'pg';
import { inject } from 'vitest';
import { openDatabase, migrateDatabase, type Database } from '../../server/db/client';

/** A fresh, migrated, empty database for one test file (a copy of the run's template); `amcheck` loads that extension. */
export async function freshDatabase(opts: { amcheck?: boolean } = {}): Promise<Database> {
  const bytes = fs.readFileSync(inject('templatePath'));
  const pglite = new PGlite({ loadDataDir: new Blob([bytes]), extensions: opts.amcheck ? { amcheck } : {} });
  return openDatabase({ pglite });
}

/** The PostgreSQL server the DB tests also run against (CI starts one); undefined locally. */
export const TEST_DATABASE_URL = process.env.TEST_DATABASE_URL || undefined;

let serverSeq = 0;

/**
 * A fresh database on the TEST_DATABASE_URL server, migrated the way `npm start` does it.
 * Each call creates its own database (so test files never share rows) and close() drops it.
 */
export async function freshServerDatabase(opts: { migrate?: boolean } = {}): Promise<Database & { url: string }> {
  if (!TEST_DATABASE_URL) throw new Error('TEST_DATABASE_URL is not set');
  const admin = new pg.Client({ connectionString: TEST_DATABASE_URL });
  await admin.connect();
  const name = `stickerline_t_${process.pid}_${Date.now()}_${++serverSeq}`;
  await admin.query(`CREATE DATABASE "${name}"`);
  await admin.end();
  const url = new URL(TEST_DATABASE_URL);
  url.pathname = `/${name}`;
  const database = await openDatabase({ databaseUrl: url.toString() });
  if (opts.migrate !== false) await migrateDatabase(database);
  return {
    ...database,
    url: url.toString(),
    async close() {
      await database.close();
      const dropper = new pg.Client({ connectionString: TEST_DATABASE_URL });
      await dropper.connect();
      await dropper.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
      await dropper.end();
    },
  };
}

/** Both database paths when a server is configured, PGlite alone otherwise (for describe.each). */
export function databaseKinds(): Array<{ kind: 'pglite' | 'postgres'; open: () => Promise<Database> }> {
  const kinds: Array<{ kind: 'pglite' | 'postgres'; open: () => Promise<Database> }> = [{ kind: 'pglite', open: freshDatabase }];
  if (TEST_DATABASE_URL) kinds.push({ kind: 'postgres', open: () => freshServerDatabase() });
  return kinds;
}
