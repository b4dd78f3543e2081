import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { createTestApp, type TestApp } from '../../helpers/test-app';
import { logRow, slabRow } from '../../helpers/fixtures';
import { orderLines, payments, refundLines } from '../../../server/db/schema/index';
import { paidOrderRow } from './order-fixtures';
import type { MillNumbers } from '../../../shared/office';

let t: TestApp;

beforeAll(async () => { t = await createTestApp(); });
afterAll(() => t.close());

describe('GET /api/office/numbers', () => {
  it('sums board feet and revenue per month and species from sold lines of paid orders, leaving refunded lines out', async () => {
    const admin = await t.signedInAs('admin');
    const buyer = await t.signedInAs('buyer');
    const walnutLog = await logRow(t.db, 'black-walnut', { milledOn: '2024-01-01' });
    const oakLog = await logRow(t.db, 'white-oak', { milledOn: '2024-03-01' });
    const w1 = await slabRow(t.db, walnutLog, { thicknessIn: 2, widthsIn: [18], lengthIn: 72 }); // 18 bf
    const w2 = await slabRow(t.db, walnutLog, { thicknessIn: 2, widthsIn: [24], lengthIn: 72 }); // 24 bf
    const o1 = await slabRow(t.db, oakLog, { thicknessIn: 3, widthsIn: [20], lengthIn: 96 }); // 40 bf
    const refunded = await slabRow(t.db, oakLog, { thicknessIn: 2, widthsIn: [12], lengthIn: 72 });
    await slabRow(t.db, oakLog, { status: 'drying' });
    await slabRow(t.db, oakLog, { status: 'held' });
    await paidOrderRow(t.db, buyer.id, [w1, o1], { paidAt: new Date('2024-05-10T15:00:00Z') });
    const june = await paidOrderRow(t.db, buyer.id, [w2, refunded], { paidAt: new Date('2024-06-02T10:00:00Z') });
    // The oak slab of June came back: its line is refunded and the refund's money is recorded against it.
    const [line] = await t.db.update(orderLines).set({ status: 'refunded' }).where(eq(orderLines.slabId, refunded.id)).returning();
    const [refundRow] = await t.db.insert(payments).values({ orderId: june.id, kind: 'refund', amountCents: refunded.priceCents, status: 'succeeded' }).returning();
    await t.db.insert(refundLines).values({ paymentId: refundRow.id, orderLineId: line.id, woodCents: refunded.priceCents, servicesCents: 0, taxCents: 0 });
    // An unpaid order must not count.
    const unpaidSlab = await slabRow(t.db, walnutLog);
    await paidOrderRow(t.db, buyer.id, [unpaidSlab], { status: 'pending-payment', paidAt: null });

    const res = await admin.agent.get('/api/office/numbers');
    expect(res.status).toBe(200);
    const sales = res.body.sales as MillNumbers['sales'];
    expect(sales.map((s) => [s.month, s.speciesName, s.boardFeet, s.slabs])).toEqual([
      ['2024-05', 'Black walnut', 18, 1], ['2024-05', 'White oak', 40, 1], ['2024-06', 'Black walnut', 24, 1], ['2024-06', 'White oak', 0, 0],
    ]);
    expect(sales[0].revenueCents).toBe(w1.priceCents);
    // The refunded slab was sold and paid for, then refunded in full: it nets to nothing in its sale's month.
    expect(sales[3]).toMatchObject({ woodCents: refunded.priceCents, refundedWoodCents: refunded.priceCents, revenueCents: 0 });
    expect(june.id).toBeGreaterThan(0);

    const counts = Object.fromEntries((res.body.statusCounts as Array<{ status: string; count: number }>).map((c) => [c.status, c.count]));
    expect(counts).toMatchObject({ drying: 1, held: 1, sold: 5 });

    // Milled 2024-01-01 → paid 2024-05-10: 130 days; oak 2024-03-01 → 05-10: 70; walnut → 06-02: 153. Mean 117.7
    expect(res.body.averageDaysMilledToSold).toBe(117.7);
    expect(res.body.soldSlabsWithMillDate).toBe(3);
  });

  it('lists drying stock with its expected air-dry date and range, soonest first', async () => {
    const admin = await t.signedInAs('admin');
    // Milled 2024-03-01, no readings: one year per inch (common practice) → 1 in: 2025-03-01 (range 2024-09-01 – 2025-09-01);
    // 2 in: 2026-03-01. The drying slab from the first test has one reading today (9 %): already air-dry.
    const log = await logRow(t.db, 'sugar-maple', { milledOn: '2024-03-01' });
    const thick = await slabRow(t.db, log, { status: 'drying', thicknessIn: 2, mc: null });
    const thin = await slabRow(t.db, log, { status: 'drying', thicknessIn: 1, mc: null });
    const res = await admin.agent.get('/api/office/numbers');
    const stock = res.body.dryingStock as Array<{ id: number; expectedOn: string; earliestOn: string; latestOn: string; basis: string }>;
    const mine = stock.filter((d) => d.id === thick.id || d.id === thin.id);
    expect(mine.map((d) => d.id)).toEqual([thin.id, thick.id]);
    expect(mine[0]).toMatchObject({ expectedOn: '2025-03-01', earliestOn: '2024-09-01', latestOn: '2025-09-01', basis: 'rule-of-thumb' });
    const dates = stock.map((d) => d.expectedOn).filter(Boolean);
    expect(dates).toEqual([...dates].sort());
  });
});
