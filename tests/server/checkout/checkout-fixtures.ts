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

/** Starts a card checkout: the answer carries the attempt's id and its payment page. */
export function startCheckout(agent: Agent, body: Record<string, unknown>, key = newKey()) {
  return agent.post('/api/checkout').set('Origin', TEST_ORIGIN).set('Idempotency-Key', key).send({ paymentMethod: 'card', ...body });
}

/** What the developer picks on the fake's local test payment page; answers the page's response (a 303 back to the shop, or the page). */
export async function onPaymentPage(paymentUrl: string, outcome: 'succeed' | 'decline' | 'abandon' | 'release' | 'return', event: 'now' | 'hold' = 'now') {
  const res = await fetch(paymentUrl, { method: 'POST', redirect: 'manual', body: new URLSearchParams({ outcome, event }) });
  return { status: res.status, location: res.headers.get('location'), html: await res.text() };
}

/** The buyer's browser lands back on the shop and the order page asks the server to check (or cancel) the payment. */
export function backFromPaymentPage(agent: Agent, orderId: number, what: 'check' | 'cancel' = 'check') {
  return agent.post(`/api/orders/${orderId}/payment-${what}`).set('Origin', TEST_ORIGIN).send({});
}

/**
 * The whole happy path as a buyer does it: start the checkout, succeed on the test payment page,
 * come back. Answers like the checkout did, with the order as it stands after the return.
 */
export async function pay(agent: Agent, body: Record<string, unknown>, key = newKey()) {
  const started = await startCheckout(agent, body, key);
  if (started.status >= 300 || !started.body.paymentUrl) return started;
  await onPaymentPage(started.body.paymentUrl, 'succeed');
  const back = await backFromPaymentPage(agent, started.body.orderId);
  return { status: started.status, body: { ...started.body, order: back.body.order } };
}

/** Makes the fake post its signed events to this test's app (listening on a loopback port); call the returned stop() after. */
export async function receiveProviderEvents(app: import('express').Express, secret: string) {
  const server = await new Promise<import('node:http').Server>((resolve) => { const s = app.listen(0, '127.0.0.1', () => resolve(s)); });
  const url = `http://127.0.0.1:${(server.address() as import('node:net').AddressInfo).port}/api/webhooks/payments`;
  const fake = `http://127.0.0.1:${inject('stripePort')}/_local/webhook-endpoints`;
  await fetch(fake, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ url, secret }) });
  return {
    url,
    async stop() {
      await fetch(fake, { method: 'DELETE', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ url }) });
      server.closeAllConnections();
      await new Promise((r) => server.close(() => r(null)));
    },
  };
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
