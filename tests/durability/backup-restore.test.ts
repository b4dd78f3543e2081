import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { openDatabase, migrateDatabase } from '../../server/db/client';
import { slabs } from '../../server/db/schema/index';
import { logRow, slabRow } from '../helpers/fixtures';
import { freshServerDatabase, TEST_DATABASE_URL } from '../helpers/test-db';
import { runScript } from './run-script';

// Each step starts a child process (as `npm run db:…` does), which is slow on a busy 2-core machine.

const work = fs.mkdtempSync(path.join(os.tmpdir(), 'stickerline-backup-'));
afterAll(() => fs.rmSync(work, { recursive: true, force: true }));

const codesIn = async (db: Awaited<ReturnType<typeof openDatabase>>['db']) =>
  (await db.select({ code: slabs.code }).from(slabs)).map((r) => r.code).sort();

describe('backup and restore on PGlite (npm run db:backup / db:restore)', () => {
  const env = { DATA_DIR: path.join(work, 'data'), UPLOADS_DIR: path.join(work, 'uploads') };
  const dataDir = path.join(env.DATA_DIR, 'pglite');
  const file = path.join(work, 'backups', 'yard.tar.gz');
  fs.mkdirSync(env.DATA_DIR, { recursive: true });

  it('round-trips: rows written after the backup are gone, rows before it are back, the old dir is kept', async () => {
    const first = await openDatabase({ dataDir });
    await migrateDatabase(first);
    const log = await logRow(first.db, 'black-walnut');
    const before = await slabRow(first.db, log);
    await first.close();

    const backedUp = runScript('scripts/backup.ts', [file], env);
    expect(backedUp.code, backedUp.stderr).toBe(0);
    expect(fs.statSync(file).size).toBeGreaterThan(1000);

    const second = await openDatabase({ dataDir });
    const after = await slabRow(second.db, log);
    await second.close();

    const refused = runScript('scripts/restore.ts', [file], env);
    expect(refused.code).toBe(1);
    expect(refused.stderr).toMatch(/--force/);

    const restored = runScript('scripts/restore.ts', [file, '--force'], env);
    expect(restored.code, restored.stderr).toBe(0);
    const kept = fs.readdirSync(env.DATA_DIR).filter((n) => n.startsWith('pglite.before-restore-'));
    expect(kept).toHaveLength(1);

    const back = await openDatabase({ dataDir });
    expect(await codesIn(back.db)).toEqual([before.code]);
    await back.close();
    const old = await openDatabase({ dataDir: path.join(env.DATA_DIR, kept[0]) });
    expect(await codesIn(old.db)).toEqual([before.code, after.code].sort());
    await old.close();
  }, 240_000);

  it('refuses at once to back up a database another process holds open, naming that process', async () => {
    const open = await openDatabase({ dataDir });
    const res = runScript('scripts/backup.ts', [path.join(work, 'while-open.tar.gz')], env);
    await open.close();
    expect(res.code).toBe(1);
    expect(res.stderr).toMatch(new RegExp(`already running on the database folder.*process ${process.pid}.*kill ${process.pid}`, 's'));
    expect(fs.existsSync(path.join(work, 'while-open.tar.gz'))).toBe(false);
  }, 120_000);
});

describe.skipIf(!TEST_DATABASE_URL)('backup and restore on a PostgreSQL server (pg_dump / pg_restore)', () => {
  it('restores into an empty database, then refuses to overwrite it without --force', async () => {
    const source = await freshServerDatabase();
    const target = await freshServerDatabase({ migrate: false });
    try {
      const log = await logRow(source.db, 'white-oak');
      const slab = await slabRow(source.db, log);
      const file = path.join(work, 'server.dump');

      expect(runScript('scripts/backup.ts', [file], { DATABASE_URL: source.url }).code).toBe(0);
      const restored = runScript('scripts/restore.ts', [file], { DATABASE_URL: target.url });
      expect(restored.code, restored.stderr).toBe(0);
      expect(await codesIn(target.db)).toEqual([slab.code]);

      const again = runScript('scripts/restore.ts', [file], { DATABASE_URL: target.url });
      expect(again.code).toBe(1);
      expect(again.stderr).toMatch(/--force/);
    } finally {
      await source.close();
      await target.close();
    }
  }, 240_000);
});
