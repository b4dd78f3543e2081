import { flatteningEstimate, slabPriceBreakdown, slabWeightLb, weighingMoistureContent, type PricingRules } from '../../../shared/wood/index';
import type { FlatteningOffer } from '../../../shared/holds';
import type { slabs, species } from '../../db/schema/index';

/**
 * Until someone measures it at the machine, an air-dried slab is taken to be up to 1/4 in out of
 * flat (cup plus twist) — a cautious figure for air-dried slabs (common practice). Thin slabs that
 * could not stay above the minimum finished thickness are therefore not offered flattening.
 */
export const ASSUMED_FLATNESS_DEVIATION_IN = 1 / 4;

type SlabRow = typeof slabs.$inferSelect;
type SpeciesRow = typeof species.$inferSelect;

/** Price, weight and flattening for one slab, all through the shared wood math. */
export function quoteSlab(slab: SlabRow, sp: SpeciesRow, latestMcPercent: number | null, rules: PricingRules, withFlattening = false) {
  const priceInput = {
    thicknessIn: slab.thicknessIn, widthIn: slab.widthIn, lengthIn: slab.lengthIn,
    ratePerBoardFootCents: sp.ratePerBoardFootCents, figures: slab.figures,
    overrideCents: slab.priceOverrideCents, overrideReason: slab.priceOverrideReason, rules,
  };
  const estimate = flatteningEstimate({ thicknessIn: slab.thicknessIn, widthIn: slab.widthIn, lengthIn: slab.lengthIn, deviationIn: ASSUMED_FLATNESS_DEVIATION_IN });
  const flatteningPrice = slabPriceBreakdown({ ...priceInput, withFlattening: true }).flatteningCents;
  const flattening: FlatteningOffer = {
    feasible: estimate.feasible && rules.flatteningCentsPerSqFt > 0,
    priceCents: flatteningPrice,
    finishedThicknessIn: estimate.finishedThicknessIn,
    ...(estimate.feasible ? (rules.flatteningCentsPerSqFt > 0 ? {} : { reason: 'The mill does not offer flattening at the moment.' }) : { reason: estimate.reason }),
  };
  const weighing = weighingMoistureContent(sp.slug, latestMcPercent);
  const mcPercent = weighing.mcPercent;
  const weightLb = slabWeightLb({ speciesSlug: sp.slug, thicknessIn: slab.thicknessIn, widthIn: slab.widthIn, lengthIn: slab.lengthIn, mcPercent });
  const breakdown = slabPriceBreakdown({ ...priceInput, withFlattening });
  return { breakdown, weightLb, mcPercent, weighing, flattening };
}
