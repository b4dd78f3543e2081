import { Link } from 'react-router';
import { paths } from '../../../paths';
import { STATUS_LABELS, LIVE_EDGE_LABELS, priceWords, type SlabListItem } from '../../../../shared/slabs';
import { formatCents, formatPercent, MM_PER_INCH } from '../../../../shared/wood/index';
import { useMeasures } from '../../../lib/units';
import { Tag } from '../../../components/ui/tag';

export function SlabCard({ slab }: { slab: SlabListItem }) {
  const forSale = slab.status === 'listed';
  const m = useMeasures();
  // Read aloud as plain numbers with the unit named in full.
  const spoken = m.units === 'metric'
    ? `thickness ${Math.round(slab.thicknessIn * MM_PER_INCH)} millimetres, average width ${Math.round(slab.widthIn * MM_PER_INCH)} millimetres, length ${Math.round(slab.lengthIn * MM_PER_INCH)} millimetres`
    : `thickness ${slab.thicknessIn} inches, average width ${slab.widthIn} inches, length ${slab.lengthIn} inches`;
  return (
    <li className="flex flex-col overflow-hidden rounded-lg border border-line bg-surface-raised shadow-sm">
      <Link to={paths.slab(slab.id)} className="group flex h-full flex-col focus-visible:outline-offset-[-3px]">
        <div className="aspect-[3/1.6] bg-surface-sunk">
          {slab.coverThumbUrl ? (
            <img src={slab.coverThumbUrl} alt="" loading="lazy" className="h-full w-full object-cover" />
          ) : (
            <div className="flex h-full items-center justify-center text-sm text-ink-soft">No photo yet</div>
          )}
        </div>
        <div className="flex flex-1 flex-col gap-1 p-3">
          <div className="flex items-baseline justify-between gap-2">
            <h2 className="font-display text-lg font-bold group-hover:underline">{slab.species.name}</h2>
            <span className="text-sm text-ink-soft">{slab.code}</span>
          </div>
          <p className="text-ink-soft" aria-label={spoken}>{m.dimensions(slab)}</p>
          <p className="text-sm text-ink-soft">{LIVE_EDGE_LABELS[slab.liveEdge]}{slab.figures.length ? ` · ${slab.figures.join(', ')}` : ''}</p>
          <div className="mt-auto flex items-end justify-between gap-2 pt-2">
            <div>
              <p className="text-xl font-bold text-accent-strong">{priceWords(slab.status, slab.priceCents, formatCents)}</p>
              <p className="text-sm text-ink-soft">{m.boardFeet(slab.boardFeet)}</p>
            </div>
            <div className="flex flex-col items-end gap-1">
              <Tag tone={forSale ? 'moss' : slab.status === 'held' ? 'caution' : 'neutral'}>{STATUS_LABELS[slab.status]}</Tag>
              {slab.moisturePercent !== null && <span className="text-sm text-ink-soft">{formatPercent(slab.moisturePercent)} MC</span>}
            </div>
          </div>
        </div>
      </Link>
    </li>
  );
}
