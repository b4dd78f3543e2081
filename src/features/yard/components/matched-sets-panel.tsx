import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { friendlyMessage } from '../../../lib/api-client';
import { MATCHED_SET_SIZE, setWords } from '../../../../shared/matched-sets';
import type { LogSlab } from '../../../../shared/logs';
import { logMatchedSetsQuery, useMatchedSetChange } from '../api';

/**
 * The yard decides which slabs of this log are sold as book-matched: the marked sets, one-click
 * suggestions for neighbouring slabs (sawn one after the other, the usual match), and a free choice
 * of slabs for anything else. Every page that speaks of book-matching reads these marks.
 */
export function MatchedSetsPanel({ logId, slabs }: { logId: number; slabs: LogSlab[] }) {
  const { data } = useQuery(logMatchedSetsQuery(logId));
  const { mark, unmark } = useMatchedSetChange(logId);
  const [picked, setPicked] = useState<number[]>([]);
  const error = mark.error ?? unmark.error;
  const inSet = new Set((data?.sets ?? []).flatMap((s) => s.slabs.map((m) => m.id)));
  const free = slabs.filter((s) => !inSet.has(s.id) && s.status !== 'withdrawn');
  const toggle = (id: number) => setPicked((p) => (p.includes(id) ? p.filter((x) => x !== id) : [...p, id]));

  return (
    <section aria-labelledby="matched-sets" className="grid gap-3 rounded-md border border-line bg-surface-raised p-4">
      <h2 id="matched-sets" className="text-xl font-bold">Book-matched sets</h2>
      {!data ? <p className="text-ink-soft">Loading…</p> : (
        <>
          {data.sets.length === 0 ? <p>No slabs of this log are marked as book-matched.</p> : (
            <ul className="grid gap-2">
              {data.sets.map((set) => (
                <li key={set.id} className="flex flex-wrap items-center gap-2">
                  <span className="font-semibold">{setWords(set.slabs.length)[0].toUpperCase() + setWords(set.slabs.length).slice(1)}:</span>
                  <span>{set.slabs.map((m) => `${m.code} (no. ${m.sequenceInLog})`).join(' + ')}</span>
                  <Button variant="quiet" disabled={unmark.isPending} onClick={() => unmark.mutate(set.id)}
                    aria-label={`Unmark the set ${set.slabs.map((m) => m.code).join(' and ')}`}>Unmark</Button>
                </li>
              ))}
            </ul>
          )}
          {data.suggestions.length > 0 && (
            <div className="grid gap-1">
              <p className="text-sm text-ink-soft">Neighbours sawn one after the other usually book-match. Mark the ones whose faces really mirror each other:</p>
              <ul className="flex flex-wrap gap-2">
                {data.suggestions.map((pair) => (
                  <li key={pair.map((m) => m.id).join('-')}>
                    <Button variant="secondary" disabled={mark.isPending} onClick={() => mark.mutate(pair.map((m) => m.id))}>
                      Mark {pair.map((m) => m.code).join(' + ')} as a pair
                    </Button>
                  </li>
                ))}
              </ul>
            </div>
          )}
          {free.length >= MATCHED_SET_SIZE.min && (
            <fieldset className="grid gap-1">
              <legend className="text-sm font-semibold">Or choose the slabs of a set ({MATCHED_SET_SIZE.min}–{MATCHED_SET_SIZE.max})</legend>
              <div className="flex flex-wrap gap-3">
                {free.map((s) => (
                  <label key={s.id} className="flex items-center gap-1">
                    <input type="checkbox" checked={picked.includes(s.id)} onChange={() => toggle(s.id)} /> {s.code}
                  </label>
                ))}
              </div>
              <div>
                <Button disabled={mark.isPending || picked.length < MATCHED_SET_SIZE.min}
                  onClick={() => mark.mutate(picked, { onSuccess: () => setPicked([]) })}>Mark as a book-matched set</Button>
              </div>
            </fieldset>
          )}
          {error && <Notice tone="danger" role="alert">{friendlyMessage(error)}</Notice>}
        </>
      )}
    </section>
  );
}
