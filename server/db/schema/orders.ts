import { sql } from 'drizzle-orm';
import {
  boolean, check, date, doublePrecision, index, integer, jsonb, pgTable, serial, text, timestamp, uniqueIndex,
} from 'drizzle-orm/pg-core';
import { user } from './auth';
import { slabs } from './slabs';
import { pickupWindows } from './pickups';
import { ORDER_STATUSES } from '../../../shared/checkout';
import { cents, DB_LIMITS, oneOf, within } from './checks';

/** What an order line can be: being paid for, sold, voided by a failed payment, refunded. */
export const ORDER_LINE_STATUSES = ['pending', 'sold', 'void', 'refunded'] as const;
export const PAYMENT_KINDS = ['charge', 'refund'] as const;
/** `refunded`: a charge given back at once because the sale could not be recorded. */
export const PAYMENT_STATUSES = ['pending', 'succeeded', 'failed', 'refunded'] as const;

export const orders = pgTable('orders', {
  id: serial('id').primaryKey(),
  code: text('code').notNull().unique(),
  buyerId: text('buyer_id').notNull().references(() => user.id),
  // Attempts: pending-payment | abandoned (never paid). Orders: paid | picked-up | no-show | refunded | cancelled.
  status: text('status').notNull(),
  slabsCents: integer('slabs_cents').notNull(),
  servicesCents: integer('services_cents').notNull().default(0),
  /** Sales tax, its own line; totalCents includes it. */
  taxCents: integer('tax_cents').notNull().default(0),
  /** The approved resale certificate that exempted this order from sales tax, as it was at checkout. */
  taxExemptCertificate: text('tax_exempt_certificate'),
  totalCents: integer('total_cents').notNull(),
  refundedCents: integer('refunded_cents').notNull().default(0),
  totalWeightLb: doublePrecision('total_weight_lb').notNull(),
  longestSlabIn: doublePrecision('longest_slab_in').notNull(),
  loadingHelp: boolean('loading_help').notNull().default(false),
  pickupWindowId: integer('pickup_window_id').references(() => pickupWindows.id),
  pickupOn: date('pickup_on', { mode: 'string' }),
  idempotencyKey: text('idempotency_key').notNull().unique(),
  chargeId: text('charge_id'),
  /** The provider's hosted payment page for this attempt (a checkout session) and where the buyer is sent. */
  checkoutSessionId: text('checkout_session_id').unique(),
  paymentUrl: text('payment_url'),
  disputed: boolean('disputed').notNull().default(false),
  reminderSentAt: timestamp('reminder_sent_at', { withTimezone: true }),
  pickedUpAt: timestamp('picked_up_at', { withTimezone: true }),
  pickedUpBy: text('picked_up_by'),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  paidAt: timestamp('paid_at', { withTimezone: true }),
}, (t) => [
  index('orders_buyer_idx').on(t.buyerId),
  index('orders_pickup_idx').on(t.pickupOn, t.pickupWindowId),
  check('orders_status_known', oneOf(t.status, ORDER_STATUSES)),
  check('orders_slabs_cents_in_range', cents(t.slabsCents)),
  check('orders_services_cents_in_range', cents(t.servicesCents)),
  check('orders_total_adds_up', sql`${t.totalCents} = ${t.slabsCents} + ${t.servicesCents} + ${t.taxCents}`),
  check('orders_refunded_within_total', sql`${t.refundedCents} >= 0 and ${t.refundedCents} <= ${t.totalCents}`),
  check('orders_weight_in_range', within(t.totalWeightLb, 0, DB_LIMITS.maxWeightLb)),
  check('orders_longest_in_range', within(t.longestSlabIn, 0, DB_LIMITS.maxLengthIn)),
]);

export const orderLines = pgTable('order_lines', {
  id: serial('id').primaryKey(),
  orderId: integer('order_id').notNull().references(() => orders.id, { onDelete: 'cascade' }),
  slabId: integer('slab_id').notNull().references(() => slabs.id),
  // sold | refunded
  status: text('status').notNull().default('sold'),
  slabCode: text('slab_code').notNull(),
  speciesName: text('species_name').notNull(),
  boardFeet: doublePrecision('board_feet').notNull(),
  weightLb: doublePrecision('weight_lb').notNull(),
  lengthIn: doublePrecision('length_in').notNull(),
  /** Snapshot of the price breakdown shown to the buyer at checkout. */
  priceBreakdown: jsonb('price_breakdown').$type<unknown>().notNull(),
  withFlattening: boolean('with_flattening').notNull().default(false),
  slabCents: integer('slab_cents').notNull(),
  servicesCents: integer('services_cents').notNull().default(0),
  /** This line's share of the order's sales tax (the order's tax spread over lines, adding up exactly). */
  taxCents: integer('tax_cents').notNull().default(0),
  totalCents: integer('total_cents').notNull(),
}, (t) => [
  // A slab is one of a kind: at most one sold line can exist for it.
  uniqueIndex('order_lines_one_sale_per_slab').on(t.slabId).where(sql`${t.status} = 'sold'`),
  index('order_lines_order_idx').on(t.orderId),
  check('order_lines_status_known', oneOf(t.status, ORDER_LINE_STATUSES)),
  check('order_lines_slab_cents_in_range', cents(t.slabCents)),
  check('order_lines_services_cents_in_range', cents(t.servicesCents)),
  check('order_lines_total_adds_up', sql`${t.totalCents} = ${t.slabCents} + ${t.servicesCents} + ${t.taxCents}`),
  check('order_lines_board_feet_in_range', within(t.boardFeet, 0, DB_LIMITS.maxBoardFeet)),
  check('order_lines_weight_in_range', within(t.weightLb, 0, DB_LIMITS.maxWeightLb)),
  check('order_lines_length_in_range', within(t.lengthIn, 0, DB_LIMITS.maxLengthIn)),
]);

export const payments = pgTable('payments', {
  id: serial('id').primaryKey(),
  orderId: integer('order_id').notNull().references(() => orders.id, { onDelete: 'cascade' }),
  kind: text('kind').notNull(), // charge | refund
  providerId: text('provider_id'),
  amountCents: integer('amount_cents').notNull(),
  status: text('status').notNull(), // succeeded | failed
  reason: text('reason').notNull().default(''),
  idempotencyKey: text('idempotency_key').unique(),
  createdBy: text('created_by'),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
}, (t) => [
  index('payments_order_idx').on(t.orderId),
  check('payments_kind_known', oneOf(t.kind, PAYMENT_KINDS)),
  check('payments_status_known', oneOf(t.status, PAYMENT_STATUSES)),
  check('payments_amount_in_range', cents(t.amountCents)),
]);

/**
 * Which part of a refund was wood, services and tax on which line: the office numbers add these
 * up, so revenue net of refunds reconciles with the orders to the cent.
 */
export const refundLines = pgTable('refund_lines', {
  id: serial('id').primaryKey(),
  paymentId: integer('payment_id').notNull().references(() => payments.id, { onDelete: 'cascade' }),
  orderLineId: integer('order_line_id').notNull().references(() => orderLines.id, { onDelete: 'cascade' }),
  woodCents: integer('wood_cents').notNull(),
  servicesCents: integer('services_cents').notNull(),
  taxCents: integer('tax_cents').notNull(),
}, (t) => [
  index('refund_lines_payment_idx').on(t.paymentId),
  index('refund_lines_line_idx').on(t.orderLineId),
  check('refund_lines_amounts_not_negative', sql`${t.woodCents} >= 0 and ${t.servicesCents} >= 0 and ${t.taxCents} >= 0`),
]);
