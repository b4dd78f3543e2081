import { useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { z } from 'zod';
import { createLogSchema, logDateProblems, type LogDetail } from '../../../../shared/logs';
import { SAWING_METHODS, SAWING_METHOD_LABELS } from '../../../../shared/slabs';
import { SelectField, TextAreaField, TextField } from '../../../components/ui/field';
import { Button } from '../../../components/ui/button';
import { InchesField } from '../../../components/ui/inches-field';
import { inchesForInput } from '../../../../shared/wood/index';
import { Notice } from '../../../components/ui/notice';
import { nextLogCodeQuery, useCreateLog, useUpdateLog, yardSpeciesQuery } from '../api';
import { applyServerErrors } from './server-errors';

type In = z.input<typeof createLogSchema>;
type Out = z.output<typeof createLogSchema>;

const blankToNull = (v: unknown) => (v === '' || v === undefined ? null : v);
const blankToUndefined = (v: unknown) => (v === '' ? undefined : v);
const FIELDS = ['speciesSlug', 'code', 'originNote', 'felledOn', 'milledOn', 'lengthIn', 'buttDiameterIn', 'topDiameterIn', 'sawingMethod', 'notes'];

/** Records a new log, or edits one when `log` is given. */
export function LogForm({ log, onSaved }: { log?: LogDetail; onSaved: (log: LogDetail) => void }) {
  const { data: species = [] } = useQuery(yardSpeciesQuery());
  const create = useCreateLog();
  const update = useUpdateLog(log?.id ?? 0);
  const [formError, setFormError] = useState<string | null>(null);
  const { register, control, handleSubmit, setError, formState: { errors, isSubmitting } } = useForm<In, unknown, Out>({
    resolver: zodResolver(createLogSchema),
    defaultValues: log
      ? {
        ...log, speciesSlug: log.species.slug, lengthIn: inchesForInput(log.lengthIn),
        buttDiameterIn: inchesForInput(log.buttDiameterIn), topDiameterIn: inchesForInput(log.topDiameterIn),
      }
      : { sawingMethod: 'live-edge-slabbing', originNote: '', notes: '', felledOn: null, milledOn: null },
  });

  const felledOn = useWatch({ control, name: 'felledOn' });
  // The server's own answer: the code createLog would store now, and today's date at the mill.
  const { data: next } = useQuery(nextLogCodeQuery(felledOn));

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    const dateProblems = next ? logDateProblems(values, next.millToday) : {};
    for (const [field, [message]] of Object.entries(dateProblems)) setError(field as 'felledOn' | 'milledOn', { type: 'validate', message });
    if (Object.keys(dateProblems).length) return;
    try {
      onSaved(log ? await update.mutateAsync(values) : await create.mutateAsync(values));
    } catch (e) {
      setFormError(applyServerErrors(e, setError, FIELDS));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-4 sm:grid-cols-2">
      {formError && <div className="sm:col-span-2"><Notice tone="danger" role="alert">{formError}</Notice></div>}
      <SelectField label="Species" error={errors.speciesSlug?.message} {...register('speciesSlug')}>
        <option value="">Choose…</option>
        {species.map((s) => <option key={s.slug} value={s.slug}>{s.name}</option>)}
      </SelectField>
      <TextField label="Log code" error={errors.code?.message}
        hint={log ? undefined : next ? `Leave empty and it is numbered ${next.code}, the next in its year’s series.` : 'Leave empty to number it in its year’s series.'}
        autoCapitalize="characters" {...register('code', { setValueAs: blankToUndefined })} />
      <TextField label="Felled on" type="date" max={next?.millToday} error={errors.felledOn?.message} {...register('felledOn', { setValueAs: blankToNull })} />
      <TextField label="Milled on" type="date" max={next?.millToday} hint="Leave empty until the log is sawn." error={errors.milledOn?.message} {...register('milledOn', { setValueAs: blankToNull })} />
      <InchesField label="Length (in)" error={errors.lengthIn?.message} {...register('lengthIn')} />
      <SelectField label="Sawing method" error={errors.sawingMethod?.message} {...register('sawingMethod')}>
        {SAWING_METHODS.map((m) => <option key={m} value={m}>{SAWING_METHOD_LABELS[m]}</option>)}
      </SelectField>
      <InchesField label="Butt diameter (in)" error={errors.buttDiameterIn?.message} {...register('buttDiameterIn')} />
      <InchesField label="Top diameter (in)" hint="The small end." error={errors.topDiameterIn?.message} {...register('topDiameterIn')} />
      <TextAreaField className="sm:col-span-2" label="Where it came from" hint="Who gave or sold it and why it came down, e.g. “Storm-felled street tree, Alder Lane.”"
        error={errors.originNote?.message} {...register('originNote')} />
      <TextAreaField className="sm:col-span-2" label="Notes" error={errors.notes?.message} {...register('notes')} />
      <div className="sm:col-span-2">
        <Button type="submit" disabled={isSubmitting}>{isSubmitting ? 'Saving…' : log ? 'Save log' : 'Record log'}</Button>
      </div>
    </form>
  );
}
