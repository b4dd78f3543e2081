import { useRef, useState, type KeyboardEvent } from 'react';
import { useFieldArray, useForm } from 'react-hook-form';
import { Button } from '../../../components/ui/button';
import { SelectField, TextField } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/notice';
import { ApiError, friendlyMessage } from '../../../lib/api-client';
import {
  batchReadingsSchema, BATCH_MAX_ROWS, METER_KIND_LABELS, METER_KINDS, READING_JUMP_CODE, type BatchReadingsInput, type MeterKind, type ReadingSaved, type RoundSlab,
} from '../../../../shared/readings';
import { useBatchReadings } from '../api';
import { dryingSummary, localToday } from './drying-words';
import { StackPicker } from './stack-picker';

/** `hint` (where the slab sits, its last reading) comes with a round started from a stack; it is not sent. */
type Row = { slabCode: string; mcPercent: string; location: string; hint?: string };
type Values = { measuredOn: string; meterKind: MeterKind; rows: Row[] };
const blankRow = (): Row => ({ slabCode: '', mcPercent: '', location: '' });
const ROW_FIELDS = ['slabCode', 'mcPercent', 'location'] as const;

/**
 * Readings for many slabs from the yard on a phone: one date and meter for the round, then a row per
 * slab. A scanner that "types" the code and Enter moves on to the MC box; Enter there opens the next row.
 */
