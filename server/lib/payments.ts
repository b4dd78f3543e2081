import Stripe from 'stripe';
import { AppError } from './errors';
import { getLogger } from './logger';

export type ChargeInput = {
  amountCents: number;
  /** A card token from the payment form (test mode: tok_visa, tok_chargeDeclined, …). */
  source: string;
  idempotencyKey: string;
  description: string;
  metadata?: Record<string, string>;
};
export type ChargeResult = { chargeId: string; amountCents: number; status: string };
export type RefundInput = { chargeId: string; amountCents: number; idempotencyKey: string; reason?: 'requested_by_customer' | 'duplicate' | 'fraudulent' };
export type RefundResult = { refundId: string; amountCents: number; status: string };
/** The parts of a provider event Stickerline acts on. */
export type PaymentEvent =
  | { id: string; type: 'charge.refunded'; chargeId: string; amountRefundedCents: number }
  | { id: string; type: 'charge.dispute.created'; chargeId: string; disputeId: string }
  | { id: string; type: 'other'; providerType: string };

/** The one money interface the app uses: charges, refunds and signed provider events. */
export type Payments = {
  charge(input: ChargeInput): Promise<ChargeResult>;
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

const DECLINED = 'The card was declined. Your holds are kept — try another card.';

/** Turns provider errors into AppErrors a buyer can act on; anything unknown stays a 502. */
function translate(err: unknown): never {
  if (err instanceof Stripe.errors.StripeCardError) {
    throw new AppError(402, 'card_declined', DECLINED);
  }
  if (err instanceof Stripe.errors.StripeError) {
    getLogger().error({ part: 'payments', type: err.type, reason: err.message }, 'the payment service answered with an error');
    throw new AppError(502, 'payment_unavailable', 'The payment service did not answer as expected. Nothing was charged; please try again.');
  }
  throw err;
}

/**
 * Talks to the payment provider through its SDK. Given host/port/protocol it talks to the local
 * fake (development, tests); with a real key and no host it talks to the hosted service.
 */
export function createPayments({ secretKey, host, port, protocol, webhookSecret, currency = 'usd' }: PaymentsOptions): Payments {
  const stripe = new Stripe(secretKey, {
    ...(host ? { host } : {}),
    ...(port ? { port } : {}),
    ...(protocol ? { protocol } : {}),
    // Retries are ours to decide: the idempotency key makes a repeat of the same checkout safe.
    maxNetworkRetries: 0,
  });
  return {
    async charge({ amountCents, source, idempotencyKey, description, metadata }) {
      try {
        const c = await stripe.charges.create(
          { amount: amountCents, currency, source, description, metadata, capture: true },
          { idempotencyKey },
        );
        return { chargeId: c.id, amountCents: c.amount, status: c.status };
      } catch (err) {
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
