import { PGlite } from '@electric-sql/pglite';
import { drizzle as drizzlePglite } from 'drizzle-orm/pglite';
import { migrate as migratePglite } from 'drizzle-orm/pglite/migrator';
import { drizzle as drizzlePg } from 'drizzle-orm/node-postgres';
import { migrate as migratePg } from 'drizzle-orm/node-postgres/migrator';
import pg from 'pg';
import * as schema from './schema/index';

export type Db = ReturnType<typeof drizzlePglite<typeof schema>>;
/** A transaction handle or the db itself: repos accept either. */
export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0] | Db;

export type Database = {
  db: Db;
  kind: 'pglite' | 'postgres';
  pglite?: PGlite;
  close(): Promise<void>;
};

export const MIGRATIONS_FOLDER = new URL('../../drizzle', import.meta.url).pathname;

/**
 * Opens the database: a PostgreSQL server when `databaseUrl` is given, else PGlite in `dataDir`
 * (or in memory when `dataDir` is omitted), or an already opened PGlite instance (tests).
 */
export async function openDatabase(opts: { databaseUrl?: string; dataDir?: string; pglite?: PGlite }): Promise<Database> {
  if (opts.databaseUrl) {
    const pool = new pg.Pool({ connectionString: opts.databaseUrl, max: 10 });
    // Both drivers speak the same SQL; the PGlite type is the common surface the repos use.
    const db = drizzlePg(pool, { schema }) as unknown as Db;
    return { db, kind: 'postgres', close: () => pool.end() };
  }
  const client = opts.pglite ?? (opts.dataDir ? new PGlite(opts.dataDir) : new PGlite());
  await client.waitReady;
  const db = drizzlePglite(client, { schema });
  return { db, kind: 'pglite', pglite: client, close: () => client.close() };
}

export async function migrateDatabase(database: Database): Promise<void> {
  if (database.kind === 'postgres') {
    await migratePg(database.db as never, { migrationsFolder: MIGRATIONS_FOLDER });
  } else {
    await migratePglite(database.db, { migrationsFolder: MIGRATIONS_FOLDER });
  }
}
