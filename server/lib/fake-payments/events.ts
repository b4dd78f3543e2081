import Stripe from 'stripe';
import { fakeId, nowSeconds } from './store';

export type WebhookEndpoint = { url: string; secret: string };

const signer = new Stripe('sk_test_local_fake_signer');

/**
 * Posts one signed event to every registered shop endpoint, the way the provider does: JSON body,
 * `Stripe-Signature` header made with the SDK's test-header helper. A shop that is down is logged, not retried.
 */
export async function deliverEvent(endpoints: Iterable<WebhookEndpoint>, type: string, object: unknown) {
  const event = {
    id: fakeId('evt'), object: 'event', api_version: null, created: nowSeconds(), livemode: false,
    pending_webhooks: 1, request: { id: null, idempotency_key: null }, type, data: { object },
  };
  const payload = JSON.stringify(event);
  const results = await Promise.all([...endpoints].map(async ({ url, secret }) => {
    const header = signer.webhooks.generateTestHeaderString({ payload, secret });
    try {
      const res = await fetch(url, { method: 'POST', headers: { 'Content-Type': 'application/json', 'Stripe-Signature': header }, body: payload });
      if (!res.ok) console.warn(`[payment fake] ${url} answered ${res.status} to ${type}`);
      return res.ok;
    } catch (err) {
      console.warn(`[payment fake] could not deliver ${type} to ${url}: ${(err as Error).message}`);
      return false;
    }
  }));
  return { eventId: event.id, delivered: results.filter(Boolean).length };
}
