import { boolean, date, integer, pgTable, serial, text } from 'drizzle-orm/pg-core';

/** A weekly pickup window at the yard (weekday 0 = Sunday, times as HH:MM local to the mill). */
export const pickupWindows = pgTable('pickup_windows', {
  id: serial('id').primaryKey(),
  weekday: integer('weekday').notNull(),
  startsAt: text('starts_at').notNull(),
  endsAt: text('ends_at').notNull(),
  capacity: integer('capacity').notNull(),
  active: boolean('active').notNull().default(true),
});

export const closedDays = pgTable('closed_days', {
  day: date('day', { mode: 'string' }).primaryKey(),
  note: text('note').notNull().default(''),
});
