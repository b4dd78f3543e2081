import { z } from 'zod';
import { ATTEMPT_STATUSES, ORDER_STATUSES, isAttempt, type OrderStatus } from './checkout';

/** The office (admin) contract: inputs the API parses and the forms validate, plus response shapes. */

export const USER_ROLES = ['buyer', 'seller', 'admin'] as const;
export type UserRole = (typeof USER_ROLES)[number];
/** A role in Stickerline's words; "buyer" is the one word for the people who buy (never "customer"). */
export const USER_ROLE_LABELS: Record<UserRole, string> = { buyer: 'Buyer', seller: 'Yard staff', admin: 'Office' };
/** What a role lets a person do, said before the office changes it. */
export const USER_ROLE_DESCRIPTIONS: Record<UserRole, string> = {
  buyer: 'They can reserve and buy slabs, and nothing more.',
  seller: 'They can record logs, slabs, photos and readings at the yard desk.',
  admin: 'They can run pickups, refunds, holds, prices and everyone\'s roles.',
};

const emptyToUndefined = (raw: Record<string, unknown>) =>
  Object.fromEntries(Object.entries(raw).map(([k, v]) => [k, v === '' ? undefined : v]));

const isoDay = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'Use a date like 2025-06-30')
  .refine((s) => !Number.isNaN(Date.parse(`${s}T00:00:00Z`)), 'That date does not exist');

// --- users ---------------------------------------------------------------------------------
export const userListQuerySchema = z.object({
  q: z.string().max(80, 'Search text is too long').optional(),
  role: z.enum(USER_ROLES, { error: 'Role must be buyer, seller or admin' }).optional(),
}).strict();
export const parseUserListQuery = (raw: Record<string, unknown>) => userListQuerySchema.parse(emptyToUndefined(raw));

export const updateUserSchema = z.object({
  role: z.enum(USER_ROLES, { error: 'Role must be buyer, seller or admin' }),
  disabled: z.boolean({ error: 'Disabled must be true or false' }),
}).partial().strict().refine((v) => v.role !== undefined || v.disabled !== undefined, { message: 'Nothing to change', path: ['_form'] });
export type UpdateUserInput = z.infer<typeof updateUserSchema>;

export type OfficeUser = { id: string; name: string; email: string; role: UserRole; disabled: boolean; createdAt: string };

// --- audit log -------------------------------------------------------------------------------
export const AUDIT_PAGE_SIZE = 50;
export const auditQuerySchema = z.object({
  actor: z.string().max(120, 'Actor is too long').optional(),
  action: z.string().max(80).optional(),
  entityType: z.string().max(40).optional(),
  from: isoDay.optional(),
  to: isoDay.optional(),
  page: z.coerce.number({ error: 'Page must be a number' }).int().min(1, 'Page starts at 1').max(100000).default(1),
}).strict().refine((q) => !q.from || !q.to || q.from <= q.to, { path: ['to'], message: 'The end date must not be before the start date' });
export const parseAuditQuery = (raw: Record<string, unknown>) => auditQuerySchema.parse(emptyToUndefined(raw));
export type AuditQuery = z.infer<typeof auditQuerySchema>;

/** What a change log entry was about, with where to look at it (a slab, order or log page). */
export type AuditTarget = { label: string; link: { kind: 'slab' | 'order' | 'log' | 'office-order'; id: number } | null };

/** One change, readable: who by name, what in words, on what, and when on the mill's clock. */
export type AuditEntryView = {
  id: number; action: string; entityType: string; createdAt: string;
  who: string; what: string; on: AuditTarget; whenAtMill: string;
};
export type AuditPage = { items: AuditEntryView[]; total: number; page: number; pageSize: number; actions: string[]; entityTypes: string[] };

// --- orders & refunds ------------------------------------------------------------------------
// One list of order states for both sides; attempts (pending-payment, abandoned) are listed only when asked for.
export { ORDER_STATUSES, ATTEMPT_STATUSES, isAttempt, type OrderStatus };
export { ORDER_STATUS_LABELS } from './checkout';

export const orderListQuerySchema = z.object({
  status: z.enum(ORDER_STATUSES, { error: 'Unknown order status' }).optional(),
  q: z.string().max(80, 'Search text is too long').optional(),
}).strict();
export const parseOrderListQuery = (raw: Record<string, unknown>) => orderListQuerySchema.parse(emptyToUndefined(raw));

export const RETURN_SLABS_TO = ['listed', 'withdrawn'] as const;
export const REFUND_REASON_MAX = 500;
export const createRefundSchema = z.object({
  amountCents: z.number({ error: 'Enter an amount' }).int('Amount must be whole cents').min(1, 'Amount must be more than zero').max(100_000_000, 'Amount is too large'),
  reason: z.string({ error: 'Give a reason' }).trim().min(3, 'Give a reason (a few words)').max(REFUND_REASON_MAX, `Keep the reason under ${REFUND_REASON_MAX} characters`),
  slabIds: z.array(z.number().int().positive()).max(200).default([]),
  returnSlabsTo: z.enum(RETURN_SLABS_TO, { error: 'Choose where the slabs go: back on sale or withdrawn' }).default('listed'),
}).strict();
export type CreateRefundInput = z.input<typeof createRefundSchema>;

