import { index, integer, pgTable, serial, text, timestamp } from 'drizzle-orm/pg-core';
import { logs } from './logs';
import { slabs } from './slabs';
import { user } from './auth';

/**
 * Slabs the yard has marked as book-matched: sawn one after another from one log, so their faces
 * mirror each other. The one record the slab page, descriptions, the log page and the pair/set hold use.
 */
export const matchedSets = pgTable('matched_sets', {
  id: serial('id').primaryKey(),
  logId: integer('log_id').notNull().references(() => logs.id),
  markedBy: text('marked_by').references(() => user.id, { onDelete: 'set null' }),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
}, (t) => [index('matched_sets_log_idx').on(t.logId)]);

export const matchedSetSlabs = pgTable('matched_set_slabs', {
  setId: integer('set_id').notNull().references(() => matchedSets.id, { onDelete: 'cascade' }),
  /** The key: a slab belongs to at most one matched set. */
  slabId: integer('slab_id').primaryKey().references(() => slabs.id, { onDelete: 'cascade' }),
}, (t) => [index('matched_set_slabs_set_idx').on(t.setId)]);
