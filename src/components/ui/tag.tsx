import type { ReactNode } from 'react';

type Tone = 'neutral' | 'moss' | 'accent' | 'caution' | 'danger';
const tones: Record<Tone, string> = {
  neutral: 'bg-surface-sunk text-ink',
  moss: 'bg-moss-soft text-moss',
  accent: 'bg-accent-soft text-accent-strong',
  caution: 'bg-caution-soft text-caution',
  danger: 'bg-danger-soft text-danger',
};

export function Tag({ tone = 'neutral', children }: { tone?: Tone; children: ReactNode }) {
  return <span className={`inline-block rounded px-2 py-0.5 text-sm font-semibold ${tones[tone]}`}>{children}</span>;
}
