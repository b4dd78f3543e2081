import { date, doublePrecision, integer, pgTable, serial, text, timestamp } from 'drizzle-orm/pg-core';
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
});
