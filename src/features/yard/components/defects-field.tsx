import { useFieldArray, type Control, type FieldErrors, type UseFormRegister } from 'react-hook-form';
import { DEFECT_FACE_LABELS, DEFECT_FACES, DEFECT_KINDS, DEFECT_LABELS } from '../../../../shared/slab-input';
import { Button } from '../../../components/ui/button';
import { SelectField, TextField } from '../../../components/ui/field';
import { InchesField } from '../../../components/ui/inches-field';
import type { SlabFormValues } from './slab-form-model';

type Props = { control: Control<SlabFormValues>; register: UseFormRegister<SlabFormValues>; errors: FieldErrors<SlabFormValues> };

/** Each defect: what it is, which face, how far from the butt end, and a note — so a buyer can plan the cut around it. */
export function DefectsField({ control, register, errors }: Props) {
  const { fields, append, remove } = useFieldArray({ control, name: 'defects' });
  return (
    <fieldset className="grid gap-3 rounded-md border border-line p-3 sm:col-span-2">
      <legend className="px-1 font-semibold">Defects buyers should know about</legend>
      {fields.length === 0 && <p className="text-sm text-ink-soft">None recorded.</p>}
      {fields.map((f, i) => (
        <div key={f.id} role="group" aria-label={`Defect ${i + 1}`} className="grid items-end gap-2 border-b border-line pb-3 sm:grid-cols-2 lg:grid-cols-[14rem_10rem_10rem_1fr_auto]">
          <SelectField label={`Defect ${i + 1} kind`} error={errors.defects?.[i]?.kind?.message} {...register(`defects.${i}.kind`)}>
            {DEFECT_KINDS.map((k) => <option key={k} value={k}>{DEFECT_LABELS[k]}</option>)}
          </SelectField>
          <SelectField label={`Defect ${i + 1} face`} error={errors.defects?.[i]?.face?.message} {...register(`defects.${i}.face`)}>
            <option value="">Not said</option>
            {DEFECT_FACES.map((k) => <option key={k} value={k}>{DEFECT_FACE_LABELS[k]}</option>)}
          </SelectField>
          <InchesField label={`Defect ${i + 1} from butt end (in)`} error={errors.defects?.[i]?.fromButtIn?.message} {...register(`defects.${i}.fromButtIn`)} />
          <TextField label={`Defect ${i + 1} note`} placeholder="How big, how deep" error={errors.defects?.[i]?.note?.message} {...register(`defects.${i}.note`)} />
          <Button variant="quiet" onClick={() => remove(i)}>Remove defect {i + 1}</Button>
        </div>
      ))}
      <div><Button variant="secondary" onClick={() => append({ kind: 'knot', note: '', fromButtIn: '', face: '' })}>Add a defect</Button></div>
    </fieldset>
  );
}
