import { useState } from 'react';
import { Link } from 'react-router';
import { useForm, useWatch } from 'react-hook-form';
import { useQuery } from '@tanstack/react-query';
import { LIVE_EDGE, LIVE_EDGE_LABELS, type SlabStatus } from '../../../../shared/slabs';
import { staffStatusChoices, YARD_STATUS_LABELS, type CreateSlab, type YardSlabDetail } from '../../../../shared/slab-input';
import { slabFitsLog } from '../../../../shared/logs';
import { formatCents } from '../../../../shared/wood/index';
import { Button } from '../../../components/ui/button';
import { SelectField, TextAreaField, TextField } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/notice';
import { ApiError } from '../../../lib/api-client';
import { InchesField } from '../../../components/ui/inches-field';
import { paths } from '../../../paths';
import { figureKindsQuery, logListQuery, useSaveSlab } from '../api';
import { DefectsField } from './defects-field';
import { WidthsField } from './widths-field';
import { applyServerErrors } from './server-errors';
import { defaultsFor, FORM_FIELDS, formFieldName, slabResolver, type SlabFormValues } from './slab-form-model';

type Props = { slab?: YardSlabDetail; logId?: number; onSaved: (slab: YardSlabDetail) => void };

/** Records a new slab or edits one. The server checks everything again and names what it refuses. */
export function SlabForm({ slab, logId, onSaved }: Props) {
  const isNew = !slab;
  const save = useSaveSlab(slab?.id ?? null);
  const { data: logs = [] } = useQuery(logListQuery());
  const { data: figureKinds = [] } = useQuery(figureKindsQuery());
  const [formError, setFormError] = useState<string | null>(null);
  /** The server's "well above the target MC" question, with the values that raised it. */
  const [wetCheck, setWetCheck] = useState<{ message: string; values: Record<string, unknown> } | null>(null);
  const { register, control, handleSubmit, setError, formState: { errors, isSubmitting } } = useForm<SlabFormValues>({
    resolver: slabResolver(isNew) as never,
    defaultValues: defaultsFor(slab, logId),
  });
  const override = useWatch({ control, name: 'priceOverrideDollars' });
  const statuses: SlabStatus[] = slab ? staffStatusChoices(slab.status) : ['drying', 'ready'];

  /** `values` are what the shared schema made of the form (the API's shape). */
  const submit = async (values: Record<string, unknown>, confirmWet = false) => {
    setFormError(null);
    setWetCheck(null);
    const renamed = (name: string) => formFieldName(name) as keyof SlabFormValues;
    // The same rule the server applies: no wider than the log's butt (plus flare), no longer than the log.
    const parsed = values as unknown as Partial<CreateSlab>;
    const log = logs.find((l) => l.id === (slab?.logId ?? parsed.logId));
    const misfit = log ? slabFitsLog(parsed, log) : {};
    for (const [field, [message]] of Object.entries(misfit)) setError(renamed(field), { type: 'validate', message });
    if (Object.keys(misfit).length) return;
    try {
      onSaved(await save.mutateAsync((confirmWet ? { ...values, confirmAboveTargetMc: true } : values) as never));
    } catch (e) {
      if (e instanceof ApiError && e.code === 'confirm_wet_listing') { setWetCheck({ message: e.message, values }); return; }
      setFormError(applyServerErrors(e, (name, err) => setError(renamed(String(name)), err), [...FORM_FIELDS, 'widthsIn', 'priceOverrideCents']));
    }
  };
  const onSubmit = handleSubmit((values) => submit(values as unknown as Record<string, unknown>));

  const num = { valueAsNumber: true } as const;
  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-4 sm:grid-cols-2">
      {formError && <div className="sm:col-span-2"><Notice tone="danger" role="alert">{formError}</Notice></div>}
      {isNew ? (
        <SelectField label="From log" error={errors.logId?.message} {...register('logId', num)}>
          <option value="">Choose a log…</option>
          {logs.map((l) => <option key={l.id} value={l.id}>{l.code} · {l.species.name}</option>)}
        </SelectField>
      ) : (
        <p className="self-end">From log <Link className="font-semibold text-accent underline" to={paths.yardLog(slab.logId)}>{slab.logCode}</Link> · {slab.species.name}</p>
      )}
      <TextField label="Place in the log (sequence)" hint={isNew ? 'Leave empty for the next free number.' : undefined} type="number" min="1" step="1"
        error={errors.sequenceInLog?.message} {...register('sequenceInLog', num)} />
      <InchesField label="Thickness (in)" hint="2.25, 2 1/4 or 9/4 all work." error={errors.thicknessIn?.message} {...register('thicknessIn')} />
      <InchesField label="Length (in)" error={errors.lengthIn?.message} {...register('lengthIn')} />
      <WidthsField control={control} register={register} errors={errors} />
      <SelectField label="Live edge" error={errors.liveEdge?.message} {...register('liveEdge')}>
        {LIVE_EDGE.map((e) => <option key={e} value={e}>{LIVE_EDGE_LABELS[e]}</option>)}
      </SelectField>
      <SelectField label="Status" hint={slab && statuses.length === 1 ? 'Holds, checkout and pickup move this slab from here.' : 'Only the next steps the yard allows are offered.'}
        error={errors.status?.message} disabled={statuses.length === 1 && !isNew} {...register('status')}>
        {statuses.map((s) => <option key={s} value={s}>{YARD_STATUS_LABELS[s]}</option>)}
      </SelectField>
      <fieldset className="grid gap-1 rounded-md border border-line p-3 sm:col-span-2">
        <legend className="px-1 font-semibold">Figure</legend>
        <div className="flex flex-wrap gap-x-4 gap-y-1">
          {figureKinds.map((f) => (
            <label key={f.slug} className="inline-flex min-h-11 items-center gap-2">
              <input type="checkbox" value={f.slug} className="size-5" {...register('figures')} /> {f.label}
            </label>
          ))}
          {figureKinds.length === 0 && <p className="text-sm text-ink-soft">No figures in the list yet.</p>}
        </div>
        {errors.figures && <p role="alert" className="text-sm text-danger">{errors.figures.message ?? errors.figures.root?.message}</p>}
      </fieldset>
      <TextAreaField className="sm:col-span-2" label="Figure notes" error={errors.figureNotes?.message} {...register('figureNotes')} />
      <DefectsField control={control} register={register} errors={errors} />
      <TextField label="Yard stack" hint="e.g. B2" error={errors.yardStack?.message} {...register('yardStack')} />
      <TextField label="Position in the stack" hint="e.g. 3rd from top" error={errors.yardPosition?.message} {...register('yardPosition')} />
      <TextField label="Price set by hand ($)" hint={slab ? `Worked-out price now: ${formatCents(slab.priceCents)}. Leave empty to use the price rules.` : 'Leave empty to use the price rules.'}
        type="number" inputMode="decimal" step="0.01" min="0" error={errors.priceOverrideDollars?.message} {...register('priceOverrideDollars')} />
      <TextField label="Why the price is set by hand" disabled={!override} error={errors.priceOverrideReason?.message} {...register('priceOverrideReason')} />
      <TextAreaField className="sm:col-span-2" label="Description for buyers" error={errors.description?.message} {...register('description')} />
      {wetCheck && (
        <div className="sm:col-span-2">
          <Notice tone="caution" role="alert" title="Still wet for furniture">
            <p>{wetCheck.message}</p>
            <div className="mt-2 flex flex-wrap gap-2">
              <Button onClick={() => void submit(wetCheck.values, true)} disabled={isSubmitting || save.isPending}>List it anyway</Button>
              <Button variant="quiet" onClick={() => setWetCheck(null)}>Not yet</Button>
            </div>
          </Notice>
        </div>
      )}
      <div className="flex flex-wrap gap-2 sm:col-span-2">
        <Button type="submit" disabled={isSubmitting}>{isSubmitting ? 'Saving…' : isNew ? 'Record slab' : 'Save slab'}</Button>
      </div>
    </form>
  );
}
