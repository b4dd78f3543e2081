import { sql } from 'drizzle-orm';
import { check, date, doublePrecision, integer, pgTable, serial, text, timestamp } from 'drizzle-orm/pg-core';
import { SAWING_METHODS } from '../../../shared/slabs';
import { DB_LIMITS, oneOf, sane, within } from './checks';
import { species } from './species';

export const logs = pgTable('logs', {
  id: serial('id').primaryKey(),
  code: text('code').notNull().unique(),
  speciesId: integer('species_id').notNull().references(() => species.id),
  originNote: text('origin_note').notNull().default(''),
  felledOn: date('felled_on', { mode: 'string' }),
  milledOn: date('milled_on', { mode: 'string' }),
  lengthIn: doublePrecision('length_in').notNull(),
  buttDiameterIn: doublePrecision('butt_diameter_in').notNull(),
  topDiameterIn: doublePrecision('top_diameter_in').notNull(),
  sawingMethod: text('sawing_method').notNull(),
  notes: text('notes').notNull().default(''),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
}, (t) => [
  check('logs_sawing_method_known', oneOf(t.sawingMethod, SAWING_METHODS)),
  check('logs_length_in_range', within(t.lengthIn, 0, DB_LIMITS.maxLengthIn)),
  check('logs_butt_in_range', within(t.buttDiameterIn, 0, DB_LIMITS.maxDiameterIn)),
  check('logs_top_in_range', within(t.topDiameterIn, 0, DB_LIMITS.maxDiameterIn)),
  check('logs_top_not_wider_than_butt', sql`${t.topDiameterIn} <= ${t.buttDiameterIn}`),
  check('logs_felled_on_sane', sql`${t.felledOn} is null or ${sane(t.felledOn)}`),
  check('logs_milled_on_sane', sql`${t.milledOn} is null or ${sane(t.milledOn)}`),
  check('logs_milled_after_felled', sql`${t.felledOn} is null or ${t.milledOn} is null or ${t.milledOn} >= ${t.felledOn}`),
]);
