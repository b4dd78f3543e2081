import { useState } from 'react';
import { Link, useLocation, useNavigate } from 'react-router';
import { useQuery } from '@tanstack/react-query';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { ApiError, friendlyMessage } from '../../../lib/api-client';
import { paths } from '../../../paths';
import { slabMarksQuery, useCompareList, useSaveSlab, useUnsaveSlab, useUnwatchSlab, useWatchSlab } from '../api';

type Props = { slabId: number; code: string; status: string; signedIn: boolean };

/** Save for later, put on the compare list, and — for a slab held by someone else — ask to hear when it is free. */
export function SlabInterest({ slabId, code, status, signedIn }: Props) {
  const navigate = useNavigate();
  const location = useLocation();
  const { data: marks } = useQuery({ ...slabMarksQuery(), enabled: signedIn });
  const save = useSaveSlab();
  const unsave = useUnsaveSlab();
  const watch = useWatchSlab();
  const unwatch = useUnwatchSlab();
  const compare = useCompareList();
  const [compareRefusal, setCompareRefusal] = useState<string | null>(null);

  const saved = marks?.savedSlabIds.includes(slabId) ?? false;
  const watching = marks?.watchedSlabIds.includes(slabId) ?? false;
  const heldByMe = marks?.heldSlabIds.includes(slabId) ?? false;
  const toSignIn = () => navigate(paths.signIn(location.pathname));
  const error = save.error ?? unsave.error ?? watch.error ?? unwatch.error;
  const onCompare = compare.has(slabId);

  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap gap-2">
        <Button variant="secondary" aria-pressed={saved} disabled={save.isPending || unsave.isPending}
          onClick={() => (!signedIn ? toSignIn() : saved ? unsave.mutate(slabId) : save.mutate(slabId))}>
          {saved ? '★ Saved' : '☆ Save for later'}
        </Button>
        {onCompare ? (
          <Button variant="secondary" onClick={() => { compare.remove(slabId); setCompareRefusal(null); }}>Take off compare list</Button>
        ) : (
          <Button variant="secondary" onClick={() => {
            const result = compare.add(slabId);
            setCompareRefusal(result.ok ? null : result.message);
          }}>Add to compare</Button>
        )}
      </div>
      {compare.ids.length > 0 && (
        <p className="text-sm">
          <Link to={paths.compare()} className="font-semibold text-accent underline">
            Compare {compare.ids.length === 1 ? 'the 1 slab' : `${compare.ids.length} slabs`} on your list
          </Link>
        </p>
      )}
      {compareRefusal && <Notice tone="caution" role="alert">{compareRefusal}</Notice>}

      {status === 'held' && !heldByMe && (
        <div className="flex flex-col gap-1 rounded-md border border-line bg-surface-sunk p-3">
          {watching ? (
            <>
              <p role="status">We will e-mail you once if slab {code} comes free.</p>
              <div><Button variant="quiet" className="min-h-0 px-0" disabled={unwatch.isPending} onClick={() => unwatch.mutate(slabId)}>Stop waiting for it</Button></div>
            </>
          ) : (
            <>
              <p className="text-sm">Someone is holding this slab. Holds end if they do not buy it in time.</p>
              <div>
                <Button variant="secondary" disabled={watch.isPending} onClick={() => (signedIn ? watch.mutate(slabId) : toSignIn())}>
                  E-mail me if it comes free
                </Button>
              </div>
            </>
          )}
        </div>
      )}
      {error && !(error instanceof ApiError && error.status === 401) && <Notice tone="danger" role="alert">{friendlyMessage(error)}</Notice>}
    </div>
  );
}
