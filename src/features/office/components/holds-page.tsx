import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router';
import { PageTitle } from '../../../components/ui/page-title';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { friendlyMessage } from '../../../lib/api-client';
import { paths } from '../../../paths';
import type { ActiveHold } from '../../../../shared/office';
import { holdsQuery, useReleaseHold } from '../api';
import { ConfirmDialog } from './confirm-dialog';

const left = (iso: string) => {
  const h = (Date.parse(iso) - Date.now()) / 3_600_000;
  return h <= 0 ? 'ending now' : h < 1 ? `${Math.round(h * 60)} min left` : `${Math.round(h)} h left`;
};

export function HoldsPage() {
  const { data } = useQuery(holdsQuery());
  const release = useReleaseHold();
  const [target, setTarget] = useState<ActiveHold | null>(null);
  return (
    <div className="flex flex-col gap-4">
      <PageTitle>Slabs on hold</PageTitle>
      {data && !data.items.length && <p>No slab is on hold right now.</p>}
      <ul className="flex flex-col gap-2">
        {data?.items.map((h) => (
          <li key={h.id} className="flex flex-wrap items-center justify-between gap-2 rounded-md border border-line bg-surface-raised p-3">
            <span>
              <Link to={paths.slab(h.slabId)} className="font-semibold text-accent underline">{h.slabCode}</Link>{' '}
              for {h.buyerName} ({h.buyerEmail}) · until {new Date(h.expiresAt).toLocaleString()} · {left(h.expiresAt)}
              {h.groupId && <> · <span className="font-semibold">part of a matched set held together</span>{' '}
                ({data.items.filter((o) => o.groupId === h.groupId).map((o) => o.slabCode).join(', ')})</>}
            </span>
            <Button variant="secondary" onClick={() => setTarget(h)}>Let go</Button>
          </li>
        ))}
      </ul>
      {release.error && <Notice tone="danger" role="alert">{friendlyMessage(release.error)}</Notice>}
      <ConfirmDialog open={target !== null} busy={release.isPending} title={`Let go of the hold on ${target?.slabCode ?? ''}?`} confirmLabel="Put it back on sale"
        onCancel={() => setTarget(null)} onConfirm={() => target && release.mutate(target.id, { onSettled: () => setTarget(null) })}>
        <p>{target?.buyerName} loses the hold and the slab is on sale to everyone again.</p>
        {target?.groupId && (
          <p>This slab was reserved as part of a book-matched set. The rest of the set stays held for {target.buyerName} until its own time runs out,
            and they are e-mailed which slabs still wait for them.</p>
        )}
      </ConfirmDialog>
    </div>
  );
}
