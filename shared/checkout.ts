import { z } from 'zod';
import type { PriceLine } from './slabs';
import { isoDateSchema } from './pickups';

/** Test-mode cards the local payment fake understands; no real card is charged with these. */
export const TEST_CARDS = [
  { token: 'tok_visa', label: 'Test Visa — payment goes through' },
  { token: 'tok_chargeDeclined', label: 'Test card — payment is declined' },
] as const;

export const IDEMPOTENCY_KEY_PATTERN = /^[A-Za-z0-9_-]{8,100}$/;

export const checkoutSchema = z.object({
  holdIds: z.array(z.number().int().positive()).min(1, 'Choose at least one held slab').max(50).optional(),
  pickupWindowId: z.number({ error: 'Choose a pickup window' }).int().positive('Choose a pickup window'),
  pickupOn: isoDateSchema,
  withFlattening: z.array(z.number().int().positive()).max(50).default([]),
  loadingHelp: z.boolean().default(false),
  cardToken: z.string({ error: 'Choose a card' }).regex(/^tok_[A-Za-z0-9_]{1,60}$/, 'Choose a card'),
}).strict();
export type CheckoutInput = z.input<typeof checkoutSchema>;

export const ORDER_STATUSES = ['pending-payment', 'paid', 'picked-up', 'no-show', 'refunded', 'cancelled'] as const;
export type OrderStatus = (typeof ORDER_STATUSES)[number];

/** An order's status in Stickerline's words: the one set for the buyer, the office, e-mails and CSV. */
export const ORDER_STATUS_LABELS: Record<OrderStatus, string> = {
  'pending-payment': 'Payment in progress',
  paid: 'Paid, waiting at the yard',
  'picked-up': 'Collected',
  'no-show': 'Not collected',
  refunded: 'Refunded',
  cancelled: 'Payment not completed',
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
  totalCents: number;
  status: string;
};

export type OrderView = {
  id: number;
  code: string;
  status: OrderStatus;
  slabsCents: number;
  servicesCents: number;
  totalCents: number;
  refundedCents: number;
  totalWeightLb: number;
  longestSlabIn: number;
  heaviestSlabLb: number;
  loadingHelp: boolean;
  disputed: boolean;
  createdAt: string;
  paidAt: string | null;
  pickup: { on: string | null; startsAt: string | null; endsAt: string | null; yardAddress: string | null };
  lines: OrderLineView[];
};

export type OrderSummary = Pick<OrderView, 'id' | 'code' | 'status' | 'totalCents' | 'createdAt' | 'pickup'> & { slabCount: number };
export type OrdersResponse = { orders: OrderSummary[] };
export type OrderResponse = { order: OrderView };
