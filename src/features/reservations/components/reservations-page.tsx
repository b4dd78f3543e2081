import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router';
import { Button, buttonClass } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { PageTitle } from '../../../components/ui/page-title';
import { friendlyMessage } from '../../../lib/api-client';
import { paths } from '../../../paths';
import { formatCents } from '../../../../shared/wood/index';
import { BoardFeet, Dimensions, Weight } from '../../../lib/units';
import { myHoldsQuery, useReleaseHold } from '../api';
import { TimeLeft } from './time-left';

/** The buyer's held slabs, like a cart: time left on each, release, and on to checkout. */
export function ReservationsPage() {
  const { data: holds = [] } = useQuery({ ...myHoldsQuery(), refetchInterval: 60_000 });
  const release = useReleaseHold();
  const total = holds.reduce((t, h) => t + h.slab.priceCents, 0);

  return (
    <section className="flex flex-col gap-4">
      <PageTitle>Your reservations</PageTitle>
      {holds.length === 0 ? (
        <Notice>Nothing on hold. <Link to={paths.catalogue()} className="text-accent underline">Browse the slabs</Link> and reserve the ones you want.</Notice>
      ) : (
        <>
          <ul className="flex flex-col gap-3">
            {holds.map((h) => (
              <li key={h.id} className="flex flex-wrap items-center gap-3 rounded-md border border-line bg-surface-raised p-3">
                {h.slab.coverThumbUrl && <img src={h.slab.coverThumbUrl} alt="" className="h-16 w-24 rounded object-cover" />}
                <div className="min-w-40 flex-1">
                  <Link to={paths.slab(h.slabId)} className="font-semibold text-accent underline">{h.slab.speciesName} slab {h.slab.code}</Link>
                  <p className="text-sm text-ink-soft">
                    <Dimensions of={h.slab} /> · <BoardFeet value={h.slab.boardFeet} /> · about <Weight pounds={h.slab.weightLb} />
                    {h.groupId && ' · matched pair'}
                  </p>
                  <p className="text-sm"><TimeLeft until={h.expiresAt} /></p>
                </div>
                <p className="font-bold">{formatCents(h.slab.priceCents)}</p>
                <Button variant="secondary" disabled={release.isPending} onClick={() => release.mutate(h.id)} aria-label={`Release slab ${h.slab.code}`}>
                  Release
                </Button>
              </li>
            ))}
          </ul>
          {release.error && <Notice tone="danger" role="alert">{friendlyMessage(release.error)}</Notice>}
          <div className="flex flex-wrap items-center justify-between gap-3 border-t border-line pt-3">
            <p className="text-lg">Slabs: <strong>{formatCents(total)}</strong> <span className="text-sm text-ink-soft">(services and pickup chosen at checkout)</span></p>
            <Link to={paths.checkout()} className={buttonClass('primary')}>Go to checkout</Link>
          </div>
        </>
      )}
    </section>
  );
}
