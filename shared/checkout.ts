import { z } from 'zod';
import type { PriceLine } from './slabs';
import { isoDateSchema } from './pickups';

export const IDEMPOTENCY_KEY_PATTERN = /^[A-Za-z0-9_-]{8,100}$/;

export const checkoutSchema = z.object({
  holdIds: z.array(z.number().int().positive()).min(1, 'Choose at least one held slab').max(50).optional(),
  pickupWindowId: z.number({ error: 'Choose a pickup window' }).int().positive('Choose a pickup window'),
  pickupOn: isoDateSchema,
  withFlattening: z.array(z.number().int().positive()).max(50).default([]),
  loadingHelp: z.boolean().default(false),
  /** Card payments happen on the payment provider's hosted page; card details never reach Stickerline. */
  paymentMethod: z.literal('card', { error: 'Choose how to pay' }).default('card'),
}).strict();
export type CheckoutInput = z.input<typeof checkoutSchema>;

export const ORDER_STATUSES = ['pending-payment', 'abandoned', 'paid', 'picked-up', 'no-show', 'refunded', 'cancelled'] as const;
export type OrderStatus = (typeof ORDER_STATUSES)[number];
/** A payment attempt that has not (or never) become an order: no pickup, no loading help, not in the buyer's list. */
export const ATTEMPT_STATUSES = ['pending-payment', 'abandoned'] as const satisfies readonly OrderStatus[];
export const isAttempt = (s: OrderStatus) => (ATTEMPT_STATUSES as readonly string[]).includes(s);

/** What each order status means to a buyer, in Stickerline's words. */
export const ORDER_STATUS_LABELS: Record<OrderStatus, string> = {
  'pending-payment': 'Waiting for payment',
  abandoned: 'Payment not completed',
  paid: 'Paid — waiting at the yard',
  'picked-up': 'Collected',
  'no-show': 'Not collected',
  refunded: 'Refunded',
  cancelled: 'Cancelled',
};

export type OrderLineView = {
  id: number;
  slabId: number;
  slabCode: string;
  speciesName: string;
  boardFeet: number;
  weightLb: number;
  lengthIn: number;
  withFlattening: boolean;
  priceLines: PriceLine[];
  slabCents: number;
  servicesCents: number;
  /** This line's share of the order's sales tax; totalCents includes it. */
  taxCents: number;
  totalCents: number;
  status: string;
};

export type OrderView = {
  id: number;
  code: string;
  status: OrderStatus;
  slabsCents: number;
  servicesCents: number;
  taxCents: number;
  /** The approved resale certificate that exempted the order from sales tax, if any. */
  taxExemptCertificate: string | null;
  totalCents: number;
  refundedCents: number;
  /** The hosted payment page while the attempt is open; null otherwise. */
  paymentUrl: string | null;
  totalWeightLb: number;
  longestSlabIn: number;
  heaviestSlabLb: number;
  loadingHelp: boolean;
  disputed: boolean;
  createdAt: string;
  paidAt: string | null;
  /** Null while the order is only a payment attempt: no pickup is booked until it is paid. */
  pickup: { on: string | null; startsAt: string | null; endsAt: string | null; yardAddress: string | null } | null;
  lines: OrderLineView[];
};

export type OrderSummary = Pick<OrderView, 'id' | 'code' | 'status' | 'totalCents' | 'createdAt' | 'pickup'> & { slabCount: number };
export type OrdersResponse = { orders: OrderSummary[] };
export type OrderResponse = { order: OrderView };
/** POST /api/checkout: the attempt and the payment page to send the buyer to. */
export type CheckoutStarted = { orderId: number; paymentUrl: string | null; order: OrderView };
