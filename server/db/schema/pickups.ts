import { sql } from 'drizzle-orm';
import { boolean, check, date, integer, pgTable, serial, text } from 'drizzle-orm/pg-core';
import { within } from './checks';

/** A weekly pickup window at the yard (weekday 0 = Sunday, times as HH:MM local to the mill). */
export const pickupWindows = pgTable('pickup_windows', {
  id: serial('id').primaryKey(),
  weekday: integer('weekday').notNull(),
  startsAt: text('starts_at').notNull(),
  endsAt: text('ends_at').notNull(),
  capacity: integer('capacity').notNull(),
  active: boolean('active').notNull().default(true),
}, (t) => [
  check('pickup_windows_weekday_known', within(t.weekday, 0, 6, { minInclusive: true })),
  check('pickup_windows_times_are_clock', sql`${t.startsAt} ~ '^([01][0-9]|2[0-3]):[0-5][0-9]$' and ${t.endsAt} ~ '^([01][0-9]|2[0-3]):[0-5][0-9]$'`),
  check('pickup_windows_end_after_start', sql`${t.endsAt} > ${t.startsAt}`),
  check('pickup_windows_capacity_in_range', within(t.capacity, 0, 1000)),
]);

export const closedDays = pgTable('closed_days', {
  day: date('day', { mode: 'string' }).primaryKey(),
  note: text('note').notNull().default(''),
});
