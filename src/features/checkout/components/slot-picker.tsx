import type { UseFormRegisterReturn } from 'react-hook-form';
import { WEEKDAY_NAMES, type PickupSlot } from '../../../../shared/pickups';

export const slotValue = (s: Pick<PickupSlot, 'windowId' | 'date'>) => `${s.windowId}|${s.date}`;

/** Pickup times grouped by day; full windows are shown but cannot be chosen. */
export function SlotPicker({ slots, field, error }: { slots: PickupSlot[]; field: UseFormRegisterReturn; error?: string }) {
  const days = [...new Set(slots.map((s) => s.date))];
  return (
    <fieldset className="flex flex-col gap-3" aria-describedby={error ? 'slot-error' : undefined}>
      <legend className="mb-1 text-lg font-bold">Pickup time</legend>
      {days.length === 0 && <p>No pickup times are open in the coming weeks. Please contact the mill.</p>}
      {days.map((day) => (
        <div key={day}>
          <p className="font-semibold">{WEEKDAY_NAMES[new Date(`${day}T00:00:00Z`).getUTCDay()]} {day}</p>
          <div className="mt-1 flex flex-wrap gap-2">
            {slots.filter((s) => s.date === day).map((s) => (
              <label key={slotValue(s)} className={`flex min-h-11 items-center gap-2 rounded-md border px-3 py-2 ${s.full ? 'border-line bg-surface-sunk text-ink-soft' : 'border-accent bg-surface-raised'}`}>
                <input type="radio" value={slotValue(s)} disabled={s.full} {...field} />
                <span>{s.startsAt}–{s.endsAt}</span>
                <span className="text-sm">{s.full ? '· full' : `· ${s.remaining} of ${s.capacity} places left`}</span>
              </label>
            ))}
          </div>
        </div>
      ))}
      {error && <p id="slot-error" role="alert" className="text-sm text-danger">{error}</p>}
    </fieldset>
  );
}
