import { asc, eq } from 'drizzle-orm';
import type { Tx } from '../../db/client';
import { millSettings, resaleCertificates, salesTerms, user } from '../../db/schema/index';

export const readTerms = async (db: Tx) => (await db.select().from(salesTerms).where(eq(salesTerms.id, 1)))[0] ?? null;
export const readMill = async (db: Tx) => (await db.select().from(millSettings).where(eq(millSettings.id, 1)))[0] ?? null;

export async function upsertTerms(db: Tx, values: Omit<typeof salesTerms.$inferInsert, 'id' | 'updatedAt'>) {
  const now = new Date();
  await db.insert(salesTerms).values({ id: 1, ...values, updatedAt: now }).onConflictDoUpdate({ target: salesTerms.id, set: { ...values, updatedAt: now } });
}

export const certificateOf = async (db: Tx, buyerId: string) =>
  (await db.select().from(resaleCertificates).where(eq(resaleCertificates.buyerId, buyerId)))[0] ?? null;

/** A new or changed number always goes back to the office for review. */
export async function submitCertificate(db: Tx, buyerId: string, number: string) {
  const now = new Date();
  const [row] = await db.insert(resaleCertificates).values({ buyerId, number, status: 'submitted', submittedAt: now })
    .onConflictDoUpdate({ target: resaleCertificates.buyerId, set: { number, status: 'submitted', submittedAt: now, reviewedBy: null, reviewedAt: null } }).returning();
  return row;
}

export const allCertificates = (db: Tx) =>
  db.select({ cert: resaleCertificates, buyerName: user.name, buyerEmail: user.email }).from(resaleCertificates)
    .innerJoin(user, eq(user.id, resaleCertificates.buyerId)).orderBy(asc(resaleCertificates.status), asc(resaleCertificates.submittedAt));

export async function reviewCertificate(db: Tx, id: number, status: 'approved' | 'refused', reviewedBy: string) {
  const [row] = await db.update(resaleCertificates).set({ status, reviewedBy, reviewedAt: new Date() }).where(eq(resaleCertificates.id, id)).returning();
  return row ?? null;
}
