import { useEffect, useRef, type ReactNode } from 'react';
import { Button } from '../../../components/ui/button';

type Props = {
  open: boolean;
  title: string;
  children: ReactNode;
  confirmLabel: string;
  tone?: 'primary' | 'danger';
  busy?: boolean;
  onConfirm(): void;
  onCancel(): void;
};

/** A modal question built on the native <dialog>: focus is trapped and Escape cancels. */
export function ConfirmDialog({ open, title, children, confirmLabel, tone = 'primary', busy, onConfirm, onCancel }: Props) {
  const ref = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const d = ref.current;
    if (!d) return;
    if (open && !d.open) d.showModal();
    if (!open && d.open) d.close();
  }, [open]);
  return (
    <dialog ref={ref} onCancel={(e) => { e.preventDefault(); onCancel(); }} aria-labelledby="confirm-title"
      className="m-auto w-[min(32rem,calc(100vw-2rem))] rounded-lg border border-line bg-surface-raised p-5 text-ink backdrop:bg-ink/40">
      <h2 id="confirm-title" className="font-display text-lg font-bold">{title}</h2>
      <div className="mt-3 flex flex-col gap-3">{children}</div>
      <div className="mt-5 flex flex-wrap justify-end gap-2">
        <Button variant="secondary" onClick={onCancel} disabled={busy}>Go back</Button>
        <Button variant={tone} onClick={onConfirm} disabled={busy}>{busy ? 'Working…' : confirmLabel}</Button>
      </div>
    </dialog>
  );
}
