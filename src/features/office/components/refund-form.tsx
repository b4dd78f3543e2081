import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { SelectField, TextAreaField, TextField } from '../../../components/ui/field';
import { ApiError, friendlyMessage } from '../../../lib/api-client';
import { centsAsPlainDollars, formatCents, parseDollarsToCents } from '../../../../shared/wood/index';
import { REFUND_REASON_MAX, RETURN_SLABS_TO, createRefundSchema, type OrderDetail } from '../../../../shared/office';
import { useRefund } from '../api';
import { ConfirmDialog } from './confirm-dialog';

/** A dollar amount as typed ("$1,000", "1000.50"), read by the shared money parser. */
const readableDollars = (v: string) => { try { parseDollarsToCents(v); return true; } catch { return false; } };

// The person types dollars; the API takes cents. The rest of the rules are the shared schema's.
const formSchema = createRefundSchema.omit({ amountCents: true }).extend({
  amountDollars: z.string().trim().min(1, 'Enter an amount').refine(readableDollars, 'Enter an amount like 125, 125.50 or $1,250'),
  slabIds: z.array(z.string()).default([]),
});
type FormValues = z.input<typeof formSchema>;
const toCents = (dollars: string) => parseDollarsToCents(dollars);
const newKey = () => crypto.randomUUID();

export function RefundForm({ order }: { order: OrderDetail }) {
  const refund = useRefund();
  // One key per refund the admin means to make: kept across repeated clicks, renewed after success or a refusal.
  const [key, setKey] = useState(newKey);
  const [pending, setPending] = useState<FormValues | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const form = useForm<FormValues>({ resolver: zodResolver(formSchema), defaultValues: { amountDollars: '', reason: '', slabIds: [], returnSlabsTo: 'listed' } });
  const { register, handleSubmit, setError, formState: { errors }, watch, reset } = form;
  const soldLines = order.lines.filter((l) => l.status === 'sold');
  const chosen = watch('slabIds') ?? [];

  if (order.refundableCents <= 0) return <Notice>Nothing is left to refund on this order.</Notice>;

  const send = () => {
    if (!pending) return;
    refund.mutate({
      orderId: order.id, idempotencyKey: key,
      body: { amountCents: toCents(pending.amountDollars), reason: pending.reason, slabIds: (pending.slabIds ?? []).map(Number), returnSlabsTo: pending.returnSlabsTo },
    }, {
      onSuccess: (r) => { setDone(`Refunded ${formatCents(r.refund.amountCents)}.`); setPending(null); setKey(newKey()); reset(); },
      onError: (e) => {
        setPending(null);
        if (e instanceof ApiError && e.status < 500) setKey(newKey());
        if (e instanceof ApiError) {
          for (const [field, msgs] of Object.entries(e.fieldErrors)) {
            setError(field === 'amountCents' ? 'amountDollars' : (field as keyof FormValues), { message: msgs[0] });
          }
        }
      },
    });
  };

  return (
    <form onSubmit={handleSubmit((v) => {
      setDone(null);
      // Checked here too, so the most that can be refunded is said at the box before anything is sent.
      if (toCents(v.amountDollars) > order.refundableCents) {
        setError('amountDollars', { message: `At most ${formatCents(order.refundableCents)} can still be refunded on this order.` });
        return;
      }
      setPending(v);
    })} className="flex flex-col gap-3" noValidate>
      <TextField label="Amount to refund (dollars)" inputMode="decimal" autoComplete="off" {...register('amountDollars')} error={errors.amountDollars?.message}
        hint={<>The most that can still be refunded is <strong>{formatCents(order.refundableCents)}</strong>.{' '}
          <button type="button" className="font-semibold text-accent underline" onClick={() => form.setValue('amountDollars', centsAsPlainDollars(order.refundableCents), { shouldValidate: true })}>
            Refund all of it
          </button></>} />
      <TextAreaField label="Reason (the buyer sees it)" maxLength={REFUND_REASON_MAX} {...register('reason')} error={errors.reason?.message} />
      {soldLines.length > 0 && (
        <fieldset className="flex flex-col gap-1">
          <legend className="text-sm font-semibold">Slabs refunded in full (optional)</legend>
          {soldLines.map((l) => (
            <label key={l.slabId} className="flex min-h-11 items-center gap-2">
              <input type="checkbox" value={String(l.slabId)} {...register('slabIds')} className="size-5" />
              {l.slabCode} — {l.speciesName}, {formatCents(l.totalCents)}
            </label>
          ))}
          {errors.slabIds && <p role="alert" className="text-sm text-danger">{errors.slabIds.message}</p>}
        </fieldset>
      )}
      {chosen.length > 0 && (
        <SelectField label="Where the chosen slabs go" {...register('returnSlabsTo')}>
          {RETURN_SLABS_TO.map((r) => <option key={r} value={r}>{r === 'listed' ? 'Back on sale' : 'Withdrawn from sale'}</option>)}
        </SelectField>
      )}
      {refund.error && !(refund.error instanceof ApiError && Object.keys(refund.error.fieldErrors).length) && (
        <Notice tone="danger" role="alert">{friendlyMessage(refund.error)}</Notice>
      )}
      {done && <Notice tone="success" role="status">{done} The buyer has been e-mailed.</Notice>}
      <div><Button type="submit" variant="danger">Refund…</Button></div>
      <ConfirmDialog open={pending !== null} busy={refund.isPending} tone="danger" title="Send this refund?"
        confirmLabel={pending ? `Refund ${formatCents(toCents(pending.amountDollars))}` : 'Refund'} onConfirm={send} onCancel={() => setPending(null)}>
        <p>The money goes back to the buyer's card. This cannot be undone.</p>
      </ConfirmDialog>
    </form>
  );
}