export type OrderListItem = {
  id: number; code: string; status: OrderStatus; buyerName: string; buyerEmail: string;
  totalCents: number; refundedCents: number; pickupOn: string | null; paidAt: string | null; slabCodes: string[];
};
export type OrderLineView = {
  id: number; slabId: number; slabCode: string; speciesName: string; status: 'sold' | 'refunded';
  boardFeet: number; weightLb: number; lengthIn: number; totalCents: number; slabStatus: string;
};
export type PaymentView = {
  id: number; kind: 'charge' | 'refund'; amountCents: number; status: string; reason: string;
  providerId: string | null; createdBy: string | null; createdAt: string;
};
export type PickupWindowView = { id: number; weekday: number; startsAt: string; endsAt: string; capacity: number };
export type OrderDetail = OrderListItem & {
  buyerId: string; slabsCents: number; servicesCents: number; refundableCents: number;
  totalWeightLb: number; longestSlabIn: number; loadingHelp: boolean; disputed: boolean;
  pickupWindow: PickupWindowView | null; pickedUpAt: string | null; pickedUpBy: string | null; createdAt: string;
  lines: OrderLineView[]; payments: PaymentView[];
};

// --- pickup board ----------------------------------------------------------------------------
export const PICKUP_BOARD_MAX_DAYS = 31;
export const pickupBoardQuerySchema = z.object({
  from: isoDay.optional(),
  days: z.coerce.number({ error: 'Days must be a number' }).int('Days must be a whole number').min(1, 'Show at least one day').max(PICKUP_BOARD_MAX_DAYS, `Show at most ${PICKUP_BOARD_MAX_DAYS} days`).default(7),
}).strict();
export const parsePickupBoardQuery = (raw: Record<string, unknown>) => pickupBoardQuerySchema.parse(emptyToUndefined(raw));

export const rescheduleSchema = z.object({
  pickupWindowId: z.number({ error: 'Choose a pickup window' }).int().positive('Choose a pickup window'),
  pickupOn: isoDay,
}).strict();
export type RescheduleInput = z.infer<typeof rescheduleSchema>;

export type PickupOrder = {
  /** The booked window has begun at the mill: only then can the office record that the buyer did not come. */
  pickupStarted: boolean;
  id: number; code: string; status: OrderStatus; buyerName: string; buyerEmail: string; slabCodes: string[];
  totalWeightLb: number; longestSlabIn: number; loadingHelp: boolean; pickedUpAt: string | null;
};
export type PickupSlot = { window: PickupWindowView | null; orders: PickupOrder[] };
export type PickupDay = { date: string; closed: boolean; closedNote: string; slots: PickupSlot[] };
export type PickupBoard = { from: string; days: number; noShowRule: 'keep' | 'release-and-refund'; windows: PickupWindowView[]; dates: PickupDay[] };

// --- holds -----------------------------------------------------------------------------------
export type ActiveHold = {
  id: number; slabId: number; slabCode: string; buyerName: string; buyerEmail: string;
  groupId: string | null; createdAt: string; expiresAt: string;
};

// --- the mill's numbers ------------------------------------------------------------------------
/** Money of sold lines, split by kind; refunds are counted against the month of the sale they undo. */
export type SalesMoney = {
  woodCents: number; servicesCents: number; taxCents: number;
  refundedWoodCents: number; refundedServicesCents: number; refundedTaxCents: number;
  /** Wood plus services, net of refunds: the mill's revenue (tax is collected for the state, not revenue). */
  revenueCents: number;
  /** Tax collected net of tax refunded. */
  netTaxCents: number;
};
export type MonthlySpeciesSales = SalesMoney & { month: string; speciesName: string; boardFeet: number; slabs: number };
export type SlabStatusCount = { status: string; count: number };
export type DryingStockForecast = {
  id: number; code: string; speciesName: string; thicknessIn: number; moisturePercent: number | null;
  expectedOn: string | null; earliestOn: string | null; latestOn: string | null; basis: string;
};

export type MillNumbers = {
  sales: MonthlySpeciesSales[];
  /** Over all months: equals the sum of the paid orders' amounts and refunds, to the cent. */
  totals: SalesMoney;
  statusCounts: SlabStatusCount[];
  averageDaysMilledToSold: number | null;
  soldSlabsWithMillDate: number;
  /** Slabs still drying, soonest expected air-dry date first (at most 200). */
  dryingStock: DryingStockForecast[];
};

/** The change log's filter choices in words (the stored action names stay internal). */
export const AUDIT_ACTION_LABELS: Record<string, string> = {
  'log.create': 'Log recorded', 'log.update': 'Log changed', 'slab.create': 'Slab recorded', 'slab.status': 'Slab status changed',
  'slab.price': 'Price changed', 'slab.drying-state': 'Drying state changed', 'moisture-reading.create': 'Reading recorded',
  'moisture-reading.delete': 'Reading deleted', 'slab-photo.add': 'Photos added', 'slab-photo.delete': 'Photo removed',
  'matched-set.mark': 'Book-matched set marked', 'matched-set.unmark': 'Book-matched set unmarked',
  'matched-set.rest-still-held': 'Slab left a held matched set', 'hold.release': 'Hold released by staff',
  'order.paid': 'Order paid', 'order.picked-up': 'Picked up', 'order.no-show': 'No-show', 'order.reschedule': 'Pickup moved',
  'order.refund': 'Refund', 'user.role': 'Role changed', 'user.disable': 'Account disabled', 'user.enable': 'Account enabled',
  'mill-rules.update': 'Prices and rules saved', 'pickup-settings.update': 'Pickup hours changed', 'figure-kind.create': 'Figure added',
};
export const AUDIT_SUBJECT_LABELS: Record<string, string> = {
  slab: 'Slabs', order: 'Orders', log: 'Logs', hold: 'Holds', user: 'Accounts', mill_settings: "The mill's settings",
  figure_kind: 'Figure list', 'moisture-reading': 'Readings (older entries)',
};
