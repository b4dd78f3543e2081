/**
 * Sane maxima for every input of the wood math. Anything past these is a typing slip or an attack,
 * not a slab, and is refused with a WoodMathError naming the field instead of returning Infinity,
 * NaN or an invalid date. They are Stickerline's own bounds, chosen well above the largest real
 * stock (the biggest logs sawn into slabs are a few feet across; a long beam is a few tens of feet).
 */
export const WOOD_LIMITS = {
  /** 4 ft: thicker than any slab or end-grain round. */
  thicknessIn: 48,
  /** 12 ft: wider than any slab from a real log. */
  widthIn: 144,
  /** 60 ft. */
  lengthIn: 720,
  lengthFt: 60,
  /** 12 ft log diameter. */
  diameterIn: 144,
  /** Cup and twist of a face. */
  deviationIn: 12,
  /** A router-sled or planer pass: from 1/64 in up to 1 in. */
  minPassDepthIn: 1 / 64,
  maxPassDepthIn: 1,
  kerfIn: 2,
  /** Any inch figure formatted or parsed for display. */
  anyInches: 100_000,
  /** 10 short tons: far above any single slab. */
  weightLb: 20_000,
  /** Stations a slab's width may be measured at. */
  widthStations: 200,
  /** 4 ft in quarters. */
  nominalQuarters: 192,
  /** A rate per board foot or per square foot: $100,000. */
  rateCents: 10_000_000,
  /** A price, override, minimum charge or typed dollar amount: $100 million. Far below Number.MAX_SAFE_INTEGER (about 9e15). */
  priceCents: 10_000_000_000,
  /** Price multipliers (figure, thick stock). */
  maxMultiplier: 10,
  /** Dates handled by the drying math. */
  minYear: 1900,
  maxYear: 2200,
} as const;
