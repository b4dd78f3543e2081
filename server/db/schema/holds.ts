import { sql } from 'drizzle-orm';
import { check, index, integer, pgTable, serial, text, timestamp, uniqueIndex } from 'drizzle-orm/pg-core';
import { slabs } from './slabs';
import { user } from './auth';
import { HOLD_STATUSES } from '../../../shared/holds';
import { oneOf } from './checks';

export const holds = pgTable('holds', {
  id: serial('id').primaryKey(),
  slabId: integer('slab_id').notNull().references(() => slabs.id),
  buyerId: text('buyer_id').notNull().references(() => user.id, { onDelete: 'cascade' }),
  /** Holds placed together (a matched set) share a group id. */
  groupId: text('group_id'),
  status: text('status').notNull().default('active'), // active | released | expired | converted
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
  closedAt: timestamp('closed_at', { withTimezone: true }),
  closedBy: text('closed_by'),
}, (t) => [
  // The database, not JavaScript, guarantees one live hold per slab.
  uniqueIndex('holds_one_active_per_slab').on(t.slabId).where(sql`${t.status} = 'active'`),
  index('holds_buyer_idx').on(t.buyerId, t.status),
  index('holds_expiry_idx').on(t.status, t.expiresAt),
  check('holds_status_known', oneOf(t.status, HOLD_STATUSES)),
  check('holds_expire_after_start', sql`${t.expiresAt} > ${t.createdAt}`),
  check('holds_closed_when_ended', sql`(${t.status} = 'active') = (${t.closedAt} is null)`),
]);
