import { useFieldArray, useWatch, type Control, type FieldErrors, type UseFormRegister } from 'react-hook-form';
import { averageWidthIn, boardFeet, formatBoardFeet, formatInches, parseInches } from '../../../../shared/wood/index';
import { SLAB_LIMITS } from '../../../../shared/slab-input';
import { Button } from '../../../components/ui/button';
import { InchesField } from '../../../components/ui/inches-field';
import type { SlabFormValues } from './slab-form-model';

type Props = { control: Control<SlabFormValues>; register: UseFormRegister<SlabFormValues>; errors: FieldErrors<SlabFormValues> };

/** Width at stations along the slab, with the average and board feet worked out as they are typed. */
export function WidthsField({ control, register, errors }: Props) {
  const { fields, append, remove } = useFieldArray({ control, name: 'widths' });
  const [widths, thicknessIn, lengthIn] = useWatch({ control, name: ['widths', 'thicknessIn', 'lengthIn'] });
  let live: string;
  try {
    const avg = averageWidthIn(widths.map((w) => parseInches(w.value)));
    live = `Average width ${formatInches(avg)}`;
    try {
      const bf = boardFeet({ thicknessIn: parseInches(thicknessIn, { thickness: true }), widthIn: avg, lengthIn: parseInches(lengthIn) });
      live += ` · ${formatBoardFeet(bf)}`;
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
            <InchesField className="flex-1" label={`Station ${i + 1}`}
              error={errors.widths?.[i]?.value?.message} {...register(`widths.${i}.value`)} />
            {fields.length > SLAB_LIMITS.minStations && (
              <Button variant="quiet" aria-label={`Remove width ${i + 1}`} onClick={() => remove(i)}>✕</Button>
            )}
          </div>
        ))}
      </div>
      {rootError && <p role="alert" className="text-sm text-danger">{rootError}</p>}
      <div className="flex flex-wrap items-center gap-3">
        <Button variant="secondary" disabled={fields.length >= SLAB_LIMITS.maxStations} onClick={() => append({ value: '' })}>Add a station</Button>
        <p id="widths-live" aria-live="polite" className="font-semibold">{live}</p>
      </div>
    </fieldset>
  );
}
