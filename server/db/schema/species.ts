import { check, doublePrecision, integer, pgTable, serial, text } from 'drizzle-orm/pg-core';
import { cents, within } from './checks';

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
}, (t) => [
  check('species_rate_in_range', cents(t.ratePerBoardFootCents)),
  check('species_radial_in_range', within(t.radialCoefficient, 0, 0.05)),
  check('species_tangential_in_range', within(t.tangentialCoefficient, 0, 0.05)),
  // The cell wall itself is about 1.54 (Wood Handbook FPL-GTR-190 ch. 4): no wood is denser.
  check('species_basic_sg_in_range', within(t.basicSpecificGravity, 0, 1.54)),
  check('species_sg12_in_range', within(t.specificGravity12, 0, 1.54)),
]);
