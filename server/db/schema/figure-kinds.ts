import { check, doublePrecision, pgTable, text } from 'drizzle-orm/pg-core';
import { within } from './checks';

/** Figure the mill recognises (crotch, curl, burl …) with its price multiplier; the mill can add more. */
export const figureKinds = pgTable('figure_kinds', {
  slug: text('slug').primaryKey(),
  label: text('label').notNull(),
  premiumMultiplier: doublePrecision('premium_multiplier').notNull().default(1),
}, (t) => [check('figure_kinds_multiplier_in_range', within(t.premiumMultiplier, 0, 10))]);
