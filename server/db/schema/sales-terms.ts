import { sql } from 'drizzle-orm';
import { boolean, check, index, integer, pgTable, serial, text, timestamp, uniqueIndex } from 'drizzle-orm/pg-core';
import { user } from './auth';

/** One row (id = 1): the mill's sales-tax rate, what it taxes, its policy and contact details for buyers. */
export const salesTerms = pgTable('sales_terms', {
  id: integer('id').primaryKey().default(1),
  /** Thousandths of a percent: 7.25 % is 7250. */
  salesTaxMilliPercent: integer('sales_tax_milli_percent').notNull().default(0),
  taxWood: boolean('tax_wood').notNull().default(true),
  taxFlattening: boolean('tax_flattening').notNull().default(true),
  policy: text('policy').notNull().default(''),
  phone: text('phone').notNull().default(''),
  yardHours: text('yard_hours').notNull().default(''),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
}, (t) => [
  check('sales_terms_one_row', sql`${t.id} = 1`),
  check('sales_terms_tax_range', sql`${t.salesTaxMilliPercent} between 0 and 25000`),
]);

/** A buyer's resale certificate number; approved by the office, it exempts the buyer's orders from sales tax. */
export const resaleCertificates = pgTable('resale_certificates', {
  id: serial('id').primaryKey(),
  buyerId: text('buyer_id').notNull().references(() => user.id, { onDelete: 'cascade' }),
  number: text('number').notNull(),
  status: text('status').notNull().default('submitted'),
  submittedAt: timestamp('submitted_at', { withTimezone: true }).notNull().defaultNow(),
  reviewedBy: text('reviewed_by'),
  reviewedAt: timestamp('reviewed_at', { withTimezone: true }),
}, (t) => [
  uniqueIndex('resale_certificates_one_per_buyer').on(t.buyerId),
  index('resale_certificates_status_idx').on(t.status),
  check('resale_certificates_status', sql`${t.status} in ('submitted', 'approved', 'refused')`),
]);
