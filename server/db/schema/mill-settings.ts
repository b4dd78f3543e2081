import { sql } from 'drizzle-orm';
import { check, doublePrecision, integer, pgTable, text, timestamp } from 'drizzle-orm/pg-core';
import { cents, oneOf, within } from './checks';

/** One row (id = 1): the mill's own rules, editable by an admin. */
export const millSettings = pgTable('mill_settings', {
  id: integer('id').primaryKey().default(1),
  millName: text('mill_name').notNull(),
  yardAddress: text('yard_address').notNull(),
  contactEmail: text('contact_email').notNull(),
  holdHours: integer('hold_hours').notNull().default(48),
  targetMcPercent: doublePrecision('target_mc_percent').notNull().default(8),
  minimumChargeCents: integer('minimum_charge_cents').notNull().default(0),
  thickPremiumMinIn: doublePrecision('thick_premium_min_in').notNull().default(3),
  thickPremiumMultiplier: doublePrecision('thick_premium_multiplier').notNull().default(1),
  flatteningCentsPerSqFt: integer('flattening_cents_per_sq_ft').notNull().default(0),
  /** What happens to a no-show order: 'release-and-refund' or 'keep'. */
  noShowRule: text('no_show_rule').notNull().default('keep'),
  maxReadingAgeDays: integer('max_reading_age_days').notNull().default(60),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
}, (t) => [
  check('mill_settings_one_row', sql`${t.id} = 1`),
  check('mill_settings_hold_hours_in_range', within(t.holdHours, 0, 24 * 365)),
  check('mill_settings_target_mc_in_range', within(t.targetMcPercent, 0, 30)),
  check('mill_settings_minimum_charge_in_range', cents(t.minimumChargeCents)),
  check('mill_settings_thick_min_in_range', within(t.thickPremiumMinIn, 0, 48)),
  check('mill_settings_thick_multiplier_in_range', within(t.thickPremiumMultiplier, 0, 10)),
  check('mill_settings_flattening_in_range', cents(t.flatteningCentsPerSqFt)),
  check('mill_settings_no_show_rule_known', oneOf(t.noShowRule, ['keep', 'release-and-refund'])),
  check('mill_settings_reading_age_in_range', within(t.maxReadingAgeDays, 0, 3650)),
]);
