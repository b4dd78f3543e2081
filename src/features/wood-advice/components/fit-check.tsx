import { useState } from 'react';
import { dimensionalChangeDetail, equilibriumMoistureContent, formatLength, formatPercent, type Grain, type UnitSystem } from '../../../../shared/wood/index';
import { useMeasures } from '../../../lib/units';
import { plainWoodError } from '../../../lib/wood-words';
import { SelectField, TextField } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/notice';
import { SHOP_CLIMATES } from './shop-climates';

type Props = { speciesSlug: string; speciesName: string; widthIn: number; currentMcPercent: number; hasReading: boolean };

/** Plain words for a signed width change: "about 3/16 in narrower" (or "about 5 mm narrower"). */
export function describeChange(changeIn: number, units: UnitSystem = 'imperial'): string {
  const size = formatLength(Math.abs(changeIn), units);
  if (size === '0 in' || size === '0 mm') return units === 'metric' ? 'hardly any change (under 1 mm)' : 'hardly any change (under 1/32 in)';
  return `about ${size} ${changeIn < 0 ? 'narrower' : 'wider'}`;
}

/**
 * The buyer's fit check: the moisture content the slab will settle to in their shop (Wood
 * Handbook EMC equation) and how much its width will move, both computed in the browser by the
 * same shared wood math the server uses.
 */
export function FitCheck({ speciesSlug, speciesName, widthIn, currentMcPercent, hasReading }: Props) {
  const [climate, setClimate] = useState<string>(SHOP_CLIMATES[0].id);
  const preset = SHOP_CLIMATES.find((c) => c.id === climate);
  const [temperatureF, setTemperatureF] = useState<string>(String(SHOP_CLIMATES[0].temperatureF));
  const [rh, setRh] = useState<string>(String(SHOP_CLIMATES[0].relativeHumidityPercent));

  const choose = (id: string) => {
    setClimate(id);
    const c = SHOP_CLIMATES.find((x) => x.id === id);
    if (c) { setTemperatureF(String(c.temperatureF)); setRh(String(c.relativeHumidityPercent)); }
  };

  const m = useMeasures();
  let result: { emc: number; changes: { grain: Grain; changeIn: number; note: string }[] } | null = null;
  let problem: string | null = null;
  try {
    const emc = equilibriumMoistureContent({ temperatureF: Number(temperatureF), relativeHumidityPercent: Number(rh) });
    const changes = (['flatsawn', 'quartersawn'] as const).map((grain) => {
      const d = dimensionalChangeDetail({ dimensionIn: widthIn, speciesSlug, grain, fromMcPercent: currentMcPercent, toMcPercent: emc });
      return { grain, changeIn: d.changeIn, note: d.note };
    });
    result = { emc, changes };
  } catch (e) {
    problem = plainWoodError(e, {
      temperatureF: { label: 'Temperature', unit: '°F' },
      relativeHumidityPercent: { label: 'Relative humidity', unit: '%' },
    });
  }
  if (temperatureF === '' || rh === '') problem = 'Enter a temperature and a humidity.';

  return (
    <section aria-labelledby="fit-check" className="rounded-lg border border-line bg-surface-raised p-4">
      <h2 id="fit-check" className="text-xl font-bold">Fit check: will it move in your shop?</h2>
      <p className="mb-3 text-ink-soft">Wood takes up or gives off water until it matches the air around it. Tell us your shop's usual conditions.</p>
      <div className="grid gap-3 sm:grid-cols-2">
        <SelectField className="sm:col-span-2" label="Your shop is most like" value={preset ? climate : 'custom'} onChange={(e) => choose(e.target.value)}>
          {SHOP_CLIMATES.map((c) => <option key={c.id} value={c.id}>{c.label}</option>)}
          <option value="custom">My own numbers</option>
        </SelectField>
        <TextField label="Temperature (°F)" type="number" inputMode="decimal" value={temperatureF} onChange={(e) => { setClimate('custom'); setTemperatureF(e.target.value); }} />
        <TextField label="Relative humidity (%)" type="number" inputMode="decimal" min={0} max={100} value={rh} onChange={(e) => { setClimate('custom'); setRh(e.target.value); }} />
      </div>
      <div aria-live="polite" className="mt-3">
        {problem && <Notice tone="danger">{problem}</Notice>}
        {!problem && result && (
          <div className="flex flex-col gap-2">
            <p>
              In those conditions wood settles at about <strong>{formatPercent(result.emc)} moisture content</strong> (equilibrium moisture content,
              USDA Wood Handbook equation 4-5). This slab is at {formatPercent(currentMcPercent)}{hasReading ? ' (latest reading)' : ' (typical of green wood; no reading yet)'}.
            </p>
            <ul className="list-disc pl-5">
              {result.changes.map((c) => (
                <li key={c.grain}>
                  If its grain is mostly <strong>{c.grain}</strong>, expect the {m.length(widthIn)} width to end up <strong>{describeChange(c.changeIn, m.units)}</strong>.
                </li>
              ))}
            </ul>
            <p className="text-sm text-ink-soft">{result.changes[0].note} Estimates for {speciesName}; allow for movement in your joinery.</p>
          </div>
        )}
      </div>
    </section>
  );
}
