import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { sql } from 'drizzle-orm';
import { afterAll, describe, expect, it } from 'vitest';
import { migrateDatabase, openDatabase, type Database } from '../../server/db/client';
import { checkIntegrity, formatIntegrityReport } from '../../server/db/integrity-check';
import { moistureReadings, slabs } from '../../server/db/schema/index';
import { backup } from '../../scripts/backup';
import { logRow, slabRow } from '../helpers/fixtures';
import { freshDatabase, freshServerDatabase, TEST_DATABASE_URL } from '../helpers/test-db';
import { runScript } from '../durability/run-script';

const work = fs.mkdtempSync(path.join(os.tmpdir(), 'stickerline-check-'));
afterAll(() => fs.rmSync(work, { recursive: true, force: true }));

/**
 * Leaves `slabs_pkey` without an entry for one row — the damage two writers on one PGlite folder
 * left behind (a scan finds the slab, a lookup by id does not). As superuser: the index is marked
 * not ready, so the insert skips it, then marked ready again.
 */
async function loseAnIndexEntry(database: Database) {
  const log = await logRow(database.db, 'black-walnut');
  await database.db.execute(sql`update pg_index set indisready = false where indexrelid = 'slabs_pkey'::regclass`);
  const lost = await slabRow(database.db, log, { mc: null, photo: false });
  await database.db.execute(sql`update pg_index set indisready = true where indexrelid = 'slabs_pkey'::regclass`);
  return lost;
}

/** A reading of a slab that does not exist, slipped past the foreign key with triggers off (as a bad copy would). */
async function orphanAReading(database: Database) {
  await database.db.transaction(async (tx) => {
    await tx.execute(sql`set local session_replication_role = replica`);
    await tx.insert(moistureReadings).values({ slabId: 999_999, measuredOn: '2026-10-01', mcPercent: 14, meterKind: 'pin' });
  });
}

const kinds = [
  { kind: 'pglite', open: () => freshDatabase({ amcheck: true }) },
  ...(TEST_DATABASE_URL ? [{ kind: 'postgres', open: () => freshServerDatabase() }] : []),
];

describe.each(kinds)('the integrity check on $kind', ({ open }) => {
  it('finds no damage in a healthy database and says what it checked', async () => {
    const database = await open();
    try {
      const log = await logRow(database.db, 'white-oak');
      await slabRow(database.db, log);
      const report = await checkIntegrity(database);
      expect(report.damage).toEqual([]);
      expect(report.ok).toBe(true);
      expect(report.indexCheckSkipped).toBeNull();
      expect(report.indexesChecked).toBeGreaterThan(20);
      expect(report.constraintsChecked).toBeGreaterThan(40);
      expect(formatIntegrityReport(report, 'test')).toMatch(/no damage found/);
    } finally {
      await database.close();
    }
  }, 60_000);

  it('names the index that lost a row, and the foreign key a row breaks', async () => {
    const database = await open();
    try {
      const lost = await loseAnIndexEntry(database);
      // The damage as a person meets it: the slab is there, but a lookup by id does not find it.
      const byScan = await database.db.transaction(async (tx) => {
        await tx.execute(sql`set local enable_indexscan = off`);
        await tx.execute(sql`set local enable_bitmapscan = off`);
        return tx.select({ id: slabs.id }).from(slabs).where(sql`${slabs.id} = ${lost.id}`);
      });
      expect(byScan).toHaveLength(1);
      await orphanAReading(database);

      const report = await checkIntegrity(database);
      expect(report.ok).toBe(false);
      const what = report.damage.map((d) => d.what);
      expect(what).toContain('index slabs_pkey on slabs');
      expect(what).toContain('foreign key moisture_readings_slab_id_slabs_id_fk on moisture_readings');
      expect(formatIntegrityReport(report, 'test')).toMatch(/DAMAGE FOUND[\s\S]*slabs_pkey[\s\S]*db:restore/);
    } finally {
      await database.close();
    }
  }, 60_000);

  it('validates a constraint added NOT VALID and reports the rows that break it', async () => {
    const database = await open();
    try {
      const log = await logRow(database.db, 'black-cherry');
      await slabRow(database.db, log, { yardStack: 'N-1' });
      await database.db.execute(sql`alter table slabs add constraint slabs_stack_not_n check (yard_stack <> 'N-1') not valid`);
      const report = await checkIntegrity(database);
      expect(report.damage.map((d) => d.what)).toEqual(['constraint slabs_stack_not_n on slabs']);
    } finally {
      await database.close();
    }
  }, 60_000);
});

describe('npm run db:check and the backup on a PGlite folder', () => {
  const env = { DATA_DIR: path.join(work, 'data'), UPLOADS_DIR: path.join(work, 'uploads') };
  const dataDir = path.join(env.DATA_DIR, 'pglite');

  it('passes a healthy folder, then refuses to back up once an index is damaged and writes no file', async () => {
    const database = await openDatabase({ dataDir });
    await migrateDatabase(database);
    await slabRow(database.db, await logRow(database.db, 'sugar-maple'));
    await database.close();

    const healthy = runScript('scripts/db-check.ts', [], env);
    expect(healthy.code, healthy.stderr).toBe(0);
    expect(healthy.stdout).toMatch(/btree indexes checked with amcheck[\s\S]*no damage found/);
    const good = path.join(work, 'good.tar.gz');
    const lines: string[] = [];
    await backup(good, { env, log: (l) => lines.push(l) });
    expect(fs.statSync(good).size).toBeGreaterThan(1000);
    expect(lines.join('\n')).toMatch(/no damage found/);

    const again = await openDatabase({ dataDir });
    await loseAnIndexEntry(again);
    await again.close();

    const damaged = runScript('scripts/db-check.ts', [], env);
    expect(damaged.code).toBe(1);
    expect(damaged.stdout).toMatch(/DAMAGE FOUND[\s\S]*index slabs_pkey on slabs/);

    const bad = path.join(work, 'bad.tar.gz');
    await expect(backup(bad, { env, log: () => {} })).rejects.toThrow(/slabs_pkey[\s\S]*No backup was written/);
    expect(fs.existsSync(bad)).toBe(false);
    expect(fs.existsSync(`${bad}.partial`)).toBe(false);
    expect(fs.existsSync(`${dataDir}.lock`)).toBe(false); // the refused backup let the folder go
  }, 240_000);

  it('refuses the backup whenever the check it is given reports damage (the refusal path on its own)', async () => {
    const file = path.join(work, 'injected.tar.gz');
    const check = async () => ({ ok: false, indexesChecked: 1, indexCheckSkipped: null, constraintsChecked: 0, damage: [{ what: 'index made_up_idx on slabs', problem: 'injected for the test' }] });
    await expect(backup(file, { env, check })).rejects.toThrow(/made_up_idx[\s\S]*No backup was written/);
    expect(fs.existsSync(file)).toBe(false);
  }, 120_000);
});
