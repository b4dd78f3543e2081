import Stripe from 'stripe';
import { AppError } from './errors';
import { getLogger } from './logger';

export type PaymentPageLine = { name: string; amountCents: number };
export type PaymentPageInput = {
  /** One key per checkout attempt: a retried request gets the same payment page, never a second one. */
  idempotencyKey: string;
  lines: PaymentPageLine[];
  successUrl: string;
  cancelUrl: string;
  customerEmail?: string;
  /** The provider accepts 30 minutes to 24 hours from now. */
  expiresAt: Date;
  metadata: Record<string, string>;
};
/** What Stickerline needs to know about a payment page, from the provider's own record. */
export type PaymentPageState = {
  sessionId: string;
  status: 'open' | 'complete' | 'expired';
  paid: boolean;
  amountTotalCents: number;
  /** The charge behind a paid page; refunds go against it. */
  chargeId: string | null;
  metadata: Record<string, string>;
};
export type RefundInput = { chargeId: string; amountCents: number; idempotencyKey: string; reason?: 'requested_by_customer' | 'duplicate' | 'fraudulent' };
export type RefundResult = { refundId: string; amountCents: number; status: string };
/** The parts of a provider event Stickerline acts on. */
export type PaymentEvent =
  | { id: string; type: 'checkout.session.completed' | 'checkout.session.expired'; sessionId: string }
  | { id: string; type: 'charge.refunded'; chargeId: string; amountRefundedCents: number }
  | { id: string; type: 'charge.dispute.created'; chargeId: string; disputeId: string }
  | { id: string; type: 'other'; providerType: string };

/** The one money interface the app uses: hosted payment pages, refunds and signed provider events. */
export type Payments = {
  openPaymentPage(input: PaymentPageInput): Promise<{ sessionId: string; url: string }>;
  readPaymentPage(sessionId: string): Promise<PaymentPageState>;
  /** Closes an open page so it can no longer be paid; answers the page's state either way. */
  closePaymentPage(sessionId: string): Promise<PaymentPageState>;
  refund(input: RefundInput): Promise<RefundResult>;
  parseWebhook(rawBody: Buffer | string, signatureHeader: string | undefined): PaymentEvent;
  /** One cheap authenticated read, to tell that the payment service answers (readiness check). */
  ping(): Promise<void>;
};

export type PaymentsOptions = {
  secretKey: string;
  host?: string;
  port?: number;
  protocol?: 'http' | 'https';
  webhookSecret: string;
  currency?: string;
};

/** Turns provider errors into AppErrors; anything unknown stays a 502. */
function translate(err: unknown): never {
  if (err instanceof Stripe.errors.StripeError) {
    getLogger().error({ part: 'payments', type: err.type, reason: err.message }, 'the payment service answered with an error');
    throw new AppError(502, 'payment_unavailable', 'The payment service did not answer as expected. Nothing was charged; please try again.');
  }
  throw err;
}

const toSeconds = (d: Date) => Math.floor(d.getTime() / 1000);

function pageState(s: Stripe.Checkout.Session): PaymentPageState {
  const intent = s.payment_intent;
  let chargeId: string | null = null;
  if (intent && typeof intent === 'object') {
    const latest = intent.latest_charge;
    chargeId = typeof latest === 'string' ? latest : latest?.id ?? null;
  }
  return {
    sessionId: s.id, status: (s.status ?? 'open') as PaymentPageState['status'], paid: s.payment_status === 'paid',
    amountTotalCents: s.amount_total ?? 0, chargeId, metadata: (s.metadata ?? {}) as Record<string, string>,
  };
}

/**
 * Talks to the payment provider through its SDK. Given host/port/protocol it talks to the local
 * fake (development, tests); with a real key and no host it talks to the hosted service and its
 * real payment page — the code path is the same.
 */
export function createPayments({ secretKey, host, port, protocol, webhookSecret, currency = 'usd' }: PaymentsOptions): Payments {
  const stripe = new Stripe(secretKey, {
    ...(host ? { host } : {}),
    ...(port ? { port } : {}),
    ...(protocol ? { protocol } : {}),
    // Retries are ours to decide: the idempotency key makes a repeat of the same checkout safe.
    maxNetworkRetries: 0,
  });
  const read = async (sessionId: string) => pageState(await stripe.checkout.sessions.retrieve(sessionId, { expand: ['payment_intent'] }));
  return {
    async openPaymentPage({ idempotencyKey, lines, successUrl, cancelUrl, customerEmail, expiresAt, metadata }) {
      try {
        const s = await stripe.checkout.sessions.create({
          mode: 'payment',
          line_items: lines.map((l) => ({ quantity: 1, price_data: { currency, unit_amount: l.amountCents, product_data: { name: l.name } } })),
          success_url: successUrl,
          cancel_url: cancelUrl,
          ...(customerEmail ? { customer_email: customerEmail } : {}),
          expires_at: toSeconds(expiresAt),
          client_reference_id: metadata.orderId,
          metadata,
          payment_intent_data: { metadata },
        }, { idempotencyKey });
        if (!s.url) throw new AppError(502, 'payment_unavailable', 'The payment service gave no payment page. Nothing was charged; please try again.');
        return { sessionId: s.id, url: s.url };
      } catch (err) {
        return translate(err);
      }
    },
    async readPaymentPage(sessionId) {
      try {
        return await read(sessionId);
      } catch (err) {
        return translate(err);
      }
    },
    async closePaymentPage(sessionId) {
      try {
        const current = await read(sessionId);
        if (current.status !== 'open') return current;
        await stripe.checkout.sessions.expire(sessionId);
        return await read(sessionId);
      } catch (err) {
        // Paid or expired in the meantime: the provider refuses to expire it; its record decides.
        if (err instanceof Stripe.errors.StripeInvalidRequestError) return read(sessionId).catch(translate);
        return translate(err);
      }
    },
    async refund({ chargeId, amountCents, idempotencyKey, reason }) {
      try {
        const r = await stripe.refunds.create({ charge: chargeId, amount: amountCents, ...(reason ? { reason } : {}) }, { idempotencyKey });
        return { refundId: r.id, amountCents: r.amount, status: r.status ?? 'succeeded' };
      } catch (err) {
        return translate(err);
      }
    },
    async ping() {
      await stripe.customers.list({ limit: 1 });
    },
    parseWebhook(rawBody, signatureHeader) {
      if (!signatureHeader) throw new AppError(400, 'bad_signature', 'The event is not signed.');
      let event: Stripe.Event;
      try {
        event = stripe.webhooks.constructEvent(rawBody, signatureHeader, webhookSecret);
      } catch {
        throw new AppError(400, 'bad_signature', 'The event signature does not match.');
      }
      const obj = event.data.object as unknown as Record<string, unknown>;
      if (event.type === 'checkout.session.completed' || event.type === 'checkout.session.expired') {
        return { id: event.id, type: event.type, sessionId: String(obj.id) };
      }
      if (event.type === 'charge.refunded') {
        return { id: event.id, type: 'charge.refunded', chargeId: String(obj.id), amountRefundedCents: Number(obj.amount_refunded ?? 0) };
      }
      if (event.type === 'charge.dispute.created') {
        const charge = typeof obj.charge === 'string' ? obj.charge : String((obj.charge as { id?: string } | null)?.id ?? '');
        return { id: event.id, type: 'charge.dispute.created', chargeId: charge, disputeId: String(obj.id) };
      }
      return { id: event.id, type: 'other', providerType: event.type };
    },
  };
}
