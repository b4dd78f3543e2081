import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { count, eq, inArray } from 'drizzle-orm';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { migrateDatabase, openDatabase, type Database } from '../../../server/db/client';
import { logs, moistureReadings, slabPhotos, slabs, species, user } from '../../../server/db/schema/index';
import { createAuth } from '../../../server/lib/auth';
import { loadPricingRules } from '../../../server/modules/pricing/pricing.service';
import { DEMO_ACCOUNTS } from '../../../server/seed/demo-data';
import { seedDemo } from '../../../server/seed/seed-demo';
import { averageWidthIn, boardFeet, slabPriceBreakdown } from '../../../shared/wood/index';

const DAY_MS = 86_400_000;

describe('seedDemo', () => {
  let database: Database;
  let uploadsDir: string;
  let auth: ReturnType<typeof createAuth>;
  let first: { seeded: boolean };
  const messages: string[] = [];

  beforeAll(async () => {
    database = await openDatabase({});
    await migrateDatabase(database);
    auth = createAuth({
      db: database.db, secret: 'x'.repeat(32), baseURL: 'http://localhost:3000',
      mailer: { send: async () => {}, verify: async () => {}, close() {} },
    });
    uploadsDir = join(mkdtempSync(join(tmpdir(), 'stickerline-seed-')), 'uploads');
    first = await seedDemo({ db: database.db, auth, uploadsDir, log: (m) => messages.push(m) });
  }, 120_000);

  afterAll(async () => {
    await database?.close();
    if (uploadsDir) rmSync(join(uploadsDir, '..'), { recursive: true, force: true });
  });

  it('fills an empty database and logs one summary line', async () => {
    expect(first).toEqual({ seeded: true });
    expect(messages).toHaveLength(1);
    expect(messages[0]).toMatch(/\d+ slabs/);
    const db = database.db;
    const [{ n: slabCount }] = await db.select({ n: count() }).from(slabs);
    const [{ n: logCount }] = await db.select({ n: count() }).from(logs);
    expect(slabCount).toBeGreaterThanOrEqual(60);
    expect(logCount).toBeGreaterThanOrEqual(12);
    const used = await db.selectDistinct({ id: slabs.speciesId }).from(slabs);
    expect(used.length).toBeGreaterThanOrEqual(8);
  });

  it('gives every slab readings and an illustration WebP on disk', async () => {
    const db = database.db;
    const all = await db.select({ id: slabs.id, code: slabs.code }).from(slabs);
    const readingCounts = await db.select({ slabId: moistureReadings.slabId, n: count() })
      .from(moistureReadings).groupBy(moistureReadings.slabId);
    const readingsBySlab = new Map(readingCounts.map((r) => [r.slabId, r.n]));
    const photos = await db.select().from(slabPhotos);
    for (const slab of all) {
      expect(readingsBySlab.get(slab.id) ?? 0, slab.code).toBeGreaterThanOrEqual(1);
      const photo = photos.find((p) => p.slabId === slab.id);
      expect(photo, slab.code).toBeDefined();
      expect(photo!).toMatchObject({ isCover: true, isIllustration: true, altText: `Illustration of slab ${slab.code}` });
      for (const suffix of ['display', 'thumb']) {
        const meta = await sharp(join(uploadsDir, `${photo!.fileKey}-${suffix}.webp`)).metadata();
        expect(meta.format).toBe('webp');
        if (suffix === 'display') expect([meta.width, meta.height]).toEqual([photo!.width, photo!.height]);
      }
    }
  });

  it('stores width, board feet and price exactly as the shared wood math computes them', async () => {
    const db = database.db;
    const rules = await loadPricingRules(db);
    const rows = await db.select({ slab: slabs, rate: species.ratePerBoardFootCents })
      .from(slabs).innerJoin(species, eq(species.id, slabs.speciesId));
    for (const { slab, rate } of rows) {
      const widthIn = averageWidthIn(slab.widthsIn);
      expect(slab.widthIn).toBe(widthIn);
      expect(slab.boardFeet).toBe(boardFeet({ thicknessIn: slab.thicknessIn, widthIn, lengthIn: slab.lengthIn }));
      const price = slabPriceBreakdown({
        thicknessIn: slab.thicknessIn, widthIn, lengthIn: slab.lengthIn, ratePerBoardFootCents: rate, figures: slab.figures, rules,
      });
      expect(slab.priceCents, slab.code).toBe(price.slabCents);
    }
  });

  it('keeps listed slabs freshly measured and sequences gap-free', async () => {
    const db = database.db;
    const listed = await db.select({ id: slabs.id, code: slabs.code, listedAt: slabs.listedAt })
      .from(slabs).where(eq(slabs.status, 'listed'));
    expect(listed.length).toBeGreaterThan(30);
    const readings = await db.select().from(moistureReadings).where(inArray(moistureReadings.slabId, listed.map((s) => s.id)));
    for (const slab of listed) {
      expect(slab.listedAt, slab.code).not.toBeNull();
      const latest = readings.filter((r) => r.slabId === slab.id).map((r) => Date.parse(`${r.measuredOn}T00:00:00Z`));
      expect(Date.now() - Math.max(...latest), slab.code).toBeLessThanOrEqual(30 * DAY_MS);
    }
    const statuses = new Set((await db.select({ s: slabs.status }).from(slabs)).map((r) => r.s));
    expect([...statuses].every((s) => ['listed', 'drying', 'ready', 'withdrawn'].includes(s))).toBe(true);

    const seqs = await db.select({ logId: slabs.logId, seq: slabs.sequenceInLog }).from(slabs);
    const byLog = new Map<number, number[]>();
    for (const r of seqs) byLog.set(r.logId, [...(byLog.get(r.logId) ?? []), r.seq]);
    for (const list of byLog.values()) {
      expect(list.sort((a, b) => a - b)).toEqual(list.map((_, i) => i + 1));
    }
  });

  it('creates the demo accounts with their roles', async () => {
    const rows = await database.db.select({ email: user.email, role: user.role }).from(user);
    for (const account of DEMO_ACCOUNTS) {
      expect(account.password.length).toBeGreaterThanOrEqual(10);
      expect(rows.find((r) => r.email === account.email)?.role, account.email).toBe(account.role);
    }
    expect(DEMO_ACCOUNTS.map((a) => a.role).sort()).toEqual(['admin', 'buyer', 'buyer', 'seller']);
    const signIn = await auth.api.signInEmail({ body: { email: DEMO_ACCOUNTS[0].email, password: DEMO_ACCOUNTS[0].password } });
    expect(signIn.user.email).toBe(DEMO_ACCOUNTS[0].email);
  });

  it('does nothing on a second run', async () => {
    const db = database.db;
    const before = await Promise.all([slabs, logs, moistureReadings, slabPhotos, user].map(async (t) => (await db.select({ n: count() }).from(t))[0].n));
    const again = await seedDemo({ db, auth, uploadsDir });
    expect(again).toEqual({ seeded: false });
    const after = await Promise.all([slabs, logs, moistureReadings, slabPhotos, user].map(async (t) => (await db.select({ n: count() }).from(t))[0].n));
    expect(after).toEqual(before);
  });
});
