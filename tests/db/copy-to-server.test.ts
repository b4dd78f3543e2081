import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import type { Database } from '../../server/db/client';
import { copyDatabase } from '../../server/db/copy-to-server';
import { logs, moistureReadings, slabs } from '../../server/db/schema/index';
import { logRow, slabRow } from '../helpers/fixtures';
import { freshDatabase, freshServerDatabase, TEST_DATABASE_URL } from '../helpers/test-db';

// The target is a real PostgreSQL server when TEST_DATABASE_URL is set (CI), else a second PGlite.
describe(`copying a PGlite shop into an empty ${TEST_DATABASE_URL ? 'PostgreSQL server' : 'PGlite'} database`, () => {
  let source: Database;
  let target: Database;
  beforeAll(async () => {
    source = await freshDatabase();
    target = TEST_DATABASE_URL ? await freshServerDatabase() : await freshDatabase();
    const log = await logRow(source.db, 'black-walnut');
    await slabRow(source.db, log, { widthsIn: [18.5, 20.25, 22], figures: ['crotch'], defects: [{ kind: 'check', note: 'end check, 3 in' }] });
    await slabRow(source.db, log, { status: 'drying', mc: 41.5 });
  });
  afterAll(async () => {
    await source?.close();
    await target?.close();
  });

  it('moves every row with its values intact and lets new rows continue the numbering', async () => {
    const counts = await copyDatabase(source, target);
    expect(counts).toMatchObject({ species: 1, logs: 1, slabs: 2, moisture_readings: 2, slab_photos: 2 });

    const before = await source.db.select().from(slabs).orderBy(slabs.id);
    const after = await target.db.select().from(slabs).orderBy(slabs.id);
    expect(after).toEqual(before);
    const [reading] = await target.db.select().from(moistureReadings).where(eq(moistureReadings.mcPercent, 41.5));
    expect(reading.measuredOn).toBe((await source.db.select().from(moistureReadings).where(eq(moistureReadings.mcPercent, 41.5)))[0].measuredOn);

    const [{ id: lastLogId }] = await target.db.select({ id: logs.id }).from(logs);
    const next = await logRow(target.db, 'black-walnut');
    expect(next.id).toBeGreaterThan(lastLogId);
  });

  it('refuses to copy into a database that already has rows', async () => {
    await expect(copyDatabase(source, target)).rejects.toThrow(/already has rows/);
  });
});
