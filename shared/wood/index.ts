/**
 * Stickerline wood math: the one public entry to shared/wood. Pure functions
 * with no Node, database or UI imports, so the browser and the server share them.
 */
export { WoodMathError } from './errors';
export { WOOD_LIMITS } from './limits';
export { roundHalfAwayFromZero, roundCents } from './rounding';
export {
  boardFeet, roundBoardFeet, averageWidthIn, lumberTallyBoardFeet, CUBIC_INCHES_PER_BOARD_FOOT,
  type BoardFeetInput, type LumberTallyInput,
} from './board-feet';
export {
  slabPriceBreakdown, slabPriceCents, roundSqFt, DEFAULT_PRICING_RULES,
  type PricingRules, type PriceLine, type PriceLineCode, type SlabPriceInput, type SlabPriceBreakdown,
} from './pricing';
export {
  equilibriumMoistureContent, equilibriumMoistureContentC, moistureContentPercent, FIBER_SATURATION_MC,
  maxMoistureContentPercent, CELL_WALL_SPECIFIC_GRAVITY, ABSOLUTE_MAX_MOISTURE_CONTENT_PERCENT,
  type EmcInputF, type EmcInputC, type MoistureContentInput,
} from './moisture';
export {
  dimensionalChangeIn, dimensionalChangeDetail, shrinkageFromGreenPercent, relativeSizeAtMc, COEFFICIENT_MC_RANGE,
  MOVEMENT_METHOD_NOTE,
  type Grain, type DimensionalChangeInput, type DimensionalChangeDetail,
} from './shrinkage';
export {
  slabWeightLb, woodDensityLbPerCuFt, specificGravityAtMc, weighingMoistureContent, WATER_DENSITY_LB_PER_CU_FT,
  type SlabWeightInput, type WoodDensityInput,
} from './weight';
export {
  airDryReadyDate, dryingStateFor, parseWoodDate, DRYING_STATES, DEFAULT_AIR_DRY_MC,
  type DryingState, type AirDryInput, type DryingStateInput,
} from './drying';
export {
  dryingForecast, DEFAULT_YARD_EMC_PERCENT, MIN_READINGS_FOR_FIT, FORECAST_HORIZON_YEARS, DRYING_MODEL_WORDS, RULE_OF_THUMB_WORDS,
  type DryingForecast, type DryingForecastInput, type DryingForecastBasis, type DatedReading,
} from './drying-forecast';
export {
  flatteningEstimate, faceAreaSqFt, DEFAULT_PASS_DEPTH_IN, DEFAULT_MIN_FINISHED_THICKNESS_IN,
  type FlatteningInput, type FlatteningEstimate,
} from './flattening';
export {
  lifting, recommendedWeightLimit, NIOSH_LOAD_CONSTANT_LB, TYPICAL_SLAB_LIFT, TYPICAL_SLAB_LIFT_WORDS, SLAB_LIFT_RWL_LB,
  TEAM_OF_TWO_SHARE, MAX_HAND_CREW, LIFTING_BASIS,
  type LiftingInput, type LiftingAdvice, type LiftingTier, type LiftGeometry, type RecommendedWeightLimit,
} from './lifting';
export {
  SPECIES, getSpecies, speciesMaxMoistureContentPercent, requireSpeciesMoistureContent, HIGHEST_MAX_MOISTURE_CONTENT_PERCENT,
  type Species, type SpeciesShrinkage,
} from './species';
export {
  toSixteenths, formatInches, formatLength, formatLongLength, formatDimensions, formatWeight, formatBoardFeet, formatArea,
  formatPercent, formatDays, plainNumber, parseInches, inchesForInput, formatCents, centsAsPlainDollars, parseDollarsToCents,
  UNIT_SYSTEMS, UNIT_SYSTEM_LABELS, isUnitSystem, MM_PER_INCH, KG_PER_POUND, type UnitSystem, type ParseInchesOptions,
} from './format';
export { cutPlan, CHAINSAW_KERF_IN, DEFAULT_FLATTEN_ALLOWANCE_IN, type CutPlan, type CutPlanInput, type PlannedSlab } from './cut-plan';
