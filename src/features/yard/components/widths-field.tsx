import { useFieldArray, useWatch, type Control, type FieldErrors, type UseFormRegister } from 'react-hook-form';
import { averageWidthIn, boardFeet, roundBoardFeet, toSixteenths } from '../../../../shared/wood/index';
import { SLAB_LIMITS } from '../../../../shared/slab-input';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import type { SlabFormValues } from './slab-form-model';

type Props = { control: Control<SlabFormValues>; register: UseFormRegister<SlabFormValues>; errors: FieldErrors<SlabFormValues> };

/** Width at stations along the slab, with the average and board feet worked out as they are typed. */
export function WidthsField({ control, register, errors }: Props) {
  const { fields, append, remove } = useFieldArray({ control, name: 'widths' });
  const [widths, thicknessIn, lengthIn] = useWatch({ control, name: ['widths', 'thicknessIn', 'lengthIn'] });
  let live: string;
  try {
    const avg = averageWidthIn(widths.map((w) => Number(w.value)));
    live = `Average width ${toSixteenths(avg)} in`;
    try {
      live += ` · ${roundBoardFeet(boardFeet({ thicknessIn: Number(thicknessIn), widthIn: avg, lengthIn: Number(lengthIn) }))} board feet`;
    } catch { live += ' · board feet once thickness and length are in'; }
  } catch { live = 'Enter every width to see the average and board feet.'; }
  const rootError = errors.widths?.root?.message ?? errors.widths?.message;

  return (
    <fieldset className="grid gap-2 rounded-md border border-line p-3 sm:col-span-2" aria-describedby="widths-live">
      <legend className="px-1 font-semibold">Widths along the slab (in)</legend>
      <p className="text-sm text-ink-soft">Measure across the face at {SLAB_LIMITS.minStations}–{SLAB_LIMITS.maxStations} evenly spaced stations, end to end.</p>
      <div className="grid grid-cols-2 gap-2 sm:grid-cols-4">
        {fields.map((f, i) => (
          <div key={f.id} className="flex items-end gap-1">
            <TextField className="flex-1" label={`Station ${i + 1}`} type="number" inputMode="decimal" step="0.125" min="0"
              error={errors.widths?.[i]?.value?.message} {...register(`widths.${i}.value`, { valueAsNumber: true })} />
            {fields.length > SLAB_LIMITS.minStations && (
              <Button variant="quiet" aria-label={`Remove width ${i + 1}`} onClick={() => remove(i)}>✕</Button>
            )}
          </div>
        ))}
      </div>
      {rootError && <p role="alert" className="text-sm text-danger">{rootError}</p>}
      <div className="flex flex-wrap items-center gap-3">
        <Button variant="secondary" disabled={fields.length >= SLAB_LIMITS.maxStations} onClick={() => append({ value: Number.NaN })}>Add a station</Button>
        <p id="widths-live" aria-live="polite" className="font-semibold">{live}</p>
      </div>
    </fieldset>
  );
}
