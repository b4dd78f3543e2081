import { sql } from 'drizzle-orm';
import { check, date, doublePrecision, index, integer, pgTable, serial, text, timestamp } from 'drizzle-orm/pg-core';
import { slabs } from './slabs';
import { user } from './auth';

export const moistureReadings = pgTable('moisture_readings', {
  id: serial('id').primaryKey(),
  slabId: integer('slab_id').notNull().references(() => slabs.id, { onDelete: 'cascade' }),
  measuredOn: date('measured_on', { mode: 'string' }).notNull(),
  mcPercent: doublePrecision('mc_percent').notNull(),
  meterKind: text('meter_kind').notNull(),
  location: text('location').notNull().default(''),
  depthIn: doublePrecision('depth_in'),
  ambientTempF: doublePrecision('ambient_temp_f'),
  ambientRhPercent: doublePrecision('ambient_rh_percent'),
  recordedBy: text('recorded_by').references(() => user.id, { onDelete: 'set null' }),
  /**
   * in-line: followed plausibly from the slab's previous reading; confirmed: jumped, and the person who
   * took it confirmed it; unconfirmed: nobody stands behind it (kept for the yard, never shown to buyers).
   */
  review: text('review').notNull().default('in-line'),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
}, (t) => [
  index('moisture_slab_idx').on(t.slabId, t.measuredOn),
  check('moisture_readings_review_values', sql`${t.review} in ('in-line', 'confirmed', 'unconfirmed')`),
]);
