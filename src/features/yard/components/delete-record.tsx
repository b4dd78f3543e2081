import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { friendlyMessage } from '../../../lib/api-client';
import { useDeleteRecord } from '../api';

type Props = { kind: 'slab' | 'log'; id: number; code: string; onDeleted: (code: string) => void };

/** "Recorded by mistake": a two-step delete; the server says plainly when the record must stay. */
export function DeleteRecord({ kind, id, code, onDeleted }: Props) {
  const remove = useDeleteRecord(kind);
  const [asking, setAsking] = useState(false);
  const what = `${kind} ${code}`;
  return (
    <section aria-label={`Delete ${what}`} className="flex flex-col gap-2 rounded-md border border-line p-3">
      <p className="text-sm text-ink-soft">
        Recorded by mistake? A {kind} can be deleted only while {kind === 'slab' ? 'it has never been for sale, held or sold' : 'no slab has been recorded from it'}. The office keeps a record of the deletion.
      </p>
      {asking ? (
        <div role="group" aria-label={`Delete ${what} for good?`} className="flex flex-wrap items-center gap-2 rounded bg-danger-soft p-2">
          <p>Delete {what} and everything recorded with it for good?</p>
          <Button variant="danger" disabled={remove.isPending} onClick={() => remove.mutate(id, { onSuccess: (r) => onDeleted(r.deleted) })}>
            {remove.isPending ? 'Deleting…' : `Yes, delete ${what}`}
          </Button>
          <Button variant="quiet" onClick={() => { setAsking(false); remove.reset(); }} autoFocus>Keep it</Button>
        </div>
      ) : (
        <div><Button variant="quiet" onClick={() => setAsking(true)}>Delete this {kind}…</Button></div>
      )}
      {remove.error && <Notice tone="danger" role="alert">{friendlyMessage(remove.error)}</Notice>}
    </section>
  );
}
