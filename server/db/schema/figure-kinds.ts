import { doublePrecision, pgTable, text } from 'drizzle-orm/pg-core';

/** Figure the mill recognises (crotch, curl, burl …) with its price multiplier; the mill can add more. */
export const figureKinds = pgTable('figure_kinds', {
  slug: text('slug').primaryKey(),
  label: text('label').notNull(),
  premiumMultiplier: doublePrecision('premium_multiplier').notNull().default(1),
});
