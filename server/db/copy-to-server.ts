import { getTableConfig, type PgTable } from 'drizzle-orm/pg-core';
import { sql } from 'drizzle-orm';
import type { Database } from './client';
import * as schema from './schema/index';

/** Tables in an order where every foreign key points at a table copied before it. */
export const COPY_ORDER: PgTable[] = [
  schema.user, schema.session, schema.account, schema.verification,
  schema.species, schema.figureKinds, schema.millSettings, schema.pickupWindows, schema.closedDays,
  schema.logs, schema.slabs, schema.slabPhotos, schema.moistureReadings,
  schema.holds, schema.orders, schema.orderLines, schema.payments, schema.auditLog, schema.emailOutbox,
];

const BATCH = 500;

async function rows<T>(database: Database, query: ReturnType<typeof sql>): Promise<T[]> {
  return ((await database.db.execute(query)) as unknown as { rows: T[] }).rows;
}

/**
 * Copies every row from one Stickerline database into another that has the same migrations
 * applied and no data (the move from PGlite to a PostgreSQL server). Rows travel as JSON and are
 * rebuilt by PostgreSQL itself (`json_populate_recordset`), so every column type round-trips;
 * serial sequences are moved past the copied ids. Returns the row count per table.
 */
export async function copyDatabase(source: Database, target: Database): Promise<Record<string, number>> {
  const counts: Record<string, number> = {};
  for (const table of COPY_ORDER) {
    const name = getTableConfig(table).name;
    const [{ n }] = await rows<{ n: number }>(target, sql`select count(*)::int as n from ${sql.identifier(name)}`);
    if (n > 0) throw new Error(`The target already has rows in "${name}"; copy only into an empty, migrated database.`);
  }
  await target.db.transaction(async (tx) => {
    for (const table of COPY_ORDER) {
      const { name, columns } = getTableConfig(table);
      const all = await rows<{ row: unknown }>(source, sql`select row_to_json(t) as row from ${sql.identifier(name)} t`);
      for (let i = 0; i < all.length; i += BATCH) {
        const json = JSON.stringify(all.slice(i, i + BATCH).map((r) => (typeof r.row === 'string' ? JSON.parse(r.row) : r.row)));
        await tx.execute(sql`insert into ${sql.identifier(name)} select * from json_populate_recordset(null::${sql.identifier(name)}, ${json}::json)`);
      }
      counts[name] = all.length;
      for (const col of columns.filter((c) => c.columnType === 'PgSerial')) {
        await tx.execute(sql`select setval(pg_get_serial_sequence(${name}, ${col.name}),
          coalesce((select max(${sql.identifier(col.name)}) from ${sql.identifier(name)}), 1),
          (select max(${sql.identifier(col.name)}) from ${sql.identifier(name)}) is not null)`);
      }
    }
  });
  return counts;
}
