import type { ReactNode } from 'react';
import { PageTitle } from '../../../components/ui/page-title';

/** The narrow column every sign-in style page sits in; readable on a phone in the yard. */
export function AuthPanel({ title, intro, children, footer }: { title: string; intro?: ReactNode; children: ReactNode; footer?: ReactNode }) {
  return (
    <section className="mx-auto flex w-full max-w-md flex-col gap-4 py-4">
      <PageTitle>{title}</PageTitle>
      {intro && <p className="text-ink-soft">{intro}</p>}
      <div className="rounded-lg border border-line bg-surface-raised p-4 sm:p-6">{children}</div>
      {footer && <div className="flex flex-col gap-2 text-sm">{footer}</div>}
    </section>
  );
}
