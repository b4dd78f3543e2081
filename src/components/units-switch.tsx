import { useId } from 'react';
import { useUnits } from '../lib/units';
import { UNIT_SYSTEMS, UNIT_SYSTEM_LABELS, type UnitSystem } from '../../shared/wood/index';

const SHORT: Record<UnitSystem, string> = { imperial: 'in · lb', metric: 'mm · kg' };

/** Two pressed-or-not buttons: how every size and weight on the site is written. */
export function UnitsSwitch() {
  const { units, setUnits } = useUnits();
  const labelId = useId();
  return (
    <div role="group" aria-labelledby={labelId} className="flex items-center gap-1 text-sm">
      <span id={labelId} className="sr-only">Units</span>
      <span aria-hidden="true" className="text-ink-soft">Units</span>
      <div className="inline-flex overflow-hidden rounded-md border border-line">
        {UNIT_SYSTEMS.map((u) => (
          <button
            key={u}
            type="button"
            aria-pressed={units === u}
            title={UNIT_SYSTEM_LABELS[u]}
            aria-label={`${SHORT[u]}: ${UNIT_SYSTEM_LABELS[u]}`}
            onClick={() => setUnits(u)}
            className={`min-h-11 px-3 font-semibold ${units === u ? 'bg-accent text-surface-raised' : 'bg-surface-raised text-ink hover:bg-surface-sunk'}`}
          >
            {SHORT[u]}
          </button>
        ))}
      </div>
    </div>
  );
}
