import { check, index, integer, pgTable, serial, text, timestamp } from 'drizzle-orm/pg-core';
import { oneOf, within } from './checks';

export const OUTBOX_STATUSES = ['pending', 'sent', 'failed'] as const;

/** Outgoing mail is written here in the same transaction as the change it reports, then sent with retries. */
export const emailOutbox = pgTable('email_outbox', {
  id: serial('id').primaryKey(),
  toAddress: text('to_address').notNull(),
  subject: text('subject').notNull(),
  html: text('html').notNull(),
  text: text('text').notNull(),
  kind: text('kind').notNull(),
  status: text('status').notNull().default('pending'), // pending | sent | failed
  attempts: integer('attempts').notNull().default(0),
  lastError: text('last_error'),
  sendAfter: timestamp('send_after', { withTimezone: true }).notNull().defaultNow(),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  sentAt: timestamp('sent_at', { withTimezone: true }),
}, (t) => [
  index('email_outbox_pending_idx').on(t.status, t.sendAfter),
  check('email_outbox_status_known', oneOf(t.status, OUTBOX_STATUSES)),
  check('email_outbox_attempts_in_range', within(t.attempts, 0, 1000, { minInclusive: true })),
]);
