import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Button } from '../../../components/ui/button';
import { SelectField, TextField } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/notice';
import { ApiError, friendlyMessage } from '../../../lib/api-client';
import {
  createReadingSchema, METER_KIND_LABELS, METER_KINDS, READING_JUMP_CODE, type CreateReading, type CreateReadingInput,
} from '../../../../shared/readings';
import { useAddReading } from '../api';
import { dryingSummary, localToday } from './drying-words';

/** One reading for one slab; after saving it says what drying state follows and the mill's target. */
export function ReadingForm({ slabId }: { slabId: number }) {
  const add = useAddReading(slabId);
  const { register, handleSubmit, setError, reset, formState: { errors, isSubmitting } } = useForm<CreateReadingInput, unknown, CreateReading>({
    resolver: zodResolver(createReadingSchema),
    defaultValues: { measuredOn: localToday(), meterKind: 'pin', location: '' },
  });

  /** A reading that jumps from the previous one waits here until the person confirms it or re-measures. */
  const [jump, setJump] = useState<{ message: string; values: CreateReading } | null>(null);

  async function save(values: CreateReading) {
    setJump(null);
    try {
      await add.mutateAsync(values);
      reset({ measuredOn: values.measuredOn, meterKind: values.meterKind, location: '', mcPercent: '' });
    } catch (e) {
      if (e instanceof ApiError && e.code === READING_JUMP_CODE) {
        setJump({ message: e.fieldErrors.mcPercent?.[0] ?? e.message, values });
      } else if (e instanceof ApiError) {
        for (const [field, messages] of Object.entries(e.fieldErrors)) {
          if (field in createReadingSchema.shape) setError(field as keyof CreateReadingInput, { message: messages[0] });
        }
      }
    }
  }
  const onSubmit = handleSubmit((values) => save({ ...values, confirmed: undefined }));

  const saved = add.data;
  const err = (name: keyof CreateReadingInput) => errors[name]?.message as string | undefined;
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-3 rounded-md border border-line bg-surface-raised p-4">
      <h3 className="font-display text-lg text-ink">Record a reading</h3>
      <div className="grid grid-cols-1 gap-3 sm:grid-cols-2">
        <TextField label="Moisture content (%)" inputMode="decimal" autoComplete="off" {...register('mcPercent')} error={err('mcPercent')} />
        <TextField label="Date measured" type="date" max={localToday()} {...register('measuredOn')} error={err('measuredOn')} />
        <SelectField label="Meter" {...register('meterKind')} error={err('meterKind')}>
          {METER_KINDS.map((k) => <option key={k} value={k}>{METER_KIND_LABELS[k]}</option>)}
        </SelectField>
        <TextField label="Where on the slab" placeholder="e.g. middle, 12 in from the end" {...register('location')} error={err('location')} />
        <TextField label="Depth (in, optional)" inputMode="decimal" {...register('depthIn')} error={err('depthIn')} />
        <TextField label="Air temperature (°F, optional)" inputMode="decimal" {...register('ambientTempF')} error={err('ambientTempF')} />
        <TextField label="Relative humidity (%, optional)" inputMode="decimal" {...register('ambientRhPercent')} error={err('ambientRhPercent')}
          hint="With the air temperature, this gives the moisture content the wood is heading towards outdoors." />
      </div>
      {jump && (
        <Notice tone="caution" role="alert" title="Is this reading right?">
          <p>{jump.message}</p>
          <div className="mt-2 flex flex-wrap gap-2">
            <Button onClick={() => save({ ...jump.values, confirmed: true })} disabled={add.isPending}>Yes, save {jump.values.mcPercent} % as read</Button>
            <Button variant="quiet" onClick={() => setJump(null)}>No, I will measure again</Button>
          </div>
        </Notice>
      )}
      {add.isError && !jump && !(add.error instanceof ApiError && Object.keys(add.error.fieldErrors).length) && (
        <Notice tone="danger" role="alert">{friendlyMessage(add.error)}</Notice>
      )}
      {saved && !add.isPending && !jump && (
        <Notice tone="success" role="status" title="Reading saved">
          <p>{dryingSummary(saved.slab.dryingState, saved.reading.mcPercent, saved.targetMcPercent)}</p>
          {saved.emcPercent !== null && <p>The air would bring wood to about {saved.emcPercent} % (equilibrium moisture content).</p>}
        </Notice>
      )}
      <div><Button type="submit" disabled={isSubmitting}>{isSubmitting ? 'Saving…' : 'Save reading'}</Button></div>
    </form>
  );
}
