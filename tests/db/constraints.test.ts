import { sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Database } from '../../server/db/client';
import { emailOutbox, holds, logs, moistureReadings, orderLines, orders, payments, pickupWindows, slabs, species, user } from '../../server/db/schema/index';
import { MAX_STORED_MC_PERCENT } from '../../server/db/schema/checks';
import { maxMoistureContentPercent } from '../../shared/wood/index';
import { logRow, slabRow } from '../helpers/fixtures';
import { databaseKinds } from '../helpers/test-db';

/** The database, not only the code, refuses rows no mill could have. Each insert here bypasses the server. */
async function refusedBy(constraint: string, write: () => Promise<unknown>) {
  const err = await write().then(() => null, (e: { message?: string; cause?: { message?: string } }) => e);
  expect(err, `${constraint} let the row in`).not.toBeNull();
  expect(`${err!.cause?.message ?? ''} ${err!.message ?? ''}`).toContain(constraint);
}

describe.each(databaseKinds())('CHECK constraints on $kind', ({ open }) => {
  let database: Database;
  let db: Database['db'];
  let log: typeof logs.$inferSelect;
  let slab: typeof slabs.$inferSelect;
  let buyerId: string;
  let orderId: number;

  beforeAll(async () => {
    database = await open();
    db = database.db;
    log = await logRow(db, 'black-walnut');
    slab = await slabRow(db, log);
    buyerId = 'buyer-constraints';
    await db.insert(user).values({ id: buyerId, name: 'Tamsin Orrey', email: 'tamsin@example.test' });
    const [order] = await db.insert(orders).values({
      code: 'SL-CHK-1', buyerId, status: 'paid', slabsCents: 50_000, servicesCents: 0, totalCents: 50_000,
      totalWeightLb: 80, longestSlabIn: 96, idempotencyKey: 'constraints-1',
    }).returning();
    orderId = order.id;
  });
  afterAll(async () => { await database?.close(); });

  const slabValues = (over: Partial<typeof slabs.$inferInsert>) => ({
    code: `X-${Math.random().toString(36).slice(2, 8)}`, logId: log.id, speciesId: log.speciesId, sequenceInLog: 50 + Math.floor(Math.random() * 900),
    thicknessIn: 2, widthsIn: [20, 22], widthIn: 21, lengthIn: 96, boardFeet: 28, priceCents: 40_000,
    dryingState: 'air-dry', status: 'listed', ...over,
  });

  it('accepts a row that makes sense (the control)', async () => {
    await db.insert(slabs).values(slabValues({}));
  });

  it('refuses a slab status, drying state or live edge nobody defined', async () => {
    await refusedBy('slabs_status_known', () => db.insert(slabs).values(slabValues({ status: 'lost' })));
    await refusedBy('slabs_drying_state_known', () => db.insert(slabs).values(slabValues({ dryingState: 'soggy' })));
    await refusedBy('slabs_live_edge_known', () => db.insert(slabs).values(slabValues({ liveEdge: 'three' })));
    await refusedBy('slabs_status_known', () => db.update(slabs).set({ status: 'SOLD' }).where(sql`${slabs.id} = ${slab.id}`));
  });

  it('refuses slab measurements and prices no slab can have', async () => {
    await refusedBy('slabs_thickness_in_range', () => db.insert(slabs).values(slabValues({ thicknessIn: 0 })));
    await refusedBy('slabs_width_in_range', () => db.insert(slabs).values(slabValues({ widthIn: -3 })));
    await refusedBy('slabs_widths_measured', () => db.insert(slabs).values(slabValues({ widthsIn: [] })));
    await refusedBy('slabs_length_in_range', () => db.insert(slabs).values(slabValues({ lengthIn: 5000 })));
    await refusedBy('slabs_board_feet_in_range', () => db.insert(slabs).values(slabValues({ boardFeet: 0 })));
    await refusedBy('slabs_price_in_range', () => db.insert(slabs).values(slabValues({ priceCents: -1 })));
    await refusedBy('slabs_price_override_in_range', () => db.insert(slabs).values(slabValues({ priceOverrideCents: 0 })));
  });

  it('refuses a 0 % moisture reading and one wetter than wood can be', async () => {
    // Wood Handbook FPL-GTR-190 ch. 4, maximum moisture content: M_max = 100 (1.54 − G_b) / (1.54 G_b);
    // the stored ceiling is M_max at basic specific gravity 0.25, lighter than any species the mill saws.
    expect(MAX_STORED_MC_PERCENT).toBe(Math.ceil(maxMoistureContentPercent(0.25)));
    expect(MAX_STORED_MC_PERCENT).toBeGreaterThan(maxMoistureContentPercent(0.34)); // eastern white pine, basic SG 0.34 (from memory)
    const reading = (mcPercent: number, over: Partial<typeof moistureReadings.$inferInsert> = {}) =>
      db.insert(moistureReadings).values({ slabId: slab.id, measuredOn: '2026-11-02', mcPercent, meterKind: 'pin', ...over });
    await reading(12);
    await refusedBy('moisture_mc_in_range', () => reading(0));
    await refusedBy('moisture_mc_in_range', () => reading(-4));
    await refusedBy('moisture_mc_in_range', () => reading(MAX_STORED_MC_PERCENT + 1));
    await refusedBy('moisture_meter_known', () => reading(12, { meterKind: 'guess' }));
    await refusedBy('moisture_ambient_rh_in_range', () => reading(12, { ambientRhPercent: 120 }));
  });

  it('refuses hold, order, line, payment, role, pickup and mail states nobody defined', async () => {
    const later = new Date(Date.now() + 3_600_000);
    await refusedBy('holds_status_known', () => db.insert(holds).values({ slabId: slab.id, buyerId, status: 'paused', expiresAt: later, closedAt: new Date() }));
    await refusedBy('holds_closed_when_ended', () => db.insert(holds).values({ slabId: slab.id, buyerId, status: 'released', expiresAt: later }));
    await refusedBy('orders_status_known', () => db.insert(orders).values({
      code: 'SL-CHK-2', buyerId, status: 'shipped', slabsCents: 100, servicesCents: 0, totalCents: 100, totalWeightLb: 10, longestSlabIn: 40, idempotencyKey: 'constraints-2',
    }));
    await refusedBy('orders_total_adds_up', () => db.insert(orders).values({
      code: 'SL-CHK-3', buyerId, status: 'paid', slabsCents: 100, servicesCents: 50, totalCents: 100, totalWeightLb: 10, longestSlabIn: 40, idempotencyKey: 'constraints-3',
    }));
    await refusedBy('orders_refunded_within_total', () => db.update(orders).set({ refundedCents: 60_000 }).where(sql`${orders.id} = ${orderId}`));
    await refusedBy('order_lines_status_known', () => db.insert(orderLines).values({
      orderId, slabId: slab.id, status: 'gift', slabCode: slab.code, speciesName: 'Black walnut', boardFeet: 10, weightLb: 40, lengthIn: 96,
      priceBreakdown: {}, slabCents: 100, servicesCents: 0, totalCents: 100,
    }));
    await refusedBy('payments_kind_known', () => db.insert(payments).values({ orderId, kind: 'tip', amountCents: 100, status: 'succeeded' }));
    await refusedBy('payments_amount_in_range', () => db.insert(payments).values({ orderId, kind: 'refund', amountCents: -100, status: 'succeeded' }));
    await refusedBy('user_role_known', () => db.insert(user).values({ id: 'owner-1', name: 'Odile Brack', email: 'odile@example.test', role: 'owner' }));
    await refusedBy('pickup_windows_weekday_known', () => db.insert(pickupWindows).values({ weekday: 7, startsAt: '09:00', endsAt: '12:00', capacity: 4 }));
    await refusedBy('pickup_windows_end_after_start', () => db.insert(pickupWindows).values({ weekday: 2, startsAt: '14:00', endsAt: '09:00', capacity: 4 }));
    await refusedBy('email_outbox_status_known', () => db.insert(emailOutbox).values({ toAddress: 'a@example.test', subject: 's', html: 'h', text: 't', kind: 'k', status: 'bounced' }));
  });

  it('refuses a log milled before it was felled, or wider at the top than at the butt', async () => {
    const [sp] = await db.select().from(species).limit(1);
    const base = { speciesId: sp.id, lengthIn: 120, buttDiameterIn: 30, topDiameterIn: 26, sawingMethod: 'flatsawn' };
    await refusedBy('logs_milled_after_felled', () => db.insert(logs).values({ ...base, code: 'CHK-1', felledOn: '2026-05-01', milledOn: '2026-04-01' }));
    await refusedBy('logs_top_not_wider_than_butt', () => db.insert(logs).values({ ...base, code: 'CHK-2', topDiameterIn: 31 }));
    await refusedBy('logs_sawing_method_known', () => db.insert(logs).values({ ...base, code: 'CHK-3', sawingMethod: 'chopped' }));
    await refusedBy('logs_felled_on_sane', () => db.insert(logs).values({ ...base, code: 'CHK-4', felledOn: '0202-05-01' }));
  });
});
