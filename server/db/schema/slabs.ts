import {
  check, doublePrecision, index, integer, jsonb, pgTable, serial, text, timestamp, uniqueIndex,
} from 'drizzle-orm/pg-core';
import { logs } from './logs';
import { species } from './species';
import { sql } from 'drizzle-orm';
import { DRYING_STATE_VALUES, LIVE_EDGE, SLAB_STATUSES } from '../../../shared/slabs';
import { cents, DB_LIMITS, oneOf, within } from './checks';

export type SlabDefect = { kind: string; note: string; fromButtIn?: number | null; face?: string | null };

export const slabs = pgTable('slabs', {
  id: serial('id').primaryKey(),
  code: text('code').notNull().unique(),
  logId: integer('log_id').notNull().references(() => logs.id),
  speciesId: integer('species_id').notNull().references(() => species.id),
  sequenceInLog: integer('sequence_in_log').notNull(),
  thicknessIn: doublePrecision('thickness_in').notNull(),
  widthsIn: jsonb('widths_in').$type<number[]>().notNull(),
  /** Mean of widthsIn, stored for filtering; always written through shared/wood averageWidthIn. */
  widthIn: doublePrecision('width_in').notNull(),
  lengthIn: doublePrecision('length_in').notNull(),
  /** Stored for sort/filter; always written through shared/wood boardFeet. */
  boardFeet: doublePrecision('board_feet').notNull(),
  /** Slab price (without services) as computed by shared/wood pricing at the last write. */
  priceCents: integer('price_cents').notNull(),
  priceOverrideCents: integer('price_override_cents'),
  priceOverrideReason: text('price_override_reason'),
  liveEdge: text('live_edge').notNull().default('none'),
  figures: jsonb('figures').$type<string[]>().notNull().default([]),
  figureNotes: text('figure_notes').notNull().default(''),
  defects: jsonb('defects').$type<SlabDefect[]>().notNull().default([]),
  dryingState: text('drying_state').notNull(),
  status: text('status').notNull(),
  yardStack: text('yard_stack').notNull().default(''),
  yardPosition: text('yard_position').notNull().default(''),
  description: text('description').notNull().default(''),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  listedAt: timestamp('listed_at', { withTimezone: true }),
}, (t) => [
  uniqueIndex('slabs_log_sequence_uq').on(t.logId, t.sequenceInLog),
  index('slabs_status_idx').on(t.status),
  index('slabs_species_idx').on(t.speciesId),
  index('slabs_price_idx').on(t.priceCents),
  check('slabs_status_known', oneOf(t.status, SLAB_STATUSES)),
  check('slabs_drying_state_known', oneOf(t.dryingState, DRYING_STATE_VALUES)),
  check('slabs_live_edge_known', oneOf(t.liveEdge, LIVE_EDGE)),
  check('slabs_sequence_in_range', within(t.sequenceInLog, 1, 999, { minInclusive: true })),
  check('slabs_thickness_in_range', within(t.thicknessIn, 0, DB_LIMITS.maxThicknessIn)),
  check('slabs_width_in_range', within(t.widthIn, 0, DB_LIMITS.maxWidthIn)),
  check('slabs_widths_measured', sql`jsonb_typeof(${t.widthsIn}) = 'array' and jsonb_array_length(${t.widthsIn}) between 1 and 8`),
  check('slabs_length_in_range', within(t.lengthIn, 0, DB_LIMITS.maxLengthIn)),
  check('slabs_board_feet_in_range', within(t.boardFeet, 0, DB_LIMITS.maxBoardFeet)),
  check('slabs_price_in_range', cents(t.priceCents)),
  check('slabs_price_override_in_range', sql`${t.priceOverrideCents} is null or (${cents(t.priceOverrideCents)} and ${t.priceOverrideCents} > 0)`),
]);
