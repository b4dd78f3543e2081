import { averageWidthIn, boardFeet, slabPriceBreakdown, type PricingRules } from '../../../shared/wood/index';

export type SlabMeasures = {
  thicknessIn: number;
  widthsIn: number[];
  lengthIn: number;
  figures: string[];
  priceOverrideCents?: number | null;
  priceOverrideReason?: string | null;
};

/**
 * The stored, derived columns of a slab (average width, board feet, price), always computed by
 * the shared wood math so the catalogue's filters and sorts agree with what buyers are shown.
 */
export function derivedSlabColumns(m: SlabMeasures, ratePerBoardFootCents: number, rules: PricingRules) {
  const widthIn = averageWidthIn(m.widthsIn);
  const price = slabPriceBreakdown({
    thicknessIn: m.thicknessIn, widthIn, lengthIn: m.lengthIn, ratePerBoardFootCents,
    figures: m.figures, overrideCents: m.priceOverrideCents, overrideReason: m.priceOverrideReason, rules,
  });
  return { widthIn, boardFeet: boardFeet({ thicknessIn: m.thicknessIn, widthIn, lengthIn: m.lengthIn }), priceCents: price.slabCents };
}
