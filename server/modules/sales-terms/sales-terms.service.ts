import type { Db, Tx } from '../../db/client';
import { notFound } from '../../lib/errors';
import { recordAudit } from '../../lib/audit';
import type { SessionUser } from '../../lib/session';
import {
  toMilliPercent, type CertificateStatus, type OfficeCertificateView, type PublicSalesTerms, type ResaleCertificateView, type SalesTerms, type TaxRule,
} from '../../../shared/sales-terms';
import * as repo from './sales-terms.repo';

type TermsRow = NonNullable<Awaited<ReturnType<typeof repo.readTerms>>>;
const fromRow = (t: TermsRow | null): SalesTerms => ({
  salesTaxPercent: (t?.salesTaxMilliPercent ?? 0) / 1000, taxWood: t?.taxWood ?? true, taxFlattening: t?.taxFlattening ?? true,
  policy: t?.policy ?? '', phone: t?.phone ?? '', yardHours: t?.yardHours ?? '',
});

export const getSalesTerms = async (db: Tx) => fromRow(await repo.readTerms(db));

export async function getPublicSalesTerms(db: Tx): Promise<PublicSalesTerms> {
  const [terms, mill] = await Promise.all([repo.readTerms(db), repo.readMill(db)]);
  return { ...fromRow(terms), millName: mill?.millName ?? '', contactEmail: mill?.contactEmail ?? '', yardAddress: mill?.yardAddress ?? '' };
}

export async function saveSalesTerms(db: Db, actor: SessionUser, input: SalesTerms) {
  return db.transaction(async (tx) => {
    const before = await getSalesTerms(tx);
    const { salesTaxPercent, ...rest } = input;
    await repo.upsertTerms(tx, { ...rest, salesTaxMilliPercent: toMilliPercent(salesTaxPercent) });
    const after = await getSalesTerms(tx);
    await recordAudit(tx, { actor, action: 'sales-terms.update', entityType: 'mill_settings', entityId: 1, before, after });
    return after;
  });
}

/** The tax rule for one buyer's checkout: the mill's rate and scope, and whether an approved certificate exempts them. */
export async function taxRuleFor(tx: Tx, buyerId: string): Promise<TaxRule & { certificate: string | null }> {
  const [terms, cert] = await Promise.all([repo.readTerms(tx), repo.certificateOf(tx, buyerId)]);
  const approved = cert?.status === 'approved' ? cert.number : null;
  return {
    rateMilliPercent: terms?.salesTaxMilliPercent ?? 0, taxWood: terms?.taxWood ?? true, taxFlattening: terms?.taxFlattening ?? true,
    exempt: approved !== null, certificate: approved,
  };
}

type CertRow = NonNullable<Awaited<ReturnType<typeof repo.certificateOf>>>;
const certView = (c: CertRow): ResaleCertificateView => ({
  id: c.id, number: c.number, status: c.status as CertificateStatus, submittedAt: c.submittedAt.toISOString(), reviewedAt: c.reviewedAt?.toISOString() ?? null,
});

export async function myCertificate(db: Tx, buyerId: string) {
  const c = await repo.certificateOf(db, buyerId);
  return c ? certView(c) : null;
}

export async function submitMyCertificate(db: Db, buyer: SessionUser, number: string) {
  return db.transaction(async (tx) => {
    const row = await repo.submitCertificate(tx, buyer.id, number);
    await recordAudit(tx, { actor: buyer, action: 'resale-certificate.submit', entityType: 'resale_certificate', entityId: row.id, after: { number } });
    return certView(row);
  });
}

export async function listCertificates(db: Tx): Promise<OfficeCertificateView[]> {
  return (await repo.allCertificates(db)).map((r) => ({ ...certView(r.cert), buyerName: r.buyerName, buyerEmail: r.buyerEmail }));
}

export async function reviewCertificate(db: Db, actor: SessionUser, id: number, decision: 'approved' | 'refused') {
  return db.transaction(async (tx) => {
    const row = await repo.reviewCertificate(tx, id, decision, actor.id);
    if (!row) throw notFound('That certificate');
    await recordAudit(tx, { actor, action: `resale-certificate.${decision}`, entityType: 'resale_certificate', entityId: id, after: { number: row.number, status: decision } });
    return certView(row);
  });
}
