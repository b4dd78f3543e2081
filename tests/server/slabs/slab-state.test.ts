import fs from 'node:fs';
import path from 'node:path';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Database } from '../../../server/db/client';
import { slabs } from '../../../server/db/schema/index';
import { moveEverySlab, moveSlabs, startingStatus } from '../../../server/modules/slabs/slab-state';
import { AppError } from '../../../server/lib/errors';
import { mayMoveSlab, SLAB_MOVE_CAUSES, SLAB_MOVES, SLAB_TRANSITIONS, canStaffMove } from '../../../shared/slab-input';
import { SLAB_STATUSES, type SlabStatus } from '../../../shared/slabs';
import { freshDatabase } from '../../helpers/test-db';
import { logRow, slabRow } from '../../helpers/fixtures';

let database: Database;
beforeAll(async () => { database = await freshDatabase(); });
afterAll(async () => { await database.close(); });

const statusOf = async (id: number) => (await database.db.select({ s: slabs.status }).from(slabs).where(eq(slabs.id, id)))[0].s;

describe('the one table of slab moves', () => {
  it('lets each cause make exactly the moves the table names, and no other', async () => {
    const log = await logRow(database.db, 'black-walnut');
    for (const from of SLAB_STATUSES) {
      for (const to of SLAB_STATUSES) {
        if (from === to) continue;
        for (const cause of SLAB_MOVE_CAUSES) {
          const slab = await slabRow(database.db, log, { status: from, mc: null, photo: false });
          const moved = await moveSlabs(database.db, [slab.id], to, cause);
          const allowed = SLAB_MOVES[from][to]?.includes(cause) ?? false;
          expect(moved.map((m) => m.id), `${from} → ${to} by ${cause}`).toEqual(allowed ? [slab.id] : []);
          expect(await statusOf(slab.id)).toBe(allowed ? to : from);
        }
      }
    }
  }, 120_000);

  it('keeps the yard to drying, ready, listed and withdrawn, and sends sold slabs only to pickup or a refund', () => {
    expect(canStaffMove('listed', 'held')).toBe(false);
    expect(canStaffMove('held', 'sold')).toBe(false);
    expect(canStaffMove('ready', 'listed')).toBe(true);
    expect(mayMoveSlab('listed', 'sold', 'sale')).toBe(false); // a sale needs a hold first
    expect([...SLAB_TRANSITIONS.sold].sort()).toEqual(['listed', 'picked-up', 'withdrawn']);
    expect(SLAB_TRANSITIONS['picked-up']).not.toContain('sold');
  });

  it('moves a slab once when two requests race for it: the second finds it already moved', async () => {
    const log = await logRow(database.db, 'white-oak');
    const slab = await slabRow(database.db, log, { status: 'listed' });
    const [a, b] = await Promise.all([
      database.db.transaction((tx) => moveSlabs(tx, [slab.id], 'held', 'hold')),
      database.db.transaction((tx) => moveSlabs(tx, [slab.id], 'held', 'hold')),
    ]);
    expect(a.length + b.length).toBe(1);
  });

  it('refuses with 409 and names the slab when not every slab can make the move', async () => {
    const log = await logRow(database.db, 'black-cherry');
    const sold = await slabRow(database.db, log, { status: 'sold' });
    const listed = await slabRow(database.db, log, { status: 'listed' });
    const err = await moveEverySlab(database.db, [sold.id, listed.id], 'picked-up', 'pickup').catch((e) => e);
    expect(err).toBeInstanceOf(AppError);
    expect(err.status).toBe(409);
    expect(err.message).toContain(listed.code);
    expect(err.message).not.toContain(sold.code);
  });

  it('starts a new slab drying or ready, never anywhere else', () => {
    expect(startingStatus()).toBe('drying');
    expect(startingStatus('ready')).toBe('ready');
    expect(() => startingStatus('sold' as SlabStatus)).toThrow(/drying or ready/);
  });
});

describe('slab-state.ts is the only writer of slabs.status', () => {
  const serverDir = path.resolve(import.meta.dirname, '../../../server');
  const files = (dir: string): string[] => fs.readdirSync(dir, { withFileTypes: true })
    .flatMap((e) => (e.isDirectory() ? files(path.join(dir, e.name)) : e.name.endsWith('.ts') ? [path.join(dir, e.name)] : []));

  it('finds no other update of a slab that sets its status', () => {
    const writers = files(serverDir).filter((f) => {
      const text = fs.readFileSync(f, 'utf8');
      return /update\(slabs\)\s*\.set\(\{[^}]*\bstatus\b/.test(text) || /update\s+"?slabs"?\s+set\s+[^;]*\bstatus\b/i.test(text);
    }).map((f) => path.relative(serverDir, f));
    expect(writers).toEqual(['modules/slabs/slab-state.ts']);
  });

  it('creates slabs only through the yard (starting status checked) and the demo seed', () => {
    const inserters = files(serverDir).filter((f) => /insert\(slabs\)/.test(fs.readFileSync(f, 'utf8'))).map((f) => path.relative(serverDir, f)).sort();
    expect(inserters).toEqual(['modules/slabs/yard-slabs.repo.ts', 'seed/seed-demo.ts']);
    expect(fs.readFileSync(path.join(serverDir, 'modules/slabs/yard-slabs.service.ts'), 'utf8')).toMatch(/status: startingStatus\(/);
  });
});
