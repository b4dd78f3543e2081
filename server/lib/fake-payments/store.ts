import crypto from 'node:crypto';

/** A checkout session as the provider's API describes it (only the fields Stickerline and its tests read). */
export type FakeSession = {
  id: string;
  object: 'checkout.session';
  mode: 'payment';
  status: 'open' | 'complete' | 'expired';
  payment_status: 'paid' | 'unpaid';
  amount_subtotal: number;
  amount_total: number;
  currency: string;
  created: number;
  expires_at: number;
  success_url: string;
  cancel_url: string;
  customer_email: string | null;
  client_reference_id: string | null;
  metadata: Record<string, string>;
  payment_intent: string | null;
  url: string | null;
  livemode: false;
  line_items: { name: string; amount: number; quantity: number }[];
  /** Fake-only: a completed event the developer chose to hold back. */
  heldEvent: boolean;
};

export type FakeIntent = {
  id: string; object: 'payment_intent'; amount: number; currency: string; status: 'succeeded';
  latest_charge: string; metadata: Record<string, string>; created: number;
};

export const fakeId = (prefix: string) => `${prefix}_test_${crypto.randomBytes(12).toString('hex')}`;
export const nowSeconds = () => Math.floor(Date.now() / 1000);

/** In-memory records of the fake: sessions, payment intents, and idempotency keys of session creation. */
export function createFakeStore() {
  const sessions = new Map<string, FakeSession>();
  const intents = new Map<string, FakeIntent>();
  const byKey = new Map<string, string>();
  return { sessions, intents, byKey };
}
export type FakeStore = ReturnType<typeof createFakeStore>;

/** The session as the API shows it; the payment intent is embedded when the caller asks to expand it. */
export function sessionJson(store: FakeStore, s: FakeSession, expand: string[] = []) {
  const { line_items: _lines, heldEvent: _held, ...rest } = s;
  const intent = expand.includes('payment_intent') && s.payment_intent ? store.intents.get(s.payment_intent) ?? s.payment_intent : s.payment_intent;
  return { ...rest, url: s.status === 'open' ? s.url : null, payment_intent: intent };
}
