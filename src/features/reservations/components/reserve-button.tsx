import { useState } from 'react';
import { Link, useLocation, useNavigate } from 'react-router';
import { Button, buttonClass } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { ApiError, friendlyMessage } from '../../../lib/api-client';
import { paths } from '../../../paths';
import { useHoldPair, useHoldSlab } from '../api';

type Props = {
  slabId: number;
  slabCode: string;
  status: string;
  /** A listed neighbour from the same log, offered as a book-matched pair. */
  matchedNeighbour?: { id: number; code: string } | null;
};

/** Reserve (hold) this slab, or it and its book-matched neighbour together. */
export function ReserveButton({ slabId, slabCode, status, matchedNeighbour }: Props) {
  const navigate = useNavigate();
  const location = useLocation();
  const single = useHoldSlab();
  const pair = useHoldPair();
  const [done, setDone] = useState<string | null>(null);
  const error = single.error ?? pair.error;
  const busy = single.isPending || pair.isPending;

  const onError = (err: unknown) => {
    if (err instanceof ApiError && err.status === 401) navigate(paths.signIn(location.pathname));
  };
  const reserveOne = () => single.mutate(slabId, { onSuccess: () => setDone(`Slab ${slabCode} is held for you.`), onError });
  const reservePair = () => matchedNeighbour && pair.mutate([slabId, matchedNeighbour.id], {
    onSuccess: () => setDone(`Slabs ${slabCode} and ${matchedNeighbour.code} are held for you as a matched pair.`), onError,
  });

  if (done) {
    return (
      <Notice tone="success" role="status" title={done}>
        <Link to={paths.reservations()} className="font-semibold text-accent underline">Go to my holds and check out</Link>
      </Notice>
    );
  }
  const conflict = error instanceof ApiError && error.status === 409;
  const refusal = error && !(error instanceof ApiError && error.status === 401) && (
    <Notice tone={conflict ? 'caution' : 'danger'} role="alert">
      {friendlyMessage(error)}
      {conflict && <> <Link to={paths.reservations()} className={buttonClass('quiet', 'min-h-0 px-0 py-0')}>My holds</Link></>}
    </Notice>
  );
  // Refused because the slab changed meanwhile: the page has refreshed, so only the reason stays.
  if (status !== 'listed') return refusal || null;

  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap gap-2">
        <Button onClick={reserveOne} disabled={busy}>{single.isPending ? 'Reserving…' : 'Reserve this slab'}</Button>
        {matchedNeighbour && (
          <Button variant="secondary" onClick={reservePair} disabled={busy}>
            {pair.isPending ? 'Reserving…' : `Reserve both as a matched pair (with ${matchedNeighbour.code})`}
          </Button>
        )}
      </div>
      <p className="text-sm text-ink-soft">A reservation holds the slab for you for a limited time; pay and choose a pickup time from My holds.</p>
      {refusal}
    </div>
  );
}
