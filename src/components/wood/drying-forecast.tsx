import type { DryingForecast } from '../../../shared/wood/index';

/** "about 2026-08-14 (between 2026-07-30 and 2026-09-02)", or why there is no date. */
export function forecastSummary(f: DryingForecast): string {
  if (f.basis === 'already-reached') return `reached ${f.targetMcPercent} % by ${f.expectedOn}`;
  if (!f.expectedOn) return 'no forecast yet';
  return f.earliestOn === f.latestOn ? `about ${f.expectedOn}` : `about ${f.expectedOn} (between ${f.earliestOn} and ${f.latestOn})`;
}

/** The forecast with its range and, in small print, how it was worked out. */
export function DryingForecastNote({ forecast, heading = 'Drying forecast' }: { forecast: DryingForecast; heading?: string }) {
  const f = forecast;
  return (
    <div className="rounded-md border border-line bg-surface-sunk p-3" data-testid="drying-forecast">
      <p className="font-semibold">{heading}</p>
      {f.basis === 'already-reached' ? (
        <p>Air-dry: at or below {f.targetMcPercent} % moisture since the reading of {f.expectedOn}.</p>
      ) : f.expectedOn ? (
        <p>
          Expected to reach {f.targetMcPercent} % moisture (air-dry) about <strong>{f.expectedOn}</strong>
          {f.earliestOn !== f.latestOn && <>, likely between <strong>{f.earliestOn}</strong> and <strong>{f.latestOn}</strong></>}.
        </p>
      ) : (
        <p>No date yet.</p>
      )}
      <p className="mt-1 text-sm text-ink-soft">
        {f.basis === 'fitted-curve' ? `From this slab's own ${f.usableReadings} readings. ` : f.basis === 'rule-of-thumb' ? 'From the rule of thumb. ' : ''}
        {f.method}
      </p>
    </div>
  );
}
