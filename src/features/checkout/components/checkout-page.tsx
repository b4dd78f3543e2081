import { useRef } from 'react';
import { useQuery } from '@tanstack/react-query';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { Link, useNavigate } from 'react-router';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { PageTitle } from '../../../components/ui/page-title';
import { ApiError, friendlyMessage } from '../../../lib/api-client';
import { paths } from '../../../paths';
import type { HoldView } from '../../../../shared/holds';
import { loadingAdvice } from '../../../../shared/loading';
import { formatCents } from '../../../../shared/wood/index';
import { Length } from '../../../lib/units';
import { newIdempotencyKey, pickupSlotsQuery, useCheckout } from '../api';
import { LoadingAdvicePanel } from './loading-advice-panel';
import { SlotPicker } from './slot-picker';

const formSchema = z.object({
  slot: z.string({ error: 'Choose a pickup time' }).min(1, 'Choose a pickup time'),
  flatten: z.array(z.string()),
  loadingHelp: z.boolean(),
});
type FormValues = z.infer<typeof formSchema>;

export function CheckoutPage({ holds }: { holds: HoldView[] }) {
  const navigate = useNavigate();
  const { data: slots } = useQuery(pickupSlotsQuery());
  const pay = useCheckout();
  // One key per attempt: a retry after a lost connection reuses it, so the server never charges twice.
  const attemptKey = useRef(newIdempotencyKey());
  const { register, handleSubmit, watch, setError, formState: { errors } } = useForm<FormValues>({
    resolver: zodResolver(formSchema),
    defaultValues: { slot: '', flatten: [], loadingHelp: false },
  });
  const flatten = (watch('flatten') ?? []).map(Number);
  const loadingHelp = watch('loadingHelp');
  const services = holds.filter((h) => flatten.includes(h.slabId)).reduce((t, h) => t + h.slab.flattening.priceCents, 0);
  const slabsTotal = holds.reduce((t, h) => t + h.slab.priceCents, 0);
  const advice = loadingAdvice(holds.map((h) => ({ weightLb: h.slab.weightLb, lengthIn: h.slab.lengthIn })), { loadingHelp });

  if (!holds.length) {
    return <Notice>Nothing to pay for yet. <Link className="text-accent underline" to={paths.catalogue()}>Reserve a slab first.</Link></Notice>;
  }

  const onSubmit = (v: FormValues) => {
    const [windowId, pickupOn] = v.slot.split('|');
    pay.mutate(
      { key: attemptKey.current, input: { holdIds: holds.map((h) => h.id), pickupWindowId: Number(windowId), pickupOn, withFlattening: v.flatten.map(Number), loadingHelp: v.loadingHelp, paymentMethod: 'card' } },
      {
        // Card details are typed on the payment page, never here: the browser goes there next.
        onSuccess: ({ orderId, paymentUrl }) => (paymentUrl ? window.location.assign(paymentUrl) : navigate(paths.order(orderId))),
        onError: (err) => {
          // The server answered, so this attempt is over: the next press is a new attempt.
          if (err instanceof ApiError) attemptKey.current = newIdempotencyKey();
          if (err instanceof ApiError) {
            const fe = err.fieldErrors;
            const slotMsg = fe.pickupWindowId?.[0] ?? fe.pickupOn?.[0] ?? (err.code === 'window_full' ? err.message : undefined);
            if (slotMsg) setError('slot', { message: slotMsg });
            if (fe.withFlattening?.[0]) setError('flatten', { message: fe.withFlattening[0] });
          }
        },
      },
    );
  };

  return (
    <form onSubmit={handleSubmit(onSubmit)} className="flex flex-col gap-6" noValidate>
      <PageTitle>Checkout</PageTitle>
      <section aria-labelledby="slabs-heading" className="flex flex-col gap-2">
        <h2 id="slabs-heading" className="text-lg font-bold">Your slabs</h2>
        <ul className="flex flex-col gap-2">
          {holds.map((h) => (
            <li key={h.id} className="rounded-md border border-line bg-surface-raised p-3">
              <p className="flex flex-wrap justify-between gap-2"><span className="font-semibold">{h.slab.speciesName} slab {h.slab.code}</span><span>{formatCents(h.slab.priceCents)}</span></p>
              {h.slab.flattening.feasible ? (
                <label className="mt-1 flex min-h-11 items-center gap-2">
                  <input type="checkbox" value={String(h.slabId)} {...register('flatten')} />
                  <span>Flatten both faces at the mill (+{formatCents(h.slab.flattening.priceCents)}, leaves about <Length inches={h.slab.flattening.finishedThicknessIn} />)</span>
                </label>
              ) : <p className="text-sm text-ink-soft">Flattening not offered: {h.slab.flattening.reason}</p>}
            </li>
          ))}
        </ul>
        {errors.flatten?.message && <p role="alert" className="text-sm text-danger">{errors.flatten.message}</p>}
        {flatten.length > 0 && (
          <Notice tone="caution" title="Wood dust">
            Flattening is done at the mill, but any further sanding at home makes fine dust that harms the lungs. Use dust collection and a fitted respirator, and follow your local rules.
          </Notice>
        )}
      </section>

      <SlotPicker slots={slots?.slots ?? []} field={register('slot')} error={errors.slot?.message} />
      {slots?.yardAddress && <p>Pickup is at the yard: <strong>{slots.yardAddress}</strong>.</p>}

      <label className="flex min-h-11 items-center gap-2">
        <input type="checkbox" {...register('loadingHelp')} />
        <span>I would like the yard crew's help loading</span>
      </label>
      {advice && <LoadingAdvicePanel advice={advice} loadingHelp={loadingHelp} />}

      <p className="text-sm text-ink-soft">You pay by card on the payment service's secure page; Stickerline never sees your card number. Coming back without paying keeps your holds.</p>

      <div className="flex flex-col gap-2 border-t border-line pt-3">
        <p>Slabs {formatCents(slabsTotal)}{services > 0 && <> · flattening {formatCents(services)}</>}</p>
        <p className="text-xl">Total <strong>{formatCents(slabsTotal + services)}</strong></p>
        {pay.error && <Notice tone="danger" role="alert">{friendlyMessage(pay.error)}</Notice>}
        <Button type="submit" disabled={pay.isPending || pay.isSuccess} className="self-start">{pay.isPending || pay.isSuccess ? 'Opening the payment page…' : `Go to payment — ${formatCents(slabsTotal + services)}`}</Button>
      </div>
    </form>
  );
}
