import type { ButtonHTMLAttributes } from 'react';

type Variant = 'primary' | 'secondary' | 'quiet' | 'danger';

const styles: Record<Variant, string> = {
  primary: 'bg-accent text-white hover:bg-accent-strong disabled:bg-ink-soft/50',
  secondary: 'border border-accent text-accent bg-surface-raised hover:bg-accent-soft disabled:opacity-50',
  quiet: 'text-accent underline-offset-4 hover:underline disabled:opacity-50',
  danger: 'bg-danger text-white hover:opacity-90 disabled:opacity-50',
};

export function buttonClass(variant: Variant = 'primary', extra = '') {
  return `inline-flex items-center justify-center gap-2 rounded-md px-4 py-2 font-semibold min-h-11 transition-colors disabled:cursor-not-allowed ${styles[variant]} ${extra}`;
}

export function Button({ variant = 'primary', className = '', type = 'button', ...rest }: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant }) {
  return <button type={type} className={buttonClass(variant, className)} {...rest} />;
}
