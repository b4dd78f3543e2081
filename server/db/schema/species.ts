import { doublePrecision, integer, pgTable, serial, text } from 'drizzle-orm/pg-core';

/** Species the mill sells. Wood properties are copied from shared/wood/species.ts at seed time. */
export const species = pgTable('species', {
  id: serial('id').primaryKey(),
  slug: text('slug').notNull().unique(),
  name: text('name').notNull(),
  botanicalName: text('botanical_name').notNull(),
  ratePerBoardFootCents: integer('rate_per_board_foot_cents').notNull(),
  radialCoefficient: doublePrecision('radial_coefficient').notNull(),
  tangentialCoefficient: doublePrecision('tangential_coefficient').notNull(),
  basicSpecificGravity: doublePrecision('basic_specific_gravity').notNull(),
  specificGravity12: doublePrecision('specific_gravity_12').notNull(),
});
