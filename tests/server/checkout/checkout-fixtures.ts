import Stripe from 'stripe';
import { inject } from 'vitest';
import { eq } from 'drizzle-orm';
import type { Db } from '../../../server/db/client';
import { millSettings, orders, pickupWindows } from '../../../server/db/schema/index';
import { TEST_ORIGIN, type TestApp } from '../../helpers/test-app';

export const YARD_ADDRESS = '7 Fernlow Lane, Brackwater, Tessel County';

/** The mill's settings row, as the demo seed would write it (invented mill). */
export async function millSettingsRow(db: Db, over: Partial<typeof millSettings.$inferInsert> = {}) {
  await db.insert(millSettings).values({
    id: 1, millName: 'Brackwater Slab Yard', yardAddress: YARD_ADDRESS, contactEmail: 'yard@brackwater.test',
    holdHours: 48, minimumChargeCents: 2500, flatteningCentsPerSqFt: 800, ...over,
  }).onConflictDoNothing();
}

export const isoDay = (d: Date) => d.toISOString().slice(0, 10);
export const daysFromNow = (n: number) => isoDay(new Date(Date.now() + n * 86_400_000));
export const weekdayOf = (day: string) => new Date(`${day}T00:00:00Z`).getUTCDay();

/** A weekly window on the weekday of `day` (default: three days ahead, so it is never in the past). */
export async function windowFor(db: Db, day = daysFromNow(3), capacity = 3, times = { startsAt: '09:00', endsAt: '12:00' }) {
  const [row] = await db.insert(pickupWindows).values({ weekday: weekdayOf(day), ...times, capacity }).returning();
  return { window: row, day };
}

let keyCounter = 0;
export const newKey = () => `test-key-${Date.now()}-${++keyCounter}`;

type Agent = Awaited<ReturnType<TestApp['signedInAs']>>['agent'];

export function hold(agent: Agent, slabId: number) {
  return agent.post(`/api/slabs/${slabId}/hold`).set('Origin', TEST_ORIGIN);
}

export function pay(agent: Agent, body: Record<string, unknown>, key = newKey()) {
  return agent.post('/api/checkout').set('Origin', TEST_ORIGIN).set('Idempotency-Key', key).send({ cardToken: 'tok_visa', ...body });
}

/** Reads the payment fake directly, to count real charges. */
export function fakeProvider() {
  return new Stripe('sk_test_local_fake', { host: '127.0.0.1', port: inject('stripePort'), protocol: 'http', maxNetworkRetries: 0 });
}

/**
 * Charges the fake holds for any of these checkout keys. Keys, unlike order codes, are unique
 * across the whole test run (every test file shares one payment fake but has its own database).
 */
export async function chargesForKeys(keys: string[]) {
  const list = await fakeProvider().charges.list({ limit: 100 });
  return list.data.filter((c) => keys.includes(c.metadata?.checkoutKey ?? ''));
}

/** Charges the fake holds for one order of this test's database. */
export async function chargesForOrder(db: Db, orderId: number) {
  const [order] = await db.select().from(orders).where(eq(orders.id, orderId));
  return chargesForKeys([order.idempotencyKey]);
}
