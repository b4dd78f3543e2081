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
  /** The other slabs of the book-matched set the yard marked, still for sale: offered together with this one. */
  setPartners?: { id: number; code: string }[];
};

/** Reserve (hold) this slab, or it and the rest of its book-matched set together. */
export function ReserveButton({ slabId, slabCode, status, setPartners = [] }: Props) {
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
  const partnerCodes = setPartners.map((p) => p.code).join(' and ');
  const setName = setPartners.length === 1 ? 'matched pair' : 'matched set';
  const reservePair = () => pair.mutate([slabId, ...setPartners.map((p) => p.id)], {
    onSuccess: () => setDone(`Slabs ${slabCode} and ${partnerCodes} are held for you as a ${setName}.`), onError,
  });

  if (done) {
    return (
      <Notice tone="success" role="status" title={done}>
        <Link to={paths.reservations()} className="font-semibold text-accent underline">See your reservations and check out</Link>
      </Notice>
    );
  }
  if (status !== 'listed') return null;
  const conflict = error instanceof ApiError && error.status === 409;

  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap gap-2">
        <Button onClick={reserveOne} disabled={busy}>{single.isPending ? 'Reserving…' : 'Reserve this slab'}</Button>
        {setPartners.length > 0 && (
          <Button variant="secondary" onClick={reservePair} disabled={busy}>
            {pair.isPending ? 'Reserving…' : `Reserve ${setPartners.length === 1 ? 'both' : `all ${setPartners.length + 1}`} as a ${setName} (with ${partnerCodes})`}
          </Button>
        )}
      </div>
      <p className="text-sm text-ink-soft">A reservation holds the slab for you for a limited time; pay and choose a pickup time from your reservations.</p>
      {error && !(error instanceof ApiError && error.status === 401) && (
        <Notice tone={conflict ? 'caution' : 'danger'} role="alert">
          {conflict && /another buyer/.test(error.message) ? 'Someone else is holding this slab right now.' : friendlyMessage(error)}
          {conflict && <> <Link to={paths.reservations()} className={buttonClass('quiet', 'min-h-0 px-0 py-0')}>Your reservations</Link></>}
        </Notice>
      )}
    </div>
  );
}
