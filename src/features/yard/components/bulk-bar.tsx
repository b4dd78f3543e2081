import { useState } from 'react';
import { Link } from 'react-router';
import type { BulkResult } from '../../../../shared/slab-input';
import { Button, buttonClass } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/notice';
import { SafetyNotice } from '../../../components/safety-caution';
import { MOVE_TO_STACK_CAUTION } from '../../../../shared/safety';
import { friendlyMessage } from '../../../lib/api-client';
import { paths } from '../../../paths';
import { useBulkAction } from '../api';

type Props = { selected: { id: number; code: string }[]; onDone: () => void };

/** Actions on the ticked slabs. Each slab succeeds or fails on its own; failures are listed with the reason. */
export function BulkBar({ selected, onDone }: Props) {
  const bulk = useBulkAction();
  const [stack, setStack] = useState('');
  const [results, setResults] = useState<BulkResult[] | null>(null);
  const [error, setError] = useState<string | null>(null);
  const ids = selected.map((s) => s.id);
  const codeOf = (id: number) => selected.find((s) => s.id === id)?.code ?? `#${id}`;
  const run = async (action: 'list' | 'withdraw' | 'move') => {
    setError(null);
    try {
      const res = await bulk.mutateAsync({ ids, action, ...(action === 'move' ? { stack } : {}) });
      setResults(res.results);
      onDone();
    } catch (e) { setError(friendlyMessage(e)); }
  };
  const failed = results?.filter((r) => !r.ok) ?? [];
  return (
    <section aria-label="Actions on selected slabs" className="no-print grid gap-2 rounded-md border border-line bg-surface-sunk p-3">
      <p className="font-semibold">{selected.length} selected</p>
      <div className="flex flex-wrap items-end gap-2">
        <Button disabled={!ids.length || bulk.isPending} onClick={() => run('list')}>Put up for sale</Button>
        <Button variant="secondary" disabled={!ids.length || bulk.isPending} onClick={() => run('withdraw')}>Withdraw</Button>
        <TextField label="Move to stack" value={stack} onChange={(e) => setStack(e.target.value)} className="w-36" />
        <Button variant="secondary" disabled={!ids.length || !stack.trim() || bulk.isPending} onClick={() => run('move')}>Move</Button>
        {ids.length > 0
          ? <Link className={buttonClass('quiet')} to={paths.yardLabels(ids)}>Print labels</Link>
          : <span className="px-4 text-ink-soft">Print labels</span>}
      </div>
      {(ids.length > 0 || stack.trim() !== '') && <SafetyNotice caution={MOVE_TO_STACK_CAUTION} />}
      {error && <Notice tone="danger" role="alert">{error}</Notice>}
      {results && (
        <Notice tone={failed.length ? 'caution' : 'success'} role="status" title={`${results.length - failed.length} of ${results.length} saved`}>
          {failed.length > 0 && <ul className="list-disc pl-5">{failed.map((r) => <li key={r.id}><strong>{codeOf(r.id)}</strong>: {r.message}</li>)}</ul>}
        </Notice>
      )}
    </section>
  );
}
