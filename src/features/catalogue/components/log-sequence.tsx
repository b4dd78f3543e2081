import { Link } from 'react-router';
import type { LogNeighbour } from '../../../../shared/slabs';
import type { MatchedSetView } from '../../../../shared/matched-sets';
import { isSold, priceWords, STATUS_LABELS } from '../../../../shared/slabs';
import { formatCents } from '../../../../shared/wood/index';
import { Length } from '../../../lib/units';
import { paths } from '../../../paths';

/**
 * The slabs cut from the same log, in sawing order. The ones the yard marked as this slab's
 * book-matched set (mirror-image faces, for a table top) are labelled.
 */
export function LogSequence({ neighbours, matchedSet }: { neighbours: LogNeighbour[]; matchedSet: MatchedSetView | null }) {
  const inSet = new Set((matchedSet?.slabs ?? []).map((m) => m.id));
  return (
    <ol className="flex gap-2 overflow-x-auto pb-2" aria-label="Slabs from this log in sawing order">
      {neighbours.map((n) => {
        const partner = inSet.has(n.id);
        return (
          <li key={n.id} className={`w-36 shrink-0 rounded-md border p-2 text-sm ${n.isThisSlab ? 'border-accent bg-accent-soft' : 'border-line bg-surface-raised'}`}>
            {n.isThisSlab ? (
              <p className="font-semibold">No. {n.sequenceInLog} · this slab</p>
            ) : (
              <Link to={paths.slab(n.id)} className="font-semibold text-accent underline">No. {n.sequenceInLog} · {n.code}</Link>
            )}
            {n.coverThumbUrl && <img src={n.coverThumbUrl} alt="" className="my-1 h-12 w-full rounded object-cover" />}
            <p><Length inches={n.thicknessIn} /> × <Length inches={n.widthIn} /></p>
            <p>{isSold(n.status) ? priceWords(n.status, n.priceCents, formatCents) : STATUS_LABELS[n.status]}{n.status === 'listed' && n.priceCents !== null ? ` · ${formatCents(n.priceCents)}` : ''}</p>
            {partner && !n.isThisSlab && <p className="font-semibold text-moss">Book-matched partner</p>}
          </li>
        );
      })}
    </ol>
  );
}
