import { z } from 'zod';

const slugKey = z.string().regex(/^[a-z][a-z0-9-]{0,59}$/, 'Unknown name');

/** The mill's own rules an admin edits: holds, drying target, prices. Money in integer cents. */
export const millRulesSchema = z.object({
  millName: z.string().trim().min(1, 'Give the mill a name').max(80, 'Keep the name under 80 characters'),
  contactEmail: z.email('Enter an e-mail address buyers can write to'),
  holdHours: z.number({ error: 'Hold length must be a number' }).int('Whole hours, please').min(1, 'At least 1 hour').max(336, 'At most 14 days (336 hours)'),
  targetMcPercent: z.number({ error: 'Target must be a number' }).min(4, 'Below 4 % is not reachable in a shop').max(20, 'Above 20 % is not dry stock'),
  maxReadingAgeDays: z.number({ error: 'Must be a number' }).int('Whole days, please').min(1, 'At least 1 day').max(365, 'At most a year'),
  minimumChargeCents: z.number({ error: 'Must be a number of cents' }).int('Whole cents').min(0, 'Cannot be negative').max(10_000_00, 'At most $10,000'),
  thickPremiumMinIn: z.number({ error: 'Must be a number' }).min(0.5, 'At least 1/2 in').max(12, 'At most 12 in'),
  thickPremiumMultiplier: z.number({ error: 'Must be a number' }).min(1, 'A premium cannot lower the price (1 = none)').max(3, 'At most ×3'),
  flatteningCentsPerSqFt: z.number({ error: 'Must be a number of cents' }).int('Whole cents').min(0, 'Cannot be negative').max(100_00, 'At most $100 per sq ft'),
  noShowRule: z.enum(['keep', 'release-and-refund'], { error: 'Choose keep or release-and-refund' }),
  speciesRates: z.record(slugKey, z.number({ error: 'Rate must be a number of cents' }).int('Whole cents').min(1, 'A rate must be above zero').max(100_000, 'At most $1,000 per board foot')),
  figurePremiums: z.record(slugKey, z.number({ error: 'Must be a number' }).min(1, 'A premium cannot lower the price (1 = none)').max(5, 'At most ×5')),
}).strict();

export type MillRules = z.infer<typeof millRulesSchema>;

export type MillRulesView = MillRules & {
  species: { slug: string; name: string; ratePerBoardFootCents: number }[];
  figures: { slug: string; label: string; premiumMultiplier: number }[];
};

export type MillRulesSaved = MillRulesView & { repricedSlabs: number };
