import { useState } from 'react';
import { createFigureKindSchema } from '../../../../shared/slab-input';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { friendlyMessage } from '../../../lib/api-client';
import { useAddFigureKind } from '../api';

/** Figures are the mill's own list; staff add a new one here (it then prices by its multiplier). */
export function FigureKindAdder() {
  const add = useAddFigureKind();
  const [label, setLabel] = useState('');
  const [multiplier, setMultiplier] = useState('1');
  const [message, setMessage] = useState<string | null>(null);
  const submit = async () => {
    const slug = label.trim().toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '');
    const parsed = createFigureKindSchema.safeParse({ slug, label, premiumMultiplier: Number(multiplier) });
    if (!parsed.success) { setMessage(parsed.error.issues[0].message); return; }
    try {
      await add.mutateAsync(parsed.data);
      setMessage(`Added “${parsed.data.label}”.`);
      setLabel('');
    } catch (e) { setMessage(friendlyMessage(e)); }
  };
  return (
    <details className="rounded-md border border-line bg-surface-raised p-3">
      <summary className="cursor-pointer font-semibold">Add a figure to the list</summary>
      <div className="mt-2 grid items-end gap-2 sm:grid-cols-[1fr_10rem_auto]">
        <TextField label="Figure name" value={label} onChange={(e) => setLabel(e.target.value)} />
        <TextField label="Price multiplier" hint="1 = no premium" type="number" step="0.05" min="0.5" max="5" value={multiplier} onChange={(e) => setMultiplier(e.target.value)} />
        <Button variant="secondary" onClick={submit} disabled={add.isPending}>Add figure</Button>
      </div>
      {message && <p role="status" className="mt-2 text-sm">{message}</p>}
    </details>
  );
}
