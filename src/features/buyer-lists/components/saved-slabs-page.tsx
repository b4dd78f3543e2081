import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { PageTitle } from '../../../components/ui/page-title';
import { Tag } from '../../../components/ui/tag';
import { friendlyMessage } from '../../../lib/api-client';
import { paths } from '../../../paths';
import { priceWords, STATUS_LABELS } from '../../../../shared/slabs';
import { formatCents } from '../../../../shared/wood/index';
import { BoardFeet, Dimensions } from '../../../lib/units';
import { savedSlabsQuery, useCompareList, useUnsaveSlab } from '../api';

/** The slabs a buyer saved, with their state today; from here they can compare or let one go. */
export function SavedSlabsPage() {
  const { data: items = [] } = useQuery(savedSlabsQuery());
  const unsave = useUnsaveSlab();
  const compare = useCompareList();
  const [refusal, setRefusal] = useState<string | null>(null);

  return (
    <section className="flex flex-col gap-4">
      <PageTitle>Saved slabs</PageTitle>
      {items.length === 0 ? (
        <Notice>You have not saved any slabs yet. On a slab’s page, choose “Save for later” to keep it here. <Link to={paths.catalogue()} className="text-accent underline">Browse the slabs</Link></Notice>
      ) : (
        <ul className="flex flex-col gap-3" aria-label="Saved slabs">
          {items.map((s) => (
            <li key={s.id} className="flex flex-wrap items-center gap-3 rounded-md border border-line bg-surface-raised p-3">
              {s.coverThumbUrl && <img src={s.coverThumbUrl} alt="" className="h-16 w-24 rounded object-cover" />}
              <div className="min-w-40 flex-1">
                <Link to={paths.slab(s.id)} className="font-semibold text-accent underline">{s.species.name} slab {s.code}</Link>
                <p className="text-sm text-ink-soft"><Dimensions of={s} /> · <BoardFeet value={s.boardFeet} /></p>
                <Tag tone={s.status === 'listed' ? 'moss' : s.status === 'held' ? 'caution' : 'neutral'}>{STATUS_LABELS[s.status]}</Tag>
              </div>
              <p className="font-bold">{priceWords(s.status, s.priceCents, formatCents)}</p>
              <div className="flex flex-wrap gap-2">
                {compare.has(s.id) ? (
                  <Button variant="secondary" onClick={() => compare.remove(s.id)} aria-label={`Take off compare: slab ${s.code}`}>Take off compare</Button>
                ) : (
                  <Button variant="secondary" onClick={() => { const r = compare.add(s.id); setRefusal(r.ok ? null : r.message); }} aria-label={`Add to compare: slab ${s.code}`}>Add to compare</Button>
                )}
                <Button variant="quiet" disabled={unsave.isPending} onClick={() => unsave.mutate(s.id)} aria-label={`Remove slab ${s.code} from saved slabs`}>Remove</Button>
              </div>
            </li>
          ))}
        </ul>
      )}
      {refusal && <Notice tone="caution" role="alert">{refusal}</Notice>}
      {unsave.error && <Notice tone="danger" role="alert">{friendlyMessage(unsave.error)}</Notice>}
      {compare.ids.length > 0 && <p><Link to={paths.compare()} className="font-semibold text-accent underline">Compare the {compare.ids.length} slab{compare.ids.length === 1 ? '' : 's'} on your list</Link></p>}
    </section>
  );
}
