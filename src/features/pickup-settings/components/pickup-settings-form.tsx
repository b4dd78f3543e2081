import { useFieldArray, useForm, type FieldPath } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Button } from '../../../components/ui/button';
import { SelectField, TextAreaField, TextField } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/notice';
import { ApiError, friendlyMessage } from '../../../lib/api-client';
import { pickupSettingsSchema, WEEKDAY_NAMES, type PickupSettings, type PickupSettingsInput } from '../../../../shared/pickups';
import { useSavePickupSettings, type PickupSettingsView } from '../api';

/** The yard address, weekly pickup windows and closed days, saved together. */
export function PickupSettingsForm({ initial }: { initial: PickupSettingsView }) {
  const save = useSavePickupSettings();
  const { register, control, handleSubmit, setError, reset, formState: { errors, isDirty } } = useForm<PickupSettingsInput, unknown, PickupSettings>({
    resolver: zodResolver(pickupSettingsSchema),
    defaultValues: initial,
  });
  const windows = useFieldArray({ control, name: 'windows' });
  const closed = useFieldArray({ control, name: 'closedDays' });

  const onSubmit = (values: PickupSettings) =>
    save.mutate(values, {
      // New windows get ids from the server: start again from what was saved.
      onSuccess: (saved) => reset(saved),
      onError: (err) => {
        if (err instanceof ApiError) for (const [field, msgs] of Object.entries(err.fieldErrors)) setError(field as FieldPath<PickupSettingsInput>, { message: msgs[0] });
      },
    });

  return (
    <form onSubmit={handleSubmit(onSubmit)} className="flex flex-col gap-6" noValidate>
      <TextAreaField label="Yard address (shown to buyers and in e-mails)" {...register('yardAddress')} error={errors.yardAddress?.message} />

      <fieldset className="flex flex-col gap-3">
        <legend className="text-lg font-bold">Weekly pickup windows</legend>
        <p className="text-sm text-ink-soft">Times are the yard's clock (24-hour). Places = how many orders can be collected in that window.</p>
        {windows.fields.map((f, i) => {
          const e = errors.windows?.[i];
          return (
            <div key={f.id} className="grid grid-cols-2 items-end gap-2 rounded-md border border-line p-3 sm:grid-cols-[1.4fr_1fr_1fr_0.8fr_auto_auto]">
              <SelectField label="Day" {...register(`windows.${i}.weekday`, { valueAsNumber: true })} error={e?.weekday?.message}>
                {WEEKDAY_NAMES.map((d, n) => <option key={d} value={n}>{d}</option>)}
              </SelectField>
              <TextField label="From" type="time" {...register(`windows.${i}.startsAt`)} error={e?.startsAt?.message} />
              <TextField label="Until" type="time" {...register(`windows.${i}.endsAt`)} error={e?.endsAt?.message} />
              <TextField label="Places" type="number" min={1} max={50} {...register(`windows.${i}.capacity`, { valueAsNumber: true })} error={e?.capacity?.message} />
              <label className="flex min-h-11 items-center gap-2"><input type="checkbox" {...register(`windows.${i}.active`)} /> Offered</label>
              <Button variant="quiet" onClick={() => windows.remove(i)} aria-label={`Remove window ${i + 1}`}>Remove</Button>
            </div>
          );
        })}
        <Button variant="secondary" className="self-start" onClick={() => windows.append({ weekday: 6, startsAt: '09:00', endsAt: '12:00', capacity: 3, active: true })}>Add a window</Button>
      </fieldset>

      <fieldset className="flex flex-col gap-3">
        <legend className="text-lg font-bold">Closed days</legend>
        {closed.fields.map((f, i) => (
          <div key={f.id} className="grid grid-cols-1 items-end gap-2 sm:grid-cols-[1fr_2fr_auto]">
            <TextField label="Date" type="date" {...register(`closedDays.${i}.day`)} error={errors.closedDays?.[i]?.day?.message} />
            <TextField label="Note (optional)" {...register(`closedDays.${i}.note`)} error={errors.closedDays?.[i]?.note?.message} />
            <Button variant="quiet" onClick={() => closed.remove(i)} aria-label={`Remove closed day ${i + 1}`}>Remove</Button>
          </div>
        ))}
        {errors.closedDays?.root?.message && <p role="alert" className="text-sm text-danger">{errors.closedDays.root.message}</p>}
        <Button variant="secondary" className="self-start" onClick={() => closed.append({ day: '', note: '' })}>Add a closed day</Button>
      </fieldset>

      {save.isSuccess && !isDirty && <Notice tone="success" role="status">Saved.</Notice>}
      {save.error && <Notice tone="danger" role="alert">{friendlyMessage(save.error)}</Notice>}
      <Button type="submit" disabled={save.isPending} className="self-start">{save.isPending ? 'Saving…' : 'Save pickup settings'}</Button>
    </form>
  );
}
