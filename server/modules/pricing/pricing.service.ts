import type { Tx } from '../../db/client';
import { DEFAULT_PRICING_RULES, type PricingRules } from '../../../shared/wood/index';
import { readFigureKinds, readMillSettings } from './pricing.repo';

/**
 * The mill's pricing rules as the shared price formula expects them: figure premiums from the
 * figure kinds table, the rest from the mill's settings (the shared defaults before the mill has
 * saved any).
 */
export async function loadPricingRules(db: Tx): Promise<PricingRules> {
  const [settings, figures] = await Promise.all([readMillSettings(db), readFigureKinds(db)]);
  const figurePremiums = figures.length
    ? Object.fromEntries(figures.map((f) => [f.slug, f.premiumMultiplier]))
    : DEFAULT_PRICING_RULES.figurePremiums;
  if (!settings) return { ...DEFAULT_PRICING_RULES, figurePremiums };
  return {
    figurePremiums,
    thickPremium: { minThicknessIn: settings.thickPremiumMinIn, multiplier: settings.thickPremiumMultiplier },
    minimumChargeCents: settings.minimumChargeCents,
    flatteningCentsPerSqFt: settings.flatteningCentsPerSqFt,
  };
}
