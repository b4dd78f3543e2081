import { useId, useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { friendlyMessage } from '../../../lib/api-client';
import type { RoundSlab } from '../../../../shared/readings';
import { fetchRound, stacksQuery } from '../api';

/** Starts a round from one stack: every slab still in it, in the order the crew walks it. */
export function StackPicker({ onStart }: { onStart: (stack: string, slabs: RoundSlab[]) => void }) {
  const id = useId();
  const { data: stacks = [] } = useQuery(stacksQuery());
  const [stack, setStack] = useState('');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const due = stacks.filter((s) => s.due);

  async function start() {
    if (!stack) { setError('Choose a stack first.'); return; }
    setBusy(true);
    setError(null);
    try {
      const round = await fetchRound(stack);
      if (!round.items.length) setError(`No slabs to measure in ${stack}.`);
      else onStart(round.stack, round.items);
    } catch (e) {
      setError(friendlyMessage(e));
    } finally {
      setBusy(false);
    }
  }

  return (
    <section aria-labelledby={`${id}-h`} className="flex flex-col gap-2 rounded-md border border-line bg-surface-raised p-3">
      <h2 id={`${id}-h`} className="font-display text-lg font-bold">Start from a stack</h2>
      {due.length > 0 && (
        <p className="text-sm">Due for a round: {due.map((s) => s.stack).join(', ')} (every slab is read about once a month while it dries).</p>
      )}
      <div className="flex flex-wrap items-end gap-2">
        <div className="flex min-w-48 flex-col gap-1">
          <label htmlFor={id} className="text-sm font-semibold">Stack</label>
          <select id={id} value={stack} onChange={(e) => setStack(e.target.value)} className="min-h-11 rounded-md border border-line bg-surface px-2"
            aria-invalid={error ? true : undefined} aria-describedby={error ? `${id}-err` : undefined}>
            <option value="">Choose a stack…</option>
            {stacks.map((s) => (
              <option key={s.stack} value={s.stack}>
                {s.stack} · {s.slabCount} slab{s.slabCount === 1 ? '' : 's'}{s.due ? ' · due' : ''}{s.oldestReadingOn ? ` · oldest reading ${s.oldestReadingOn}` : ''}
              </option>
            ))}
          </select>
        </div>
        <Button variant="secondary" onClick={() => void start()} disabled={busy}>{busy ? 'Fetching…' : 'Fill in this stack'}</Button>
      </div>
      {error && <Notice tone="danger" role="alert"><span id={`${id}-err`}>{error}</span></Notice>}
    </section>
  );
}