export function BatchReadings() {
  const save = useBatchReadings();
  const [saved, setSaved] = useState<ReadingSaved[] | null>(null);
  /** A round with rows that jump from their slab's previous reading: held until the person confirms them. */
  const [jumps, setJumps] = useState<{ body: BatchReadingsInput; rows: number[] } | null>(null);
  const formRef = useRef<HTMLFormElement>(null);
  const { register, control, handleSubmit, setError, clearErrors, reset, getValues, formState: { errors } } = useForm<Values>({
    defaultValues: { measuredOn: localToday(), meterKind: 'pin', rows: [blankRow()] },
  });
  const rows = useFieldArray({ control, name: 'rows' });
  const [roundOf, setRoundOf] = useState<string | null>(null);

  /** Replaces the rows with the stack's slabs, in yard order, with the MC boxes empty. */
  function startRound(stack: string, slabs: RoundSlab[]) {
    const round = slabs.slice(0, BATCH_MAX_ROWS).map((s) => ({
      slabCode: s.code, mcPercent: '', location: '',
      hint: [s.yardPosition, s.speciesName, s.lastMcPercent !== null ? `last ${s.lastMcPercent} % on ${s.lastReadingOn}` : 'no reading yet'].filter(Boolean).join(' · '),
    }));
    reset({ measuredOn: getValues('measuredOn'), meterKind: getValues('meterKind'), rows: round });
    setRoundOf(stack);
    setSaved(null);
    focus('rows.0.mcPercent');
  }

  const focus = (name: string) => requestAnimationFrame(() => formRef.current?.querySelector<HTMLInputElement>(`[name="${name}"]`)?.focus());
  const addRow = () => { rows.append(blankRow(), { shouldFocus: false }); focus(`rows.${rows.fields.length}.slabCode`); };
  const onEnter = (next: () => void) => (e: KeyboardEvent) => { if (e.key === 'Enter') { e.preventDefault(); next(); } };

  /** Server and client both name errors "readings.2.mcPercent"; the form calls row 2 "rows.2.mcPercent". */
  function showErrors(fieldErrors: Record<string, string[]>) {
    for (const [key, messages] of Object.entries(fieldErrors)) {
      const m = key.match(/^readings\.(\d+)\.(\w+)$/);
      const field = m && (m[2] === 'slabId' ? 'slabCode' : m[2]);
      if (m && (ROW_FIELDS as readonly (string | null)[]).includes(field)) setError(`rows.${Number(m[1])}.${field as keyof Row}`, { message: messages[0] });
      else if (m && (m[2] === 'measuredOn' || m[2] === 'meterKind')) setError(m[2], { message: messages[0] });
      else setError('root', { message: messages[0] });
    }
  }

  async function send(body: BatchReadingsInput, measuredOn: string, meterKind: MeterKind) {
    try {
      const res = await save.mutateAsync(body);
      setJumps(null);
      setRoundOf(null);
      setSaved(res.items);
      reset({ measuredOn, meterKind, rows: [blankRow()] });
      focus('rows.0.slabCode');
    } catch (e) {
      if (e instanceof ApiError && e.code === READING_JUMP_CODE) {
        showErrors(e.fieldErrors);
        setJumps({ body, rows: Object.keys(e.fieldErrors).map((k) => Number(k.split('.')[1])) });
      } else if (e instanceof ApiError && Object.keys(e.fieldErrors).length) showErrors(e.fieldErrors);
      else setError('root', { message: friendlyMessage(e) });
    }
  }

  /** Resends the same round with the flagged rows marked as confirmed by the person. */
  const confirmJumps = () => {
    if (!jumps) return;
    const body = { readings: jumps.body.readings.map((r, i) => (jumps.rows.includes(i) ? { ...r, confirmed: true } : r)) };
    clearErrors();
    void send(body, getValues('measuredOn'), getValues('meterKind'));
  };

  const onSubmit = handleSubmit(async (values) => {
    clearErrors();
    setSaved(null);
    setJumps(null);
    const filled = values.rows.filter((r) => r.slabCode.trim() || r.mcPercent.trim());
    const body = { readings: filled.map((r) => ({ slabCode: r.slabCode, mcPercent: r.mcPercent, location: r.location, measuredOn: values.measuredOn, meterKind: values.meterKind })) };
    if (filled.length !== values.rows.length) reset({ ...values, rows: filled.length ? filled : [blankRow()] });
    const checked = batchReadingsSchema.safeParse(body);
    if (!checked.success) {
      const fieldErrors: Record<string, string[]> = {};
      for (const issue of checked.error.issues) (fieldErrors[issue.path.join('.') || '_form'] ??= []).push(issue.message);
      return showErrors(fieldErrors);
    }
    await send(body, values.measuredOn, values.meterKind);
  });

  const big = 'text-lg';
  return (
    <form ref={formRef} onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <StackPicker onStart={startRound} />
      {roundOf && <p role="status" className="font-semibold">Round of stack {roundOf}: {rows.fields.length} slab{rows.fields.length === 1 ? '' : 's'} in yard order. Fill in each MC.</p>}
      <div className="grid grid-cols-2 gap-3">
        <TextField label="Date measured" type="date" max={localToday()} className={big} {...register('measuredOn')} error={errors.measuredOn?.message} />
        <SelectField label="Meter" className={big} {...register('meterKind')} error={errors.meterKind?.message}>
          {METER_KINDS.map((k) => <option key={k} value={k}>{METER_KIND_LABELS[k]}</option>)}
        </SelectField>
      </div>
      <ol className="flex flex-col gap-3">
        {rows.fields.map((field, i) => (
          <li key={field.id} className="rounded-md border border-line bg-surface-raised p-3">
            <fieldset className="grid grid-cols-2 gap-3 sm:grid-cols-[2fr_1fr_2fr_auto] sm:items-end">
              <legend className="mb-1 text-sm font-semibold text-ink-soft">Slab {i + 1}{field.hint ? ` — ${field.hint}` : ''}</legend>
              <TextField label="Slab code" autoCapitalize="characters" autoComplete="off" spellCheck={false} enterKeyHint="next"
                className={big} {...register(`rows.${i}.slabCode`)} error={errors.rows?.[i]?.slabCode?.message}
                onKeyDown={onEnter(() => focus(`rows.${i}.mcPercent`))} />
              <TextField label="MC (%)" inputMode="decimal" autoComplete="off" enterKeyHint="next" className={big}
                {...register(`rows.${i}.mcPercent`)} error={errors.rows?.[i]?.mcPercent?.message}
                onKeyDown={onEnter(() => (i === rows.fields.length - 1 ? addRow() : focus(`rows.${i + 1}.slabCode`)))} />
              <TextField label="Where (optional)" autoComplete="off" className={`col-span-2 sm:col-span-1 ${big}`}
                {...register(`rows.${i}.location`)} error={errors.rows?.[i]?.location?.message} />
              <Button variant="quiet" className="col-span-2 sm:col-span-1" disabled={rows.fields.length === 1}
                onClick={() => rows.remove(i)} aria-label={`Remove slab ${i + 1}${getValues(`rows.${i}.slabCode`) ? ` (${getValues(`rows.${i}.slabCode`)})` : ''}`}>Remove</Button>
            </fieldset>
          </li>
        ))}
      </ol>
      {errors.root?.message && <Notice tone="danger" role="alert" title="Nothing was saved">{errors.root.message}</Notice>}
      {jumps ? (
        <Notice tone="caution" role="alert" title="Are these readings right?">
          <p>{jumps.rows.length === 1 ? 'One reading jumps' : `${jumps.rows.length} readings jump`} a long way from the slab's previous reading (see the rows above). Check the meter and the slab. Nothing was saved yet.</p>
          <div className="mt-2 flex flex-wrap gap-2">
            <Button onClick={confirmJumps} disabled={save.isPending}>Yes, save them as read</Button>
            <Button variant="quiet" onClick={() => setJumps(null)}>No, I will measure again</Button>
          </div>
        </Notice>
      ) : errors.rows && !errors.root && <Notice tone="danger" role="alert">Some rows need fixing. Nothing was saved yet.</Notice>}
      <div className="flex flex-wrap gap-3">
        <Button variant="secondary" onClick={addRow} disabled={rows.fields.length >= BATCH_MAX_ROWS}>Add a slab</Button>
        <Button type="submit" disabled={save.isPending} className="grow sm:grow-0">{save.isPending ? 'Saving…' : `Save ${rows.fields.length} reading${rows.fields.length === 1 ? '' : 's'}`}</Button>
      </div>
      {saved && (
        <Notice tone="success" role="status" title={`${saved.length} reading${saved.length === 1 ? '' : 's'} saved`}>
          <ul className="list-disc pl-5">
            {saved.map((s) => <li key={s.reading.id}><span className="font-semibold">{s.slab.code}</span>: {dryingSummary(s.slab.dryingState, s.reading.mcPercent, s.targetMcPercent)}</li>)}
          </ul>
        </Notice>
      )}
    </form>
  );
}
