import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { Tag } from '../../../components/ui/tag';
import { friendlyMessage } from '../../../lib/api-client';
import { METER_KIND_LABELS } from '../../../../shared/readings';
import { slabReadingsQuery, useDeleteReading } from '../api';
import { DryingForecastNote } from '../../../components/wood/drying-forecast';
import { DryingCurve } from './drying-curve';
import { ReadingForm } from './reading-form';
import { dryingLabel } from './drying-words';

/** Everything about one slab's moisture for the yard desk: curve, form and the list of readings. */
export function SlabReadingsPanel({ slabId }: { slabId: number }) {
  const q = useQuery(slabReadingsQuery(slabId));
  const remove = useDeleteReading(slabId);
  const [confirmId, setConfirmId] = useState<number | null>(null);

  if (q.isPending) return <p className="text-ink-soft">Loading readings…</p>;
  if (q.isError) return <Notice tone="danger" role="alert">{friendlyMessage(q.error)}</Notice>;
  const { items, targetMcPercent, airDryReadyOn, slab, dryingForecast } = q.data;
  const newestFirst = [...items].reverse();

  return (
    <section aria-labelledby="yard-readings-heading" className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center gap-2">
        <h2 id="yard-readings-heading" className="font-display text-xl text-ink">Moisture readings</h2>
        <Tag tone="accent">{dryingLabel(slab.dryingState)}</Tag>
        <span className="text-sm text-ink-soft">mill target {targetMcPercent} %</span>
      </div>
      <DryingCurve readings={items.filter((r) => r.review !== 'unconfirmed')} targetMcPercent={targetMcPercent} airDryReadyOn={airDryReadyOn} />
      <DryingForecastNote forecast={dryingForecast} heading="Air-dry forecast" />
      <ReadingForm slabId={slabId} />
      {remove.isError && <Notice tone="danger" role="alert">{friendlyMessage(remove.error)}</Notice>}
      {newestFirst.length > 0 && (
        <div className="overflow-x-auto">
          <table className="w-full text-left text-sm">
            <caption className="sr-only">Readings, newest first</caption>
            <thead className="border-b border-line text-ink-soft">
              <tr><th scope="col" className="py-2 pr-3">Date</th><th scope="col" className="pr-3">MC</th><th scope="col" className="pr-3">Meter</th><th scope="col" className="pr-3">Where</th><th scope="col"><span className="sr-only">Actions</span></th></tr>
            </thead>
            <tbody>
              {newestFirst.map((r) => (
                <tr key={r.id} className="border-b border-line/60">
                  <td className="py-2 pr-3 whitespace-nowrap">{r.measuredOn}</td>
                  <td className="pr-3">
                    <span className="font-semibold">{r.mcPercent} %</span>
                    {r.review === 'confirmed' && <span className="ml-1 text-ink-soft">(confirmed jump)</span>}
                    {r.review === 'unconfirmed' && <span className="ml-1"><Tag tone="danger">Not shown to buyers</Tag></span>}
                  </td>
                  <td className="pr-3">{METER_KIND_LABELS[r.meterKind] ?? r.meterKind}</td>
                  <td className="pr-3">{r.location || '—'}{r.depthIn !== null ? `, ${r.depthIn} in deep` : ''}</td>
                  <td className="py-1 text-right">
                    {confirmId === r.id ? (
                      <span className="inline-flex gap-1">
                        <Button variant="danger" disabled={remove.isPending} onClick={() => remove.mutate(r.id, { onSettled: () => setConfirmId(null) })}>Delete</Button>
                        <Button variant="quiet" onClick={() => setConfirmId(null)} autoFocus>Keep</Button>
                      </span>
                    ) : (
                      <Button variant="quiet" onClick={() => setConfirmId(r.id)} aria-label={`Delete the ${r.mcPercent} % reading of ${r.measuredOn}`}>Delete…</Button>
                    )}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
