import { doublePrecision, integer, pgTable, text, timestamp } from 'drizzle-orm/pg-core';

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
});
