import { sql } from 'drizzle-orm';
import { check, date, doublePrecision, index, integer, pgTable, serial, text, timestamp } from 'drizzle-orm/pg-core';
import { slabs } from './slabs';
import { user } from './auth';
import { METER_KINDS } from '../../../shared/slabs';
import { MAX_STORED_MC_PERCENT, oneOf, sane, within } from './checks';

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
  // A meter never reads 0 % in wood: an empty field is not a reading.
  check('moisture_mc_in_range', within(t.mcPercent, 0, MAX_STORED_MC_PERCENT)),
  check('moisture_meter_known', oneOf(t.meterKind, METER_KINDS)),
  check('moisture_measured_on_sane', sane(t.measuredOn)),
  check('moisture_depth_in_range', sql`${t.depthIn} is null or (${within(t.depthIn, 0, 12)})`),
  check('moisture_ambient_rh_in_range', sql`${t.ambientRhPercent} is null or (${within(t.ambientRhPercent, 0, 100, { minInclusive: true })})`),
  check('moisture_ambient_temp_in_range', sql`${t.ambientTempF} is null or (${within(t.ambientTempF, -60, 140, { minInclusive: true })})`),
  check('moisture_readings_review_values', sql`${t.review} in ('in-line', 'confirmed', 'unconfirmed')`),
]);
