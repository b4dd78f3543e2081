import {
  doublePrecision, index, integer, jsonb, pgTable, serial, text, timestamp, uniqueIndex,
} from 'drizzle-orm/pg-core';
import { logs } from './logs';
import { species } from './species';

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
]);
