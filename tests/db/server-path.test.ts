import fs from 'node:fs';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import request from 'supertest';
import { sql, eq } from 'drizzle-orm';
import { createApp } from '../../server/app';
import { createAuth } from '../../server/lib/auth';
import { createMailer } from '../../server/lib/mail';
import { createPayments } from '../../server/lib/payments';
import { MIGRATIONS_FOLDER, type Database } from '../../server/db/client';
import { moistureReadings, slabs } from '../../server/db/schema/index';
import { logRow, slabRow } from '../helpers/fixtures';
import { databaseKinds, TEST_DATABASE_URL } from '../helpers/test-db';
import { TEST_ORIGIN } from '../helpers/test-app';

if (!TEST_DATABASE_URL) {
  console.info('[tests/db] TEST_DATABASE_URL is not set: the PostgreSQL server path is skipped here; '
    + 'start one with `export TEST_DATABASE_URL="$(bash scripts/pg-test-server.sh start)"` (CI does).');
}

const journal = JSON.parse(fs.readFileSync(`${MIGRATIONS_FOLDER}/meta/_journal.json`, 'utf8')) as { entries: unknown[] };

/** Rows from db.execute: PGlite and node-postgres both put them on `.rows`. */
async function rowsOf<T>(database: Database, query: ReturnType<typeof sql>): Promise<T[]> {
  const out = (await database.db.execute(query)) as unknown as { rows: T[] };
  return out.rows;
}

describe.each(databaseKinds())('on $kind', ({ kind, open }) => {
  let database: Database;
  beforeAll(async () => { database = await open(); });
  afterAll(async () => { await database?.close(); });

  it('has every migration applied and every table of the schema present', async () => {
    expect(database.kind).toBe(kind);
    const applied = await rowsOf<{ n: number }>(database, sql`select count(*)::int as n from drizzle.__drizzle_migrations`);
    expect(applied[0].n).toBe(journal.entries.length);
    const tables = (await rowsOf<{ name: string }>(database, sql`select table_name as name from information_schema.tables where table_schema = 'public'`)).map((r) => r.name);
    for (const t of ['user', 'session', 'species', 'logs', 'slabs', 'slab_photos', 'moisture_readings', 'holds', 'orders', 'order_lines', 'payments', 'audit_log', 'email_outbox']) {
      expect(tables).toContain(t);
    }
  });

  it('answers the public catalogue query with filters through the real app', async () => {
    const walnut = await logRow(database.db, 'black-walnut');
    const thick = await slabRow(database.db, walnut, { thicknessIn: 3, widthsIn: [24, 26], lengthIn: 120 });
    await slabRow(database.db, walnut, { thicknessIn: 1.5 });
    const mailer = createMailer({ host: '127.0.0.1', port: 1, from: 'Stickerline <yard@stickerline.test>' });
    const auth = createAuth({ db: database.db, secret: 'test-secret-test-secret-test-secret!', baseURL: TEST_ORIGIN, mailer });
    const payments = createPayments({ secretKey: 'sk_test_local_fake', host: '127.0.0.1', port: inject('stripePort'), protocol: 'http', webhookSecret: 'whsec_test_only' });
    const app = createApp({ db: database.db, auth, mailer, payments, uploadsDir: '/nonexistent', trustedOrigins: [TEST_ORIGIN] });

    const res = await request(app).get('/api/slabs?species=black-walnut&minThicknessIn=2&sort=price-desc');
    mailer.close();

    expect(res.status).toBe(200);
    expect(res.body.total).toBe(1);
    expect(res.body.items[0]).toMatchObject({ id: thick.id, thicknessIn: 3, moisturePercent: 9 });
  });

  it('keeps a committed write and drops the whole of a failed transaction', async () => {
    const log = await logRow(database.db, 'white-oak');
    const slab = await slabRow(database.db, log, { mc: null });
    await database.db.insert(moistureReadings).values({ slabId: slab.id, measuredOn: '2024-05-01', mcPercent: 14.5, meterKind: 'pin' });

    await expect(database.db.transaction(async (tx) => {
      await tx.insert(moistureReadings).values({ slabId: slab.id, measuredOn: '2024-06-01', mcPercent: 12, meterKind: 'pin' });
      await tx.update(slabs).set({ code: 'never-kept' }).where(eq(slabs.id, slab.id));
      throw new Error('stop half-way');
    })).rejects.toThrow('stop half-way');

    const readings = await database.db.select().from(moistureReadings).where(eq(moistureReadings.slabId, slab.id));
    expect(readings.map((r) => r.mcPercent)).toEqual([14.5]);
    const [after] = await database.db.select().from(slabs).where(eq(slabs.id, slab.id));
    expect(after.code).toBe(slab.code);
  });

  it('refuses a second slab with the same code (the unique index holds on both drivers)', async () => {
    const log = await logRow(database.db, 'sugar-maple');
    const first = await slabRow(database.db, log);
    await expect(slabRow(database.db, log, { code: first.code })).rejects.toThrow();
  });
});
