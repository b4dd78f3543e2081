import { boardFeet, roundBoardFeet } from './board-feet';
import { requireCents, requireInRange, WoodMathError } from './errors';
import { faceAreaSqFt } from './flattening';
import { WOOD_LIMITS } from './limits';
import { roundCents, roundHalfAwayFromZero } from './rounding';

export type PricingRules = {
  /** Multiplier per figure slug; a slab gets only its largest one. */
  figurePremiums: Record<string, number>;
  thickPremium: { minThicknessIn: number; multiplier: number };
  minimumChargeCents: number;
  flatteningCentsPerSqFt: number;
};

/** The demo mill's choices. Invented for Stickerline's demo, not market data. */
export const DEFAULT_PRICING_RULES: PricingRules = {
  figurePremiums: { crotch: 1.5, burl: 1.75, curl: 1.25, spalted: 1.2, quilted: 1.4 },
  thickPremium: { minThicknessIn: 3, multiplier: 1.15 },
  minimumChargeCents: 2500,
  flatteningCentsPerSqFt: 800,
};

export type PriceLineCode = 'base' | 'figure' | 'thickness' | 'minimum' | 'override' | 'flattening';
export type PriceLine = { code: PriceLineCode; label: string; amountCents: number };

export type SlabPriceInput = {
  thicknessIn: number;
  widthIn: number;
  lengthIn: number;
  ratePerBoardFootCents: number;
  figures?: string[];
  withFlattening?: boolean;
  overrideCents?: number | null;
  overrideReason?: string | null;
  rules?: PricingRules;
};

export type SlabPriceBreakdown = {
  /** Board feet rounded to 2 decimals: the figure printed on the price tag. */
  boardFeet: number;
  lines: PriceLine[];
  slabCents: number;
  flatteningCents: number;
  totalCents: number;
};

const dollars = (cents: number) => `$${(cents / 100).toFixed(2)}`;
/** A premium multiplier as the percentage printed on its line (up to 2 decimals), so the line multiplies out. */
const premiumPercent = (multiplier: number) => roundHalfAwayFromZero((multiplier - 1) * 100, 2);
/** A premium line: "<what>, P % of $base", whose amount is exactly P % of the base, rounded to the cent once. */
function premiumLine(code: 'figure' | 'thickness', what: string, multiplier: number, base: number): PriceLine {
  const percent = premiumPercent(multiplier);
  return { code, label: `${what}: ${percent} % of ${dollars(base)}`, amountCents: roundCents((base * percent) / 100) };
}
/** Face area as printed on the flattening line: square feet to 2 decimals. */
export const roundSqFt = (sqFt: number) => roundHalfAwayFromZero(sqFt, 2);
const sum = (lines: PriceLine[]) => lines.reduce((total, line) => total + line.amountCents, 0);

/**
 * Every line whose label shows a multiplication (bd ft × rate, P % of base, sq ft × rate) uses the
 * printed figures, so a buyer multiplying the label out gets the amount to the cent.
 * Flattening covers both faces and is charged on the area of one face.
 *
 * Rounding rule: each line is rounded half away from zero to whole cents once,
 * when it is made; slab, flattening and total are sums of rounded lines.
 * The base uses the 2-decimal board feet the buyer sees, so the tag's
 * arithmetic can be checked by hand.
 *
 * Premiums are not stacked: only the largest figure premium applies, because
 * figure tags overlap (a crotch is usually also curly) and a slab sells for its
 * best feature, not the count of its tags. Figure and thickness premiums are
 * both taken on the base, so neither compounds the other.
 */
export function slabPriceBreakdown(input: SlabPriceInput): SlabPriceBreakdown {
  const { thicknessIn, widthIn, lengthIn, ratePerBoardFootCents } = input;
  const rules = input.rules ?? DEFAULT_PRICING_RULES;
  requireCents(ratePerBoardFootCents, 'ratePerBoardFootCents', WOOD_LIMITS.rateCents);
  const bf = roundBoardFeet(boardFeet({ thicknessIn, widthIn, lengthIn }));

  const base = roundCents(bf * ratePerBoardFootCents);
  const lines: PriceLine[] = [
    { code: 'base', label: `${bf} bd ft × ${dollars(ratePerBoardFootCents)}/bd ft`, amountCents: base },
  ];

  let best: { slug: string; multiplier: number } | undefined;
  for (const slug of input.figures ?? []) {
    const multiplier = rules.figurePremiums[slug];
    if (multiplier === undefined) continue; // a figure with no premium costs nothing extra
    requireInRange(multiplier, `rules.figurePremiums.${slug}`, 0, WOOD_LIMITS.maxMultiplier);
    if (premiumPercent(multiplier) > 0 && (!best || multiplier > best.multiplier)) best = { slug, multiplier };
  }
  if (best) lines.push(premiumLine('figure', `Figure premium, ${best.slug}`, best.multiplier, base));

  const thick = rules.thickPremium;
  requireInRange(thick.multiplier, 'rules.thickPremium.multiplier', 0, WOOD_LIMITS.maxMultiplier);
  requireInRange(thick.minThicknessIn, 'rules.thickPremium.minThicknessIn', 0, WOOD_LIMITS.thicknessIn);
  if (thicknessIn >= thick.minThicknessIn && premiumPercent(thick.multiplier) !== 0) {
    lines.push(premiumLine('thickness', `Thick stock, ${thick.minThicknessIn} in and over`, thick.multiplier, base));
  }

  const computed = sum(lines);
  requireCents(rules.minimumChargeCents, 'rules.minimumChargeCents', WOOD_LIMITS.priceCents);
  if (computed < rules.minimumChargeCents) {
    lines.push({ code: 'minimum', label: `Topped up to the ${dollars(rules.minimumChargeCents)} minimum`,
      amountCents: rules.minimumChargeCents - computed });
  }

  if (input.overrideCents !== undefined && input.overrideCents !== null) {
    requireCents(input.overrideCents, 'overrideCents', WOOD_LIMITS.priceCents);
    const reason = input.overrideReason?.trim();
    if (!reason) throw new WoodMathError('overrideReason is required when overrideCents is set', 'overrideReason');
    // The override line is the difference, so the computed lines stay visible and everything still sums.
    lines.push({ code: 'override', label: `Price set to ${dollars(input.overrideCents)}: ${reason}`,
      amountCents: input.overrideCents - sum(lines) });
  }
  const slabCents = sum(lines);

  let flatteningCents = 0;
  if (input.withFlattening) {
    requireCents(rules.flatteningCentsPerSqFt, 'rules.flatteningCentsPerSqFt', WOOD_LIMITS.rateCents);
    const area = roundSqFt(faceAreaSqFt(widthIn, lengthIn));
    flatteningCents = roundCents(area * rules.flatteningCentsPerSqFt);
    lines.push({ code: 'flattening',
      label: `Flattening both faces, charged on one face: ${area.toFixed(2)} sq ft × ${dollars(rules.flatteningCentsPerSqFt)}/sq ft`,
      amountCents: flatteningCents });
  }

  return { boardFeet: bf, lines, slabCents, flatteningCents, totalCents: slabCents + flatteningCents };
}

/** The total a buyer pays for the slab, flattening included when asked for. */
export function slabPriceCents(input: SlabPriceInput): number {
  return slabPriceBreakdown(input).totalCents;
}
