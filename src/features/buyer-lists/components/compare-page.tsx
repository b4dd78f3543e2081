import type { ReactNode } from 'react';
import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { PageTitle } from '../../../components/ui/page-title';
import { friendlyMessage } from '../../../lib/api-client';
import { paths } from '../../../paths';
import { MAX_COMPARE } from '../../../../shared/buyer-lists';
import { LIVE_EDGE_LABELS, priceWords, STATUS_LABELS, type SlabDetail } from '../../../../shared/slabs';
import { DRYING_STATES, formatCents } from '../../../../shared/wood/index';
import { useMeasures } from '../../../lib/units';
import { describeDefect } from '../../../../shared/slab-input';
import { compareQuery, useCompareList } from '../api';

type Measures = ReturnType<typeof useMeasures>;
type Row = { label: string; cell: (s: SlabDetail, m: Measures) => ReactNode };

const ROWS: Row[] = [
  { label: 'Price', cell: (s) => <strong>{priceWords(s.status, s.priceBreakdown?.totalCents ?? s.priceCents, formatCents)}</strong> },
  { label: 'Availability', cell: (s) => STATUS_LABELS[s.status] },
  { label: 'Thickness', cell: (s, m) => m.length(s.thicknessIn) },
  { label: 'Average width', cell: (s, m) => m.length(s.widthIn) },
  { label: 'Length', cell: (s, m) => m.longLength(s.lengthIn) },
  { label: 'Board feet', cell: (s, m) => m.boardFeet(s.boardFeet) },
  { label: 'Price per board foot', cell: (s) => (s.priceBreakdown ? formatCents(Math.round(s.priceBreakdown.slabCents / Math.max(s.boardFeet, 0.01))) : '—') },
  { label: 'Weight (estimate)', cell: (s, m) => `about ${m.weight(s.weightLb)} at ${s.weightAtMcPercent} % MC` },
  { label: 'Moisture content', cell: (s) => (s.moisturePercent === null ? 'No reading yet' : `${s.moisturePercent} % (target ${s.targetMcPercent} %)`) },
  { label: 'Drying', cell: (s) => DRYING_STATES.find((d) => d.state === s.dryingState)?.label ?? s.dryingState },
  { label: 'Edges', cell: (s) => LIVE_EDGE_LABELS[s.liveEdge] },
  { label: 'Figure', cell: (s) => (s.figures.length ? s.figures.join(', ') : 'Plain') },
  { label: 'Defects noted', cell: (s, m) => (s.defects.length ? s.defects.map((d) => describeDefect(d, m.length)).join('; ') : 'None') },
  { label: 'From log', cell: (s) => `${s.log.code}, slab ${s.sequenceInLog}` },
];

/** Up to four slabs side by side: one column a slab, one row a measure, so differences line up. */
export function ComparePage() {
  const list = useCompareList();
  const m = useMeasures();
  const { data, error, isPending } = useQuery(compareQuery(list.ids));
  const items = data?.items ?? [];

  return (
    <section className="flex flex-col gap-4">
      <PageTitle>Compare slabs</PageTitle>
      <p className="text-ink-soft">Up to {MAX_COMPARE} slabs. Add slabs from their pages with “Add to compare”; the list stays in this browser.</p>
      {list.ids.length === 0 ? (
        <Notice>Your compare list is empty. <Link to={paths.catalogue()} className="text-accent underline">Browse the slabs</Link> and add the ones you are weighing up.</Notice>
      ) : error ? (
        <Notice tone="danger" role="alert">{friendlyMessage(error)}</Notice>
      ) : isPending ? (
        <p>Fetching the slabs…</p>
      ) : (
        <>
          {!!data?.missingIds.length && (
            <Notice tone="caution">
              {data.missingIds.length === 1 ? 'One slab on your list is' : `${data.missingIds.length} slabs on your list are`} no longer shown in the shop.{' '}
              <Button variant="quiet" className="min-h-0 px-0 py-0" onClick={() => data.missingIds.forEach(list.remove)}>Take {data.missingIds.length === 1 ? 'it' : 'them'} off</Button>
            </Notice>
          )}
          <div className="overflow-x-auto rounded-md border border-line bg-surface-raised">
            <table className="w-full min-w-[36rem] border-collapse text-left">
              <caption className="sr-only">Slabs side by side</caption>
              <thead>
                <tr>
                  <td className="w-40 p-2" />
                  {items.map((s) => (
                    <th key={s.id} scope="col" className="p-2 align-top">
                      {s.coverThumbUrl && <img src={s.coverThumbUrl} alt="" className="mb-2 aspect-[3/1.6] w-full rounded object-cover" />}
                      <Link to={paths.slab(s.id)} className="font-display text-accent underline">{s.species.name} {s.code}</Link>
                      <div>
                        <Button variant="quiet" className="min-h-0 px-0 py-1 text-sm" onClick={() => list.remove(s.id)} aria-label={`Take off the compare list: slab ${s.code}`}>Take off</Button>
                      </div>
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {ROWS.map((row) => (
                  <tr key={row.label} className="border-t border-line">
                    <th scope="row" className="p-2 text-sm font-semibold text-ink-soft">{row.label}</th>
                    {items.map((s) => <td key={s.id} className="p-2">{row.cell(s, m)}</td>)}
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <div><Button variant="quiet" onClick={list.clear}>Empty the compare list</Button></div>
        </>
      )}
    </section>
  );
}
