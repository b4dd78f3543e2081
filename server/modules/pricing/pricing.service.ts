import type { Tx } from '../../db/client';
import { DEFAULT_PRICING_RULES, type PricingRules } from '../../../shared/wood/index';
import { readFigureKinds, readMillSettings } from './pricing.repo';

/** The mill's pricing rules as the shared price formula expects them, read from settings + figure kinds. */
export async function loadPricingRules(db: Tx): Promise<PricingRules> {
  const [settings, figures] = await Promise.all([readMillSettings(db), readFigureKinds(db)]);
  if (!settings) return DEFAULT_PRICING_RULES;
  return {
    figurePremiums: Object.fromEntries(figures.map((f) => [f.slug, f.premiumMultiplier])),
    thickPremium: { minThicknessIn: settings.thickPremiumMinIn, multiplier: settings.thickPremiumMultiplier },
    minimumChargeCents: settings.minimumChargeCents,
    flatteningCentsPerSqFt: settings.flatteningCentsPerSqFt,
  };
}
