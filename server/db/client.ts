import { PGlite, type Extensions } from '@electric-sql/pglite';
import { amcheck } from '@electric-sql/pglite/contrib/amcheck';
import { drizzle as drizzlePglite } from 'drizzle-orm/pglite';
import { migrate as migratePglite } from 'drizzle-orm/pglite/migrator';
import { drizzle as drizzlePg } from 'drizzle-orm/node-postgres';
import { migrate as migratePg } from 'drizzle-orm/node-postgres/migrator';
import pg from 'pg';
import * as schema from './schema/index';
import { lockDataDir } from './data-dir-lock';

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
 * A data folder is locked for as long as it is open (one writer per folder; see data-dir-lock.ts):
 * a second opener gets DataDirBusyError at once. close() lets it go.
 */
export async function openDatabase(opts: { databaseUrl?: string; dataDir?: string; pglite?: PGlite; purpose?: string; amcheck?: boolean }): Promise<Database> {
  if (opts.databaseUrl) {
    const pool = new pg.Pool({ connectionString: opts.databaseUrl, max: 10 });
    // Both drivers speak the same SQL; the PGlite type is the common surface the repos use.
    const db = drizzlePg(pool, { schema }) as unknown as Db;
    return { db, kind: 'postgres', close: () => pool.end() };
  }
  const lock = !opts.pglite && opts.dataDir ? await lockDataDir(opts.dataDir, { purpose: opts.purpose ?? 'the shop' }) : null;
  let client: PGlite;
  try {
    // amcheck (index checks for `npm run db:check`) is loaded only by those who ask for it.
    const extensions: Extensions = opts.amcheck ? { amcheck } : {};
    client = opts.pglite ?? (opts.dataDir ? new PGlite(opts.dataDir, { extensions }) : new PGlite({ extensions }));
    await client.waitReady;
  } catch (err) {
    await lock?.release();
    throw err;
  }
  const db = drizzlePglite(client, { schema });
  return {
    db, kind: 'pglite', pglite: client,
    async close() {
      try {
        await client.close();
      } finally {
        await lock?.release();
      }
    },
  };
}

export async function migrateDatabase(database: Database): Promise<void> {
  if (database.kind === 'postgres') {
    await migratePg(database.db as never, { migrationsFolder: MIGRATIONS_FOLDER });
  } else {
    await migratePglite(database.db, { migrationsFolder: MIGRATIONS_FOLDER });
  }
}
