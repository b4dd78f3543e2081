import { useFieldArray, type Control, type FieldErrors, type UseFormRegister } from 'react-hook-form';
import { DEFECT_KINDS, DEFECT_LABELS } from '../../../../shared/slab-input';
import { Button } from '../../../components/ui/button';
import { SelectField, TextField } from '../../../components/ui/field';
import type { SlabFormValues } from './slab-form-model';

type Props = { control: Control<SlabFormValues>; register: UseFormRegister<SlabFormValues>; errors: FieldErrors<SlabFormValues> };

export function DefectsField({ control, register, errors }: Props) {
  const { fields, append, remove } = useFieldArray({ control, name: 'defects' });
  return (
    <fieldset className="grid gap-2 rounded-md border border-line p-3 sm:col-span-2">
      <legend className="px-1 font-semibold">Defects buyers should know about</legend>
      {fields.length === 0 && <p className="text-sm text-ink-soft">None recorded.</p>}
      {fields.map((f, i) => (
        <div key={f.id} className="grid items-end gap-2 sm:grid-cols-[12rem_1fr_auto]">
          <SelectField label={`Defect ${i + 1} kind`} error={errors.defects?.[i]?.kind?.message} {...register(`defects.${i}.kind`)}>
            {DEFECT_KINDS.map((k) => <option key={k} value={k}>{DEFECT_LABELS[k]}</option>)}
          </SelectField>
          <TextField label={`Defect ${i + 1} note`} placeholder="Where and how big" error={errors.defects?.[i]?.note?.message} {...register(`defects.${i}.note`)} />
          <Button variant="quiet" onClick={() => remove(i)}>Remove defect {i + 1}</Button>
        </div>
      ))}
      <div><Button variant="secondary" onClick={() => append({ kind: 'check', note: '' })}>Add a defect</Button></div>
    </fieldset>
  );
}
