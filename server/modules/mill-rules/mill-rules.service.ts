import type { Db, Tx } from '../../db/client';
import { AppError } from '../../lib/errors';
import { recordAudit } from '../../lib/audit';
import type { SessionUser } from '../../lib/session';
import { DEFAULT_PRICING_RULES } from '../../../shared/wood/index';
import type { MillRules, MillRulesSaved, MillRulesView } from '../../../shared/mill-rules';
import { loadPricingRules } from '../pricing/pricing.service';
import { derivedSlabColumns } from '../slabs/slab-derived';
import * as repo from './mill-rules.repo';

/** The rules as saved, or the shared defaults before the mill has saved any. */
export async function getMillRules(db: Tx): Promise<MillRulesView> {
  const [settings, speciesRows, figures] = await Promise.all([repo.readSettings(db), repo.readSpecies(db), repo.readFigures(db)]);
  return {
    millName: settings?.millName ?? '',
    contactEmail: settings?.contactEmail ?? '',
    holdHours: settings?.holdHours ?? 48,
    targetMcPercent: settings?.targetMcPercent ?? 8,
    maxReadingAgeDays: settings?.maxReadingAgeDays ?? 60,
    minimumChargeCents: settings?.minimumChargeCents ?? DEFAULT_PRICING_RULES.minimumChargeCents,
    thickPremiumMinIn: settings?.thickPremiumMinIn ?? DEFAULT_PRICING_RULES.thickPremium.minThicknessIn,
    thickPremiumMultiplier: settings?.thickPremiumMultiplier ?? DEFAULT_PRICING_RULES.thickPremium.multiplier,
    flatteningCentsPerSqFt: settings?.flatteningCentsPerSqFt ?? DEFAULT_PRICING_RULES.flatteningCentsPerSqFt,
    noShowRule: (settings?.noShowRule ?? 'keep') as MillRules['noShowRule'],
    speciesRates: Object.fromEntries(speciesRows.map((s) => [s.slug, s.ratePerBoardFootCents])),
    figurePremiums: Object.fromEntries(figures.map((f) => [f.slug, f.premiumMultiplier])),
    species: speciesRows.map((s) => ({ slug: s.slug, name: s.name, ratePerBoardFootCents: s.ratePerBoardFootCents })),
    figures: figures.map((f) => ({ slug: f.slug, label: f.label, premiumMultiplier: f.premiumMultiplier })),
  };
}

/**
 * Saves the rules and reprices every unsold slab in the same transaction, so the stored prices the
 * catalogue filters and sorts by always agree with what the shared price formula says now.
 * Sold slabs keep the price their order recorded.
 */
export async function saveMillRules(db: Db, actor: SessionUser, input: MillRules): Promise<MillRulesSaved> {
  return db.transaction(async (tx) => {
    const before = await getMillRules(tx);
    const { speciesRates, figurePremiums, ...settings } = input;
    await repo.upsertSettings(tx, settings);
    for (const [slug, cents] of Object.entries(speciesRates)) {
      if (!(await repo.setSpeciesRate(tx, slug, cents)).length) throw new AppError(400, 'validation', `Unknown species ${slug}.`, { [`speciesRates.${slug}`]: ['Unknown species'] });
    }
    for (const [slug, multiplier] of Object.entries(figurePremiums)) {
      if (!(await repo.setFigurePremium(tx, slug, multiplier)).length) throw new AppError(400, 'validation', `Unknown figure ${slug}.`, { [`figurePremiums.${slug}`]: ['Unknown figure'] });
    }
    const rules = await loadPricingRules(tx);
    let repricedSlabs = 0;
    for (const { slab, rate } of await repo.unsoldSlabs(tx)) {
      const { priceCents } = derivedSlabColumns(slab, rate, rules);
      if (priceCents !== slab.priceCents) {
        await repo.setSlabPrice(tx, slab.id, priceCents);
        repricedSlabs++;
      }
    }
    const after = await getMillRules(tx);
    const strip = ({ species: _s, figures: _f, ...rest }: MillRulesView) => rest;
    await recordAudit(tx, { actor, action: 'mill-rules.update', entityType: 'mill_settings', entityId: 1, before: strip(before), after: { ...strip(after), repricedSlabs } });
    return { ...after, repricedSlabs };
  });
}

/** A fresh shop without demo data still needs its settings row: pickups and prices read it. */
export async function ensureMillSettings(db: Db) {
  if (await repo.readSettings(db)) return;
  await repo.upsertSettings(db, { millName: 'Our mill', contactEmail: 'yard@example.test' });
}
