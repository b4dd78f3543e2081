import { z } from 'zod';
import { salesTaxCents, splitProRata } from './money';

export const POLICY_MAX = 4000;

/**
 * The mill's sales terms an admin edits: the yard's sales-tax rate and what it applies to, the
 * sale / cancellation / refund policy buyers accept at checkout, and the contact details shown with it.
 */
export const salesTermsSchema = z.object({
  /** Percent with up to three decimals (7.25 = 7.25 %); stored as thousandths of a percent. */
  salesTaxPercent: z.number({ error: 'Enter the tax rate as a number (0 for none)' }).min(0, 'Cannot be negative').max(25, 'At most 25 %')
    .refine((n) => Math.abs(n * 1000 - Math.round(n * 1000)) < 1e-6, 'At most three decimals'),
  taxWood: z.boolean(),
  taxFlattening: z.boolean(),
  policy: z.string().trim().min(20, 'Write the policy out (at least a sentence or two)').max(POLICY_MAX, `Keep it under ${POLICY_MAX} characters`),
  phone: z.string().trim().min(7, 'Enter a phone number buyers can call').max(40, 'Too long for a phone number'),
  yardHours: z.string().trim().min(3, 'Say when the yard is open').max(200, 'Keep it under 200 characters'),
}).strict();
export type SalesTerms = z.infer<typeof salesTermsSchema>;

/** What anyone may read: the terms plus the mill's name, e-mail and yard address. */
export type PublicSalesTerms = SalesTerms & { millName: string; contactEmail: string; yardAddress: string };

export const toMilliPercent = (percent: number) => Math.round(percent * 1000);

export const RESALE_NUMBER_PATTERN = /^[A-Za-z0-9][A-Za-z0-9 ./-]{3,39}$/;
export const resaleCertificateSchema = z.object({
  number: z.string({ error: 'Enter the certificate number' }).trim().regex(RESALE_NUMBER_PATTERN, 'Enter the number as printed on the certificate (4–40 letters, digits, spaces, . / -)'),
}).strict();
export const CERTIFICATE_STATUSES = ['submitted', 'approved', 'refused'] as const;
export type CertificateStatus = (typeof CERTIFICATE_STATUSES)[number];
export type ResaleCertificateView = { id: number; number: string; status: CertificateStatus; submittedAt: string; reviewedAt: string | null };
export type OfficeCertificateView = ResaleCertificateView & { buyerName: string; buyerEmail: string };

export type TaxableLine = { slabCents: number; servicesCents: number };
export type TaxRule = { rateMilliPercent: number; taxWood: boolean; taxFlattening: boolean; exempt: boolean };

/**
 * The one tax computation (server and checkout preview): the order's taxable amount is the wood
 * and/or flattening the mill taxes; tax is computed once on that sum (shared/money salesTaxCents)
 * and spread over the lines in proportion to their taxable amounts, adding up exactly.
 */
export function taxForLines(lines: TaxableLine[], rule: TaxRule) {
  const taxable = lines.map((l) => (rule.taxWood ? l.slabCents : 0) + (rule.taxFlattening ? l.servicesCents : 0));
  const total = rule.exempt ? 0 : salesTaxCents(taxable.reduce((n, c) => n + c, 0), rule.rateMilliPercent);
  return { taxCents: total, perLine: splitProRata(total, taxable) };
}
