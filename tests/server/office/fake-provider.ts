import Stripe from 'stripe';
import { inject } from 'vitest';

/** Reads the payment fake directly, to check what really happened there (not through the app). */
export function fakeProvider() {
  return new Stripe('sk_test_local_fake', { host: '127.0.0.1', port: inject('stripePort'), protocol: 'http', maxNetworkRetries: 0 });
}

export async function amountRefundedOnFake(chargeId: string) {
  const charge = await fakeProvider().charges.retrieve(chargeId);
  return charge.amount_refunded;
}

/** A real charge on the payment fake (as a completed payment page leaves one), for tests that refund it. */
export async function chargeOnFake(amountCents: number, idempotencyKey: string) {
  const c = await fakeProvider().charges.create({ amount: amountCents, currency: 'usd', source: 'tok_visa', description: 'test order' }, { idempotencyKey });
  return { chargeId: c.id };
}
