import { sql } from 'drizzle-orm';
import { index, integer, pgTable, primaryKey, serial, text, timestamp, uniqueIndex } from 'drizzle-orm/pg-core';
import { user } from './auth';
import { slabs } from './slabs';

/** Slabs a buyer keeps an eye on ("saved"); one row per buyer and slab. */
export const savedSlabs = pgTable('saved_slabs', {
  userId: text('user_id').notNull().references(() => user.id, { onDelete: 'cascade' }),
  slabId: integer('slab_id').notNull().references(() => slabs.id, { onDelete: 'cascade' }),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
}, (t) => [primaryKey({ columns: [t.userId, t.slabId] }), index('saved_slabs_slab_idx').on(t.slabId)]);

/**
 * "Tell me when this held slab is for sale again": open until the e-mail has been queued
 * (notified_at set), so each request sends exactly one message.
 */
export const slabWatches = pgTable('slab_watches', {
  id: serial('id').primaryKey(),
  userId: text('user_id').notNull().references(() => user.id, { onDelete: 'cascade' }),
  slabId: integer('slab_id').notNull().references(() => slabs.id, { onDelete: 'cascade' }),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  notifiedAt: timestamp('notified_at', { withTimezone: true }),
}, (t) => [
  uniqueIndex('slab_watches_one_open').on(t.userId, t.slabId).where(sql`${t.notifiedAt} is null`),
  index('slab_watches_open_idx').on(t.slabId).where(sql`${t.notifiedAt} is null`),
]);
