import type { ReactNode } from 'react';

type Tone = 'caution' | 'danger' | 'info' | 'success';
const tones: Record<Tone, string> = {
  caution: 'border-caution bg-caution-soft text-ink',
  danger: 'border-danger bg-danger-soft text-ink',
  info: 'border-line bg-surface-sunk text-ink',
  success: 'border-moss bg-moss-soft text-ink',
};

/** A boxed message. Cautions about safety use tone="caution" and a title. */
export function Notice({ tone = 'info', title, children, role }: { tone?: Tone; title?: string; children: ReactNode; role?: 'alert' | 'status' }) {
  return (
    <div role={role} className={`rounded-md border-l-4 p-3 ${tones[tone]}`}>
      {title && <p className="font-semibold">{title}</p>}
      <div className="text-[0.95rem]">{children}</div>
    </div>
  );
}
