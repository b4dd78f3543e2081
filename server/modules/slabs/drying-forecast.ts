import { DEFAULT_AIR_DRY_MC, dryingForecast, WoodMathError, type DryingForecast } from '../../../shared/wood/index';

export type ForecastSlab = {
  readings: { measuredOn: string; mcPercent: number }[];
  thicknessIn: number;
  milledOn: string | null;
};

/**
 * When a slab should reach the air-dry line (20 %), from its own dated readings, with the
 * one-year-per-inch rule of thumb from its milling date as the fallback. One place, so the slab
 * page, the yard desk and the office show the same forecast.
 */
export function forecastAirDry(slab: ForecastSlab): DryingForecast {
  try {
    return dryingForecast({
      readings: slab.readings.map((r) => ({ measuredOn: r.measuredOn, mcPercent: r.mcPercent })),
      targetMcPercent: DEFAULT_AIR_DRY_MC,
      thicknessIn: slab.thicknessIn,
      ...(slab.milledOn ? { startedOn: slab.milledOn } : {}),
    });
  } catch (error) {
    if (!(error instanceof WoodMathError)) throw error;
    // A stored value the wood math refuses must not take the page down; say so instead.
    return {
      expectedOn: null, earliestOn: null, latestOn: null, basis: 'not-enough-data', usableReadings: 0,
      emcPercent: 0, targetMcPercent: DEFAULT_AIR_DRY_MC,
      method: `No forecast: a stored value could not be used (${error.message}).`,
    };
  }
}
