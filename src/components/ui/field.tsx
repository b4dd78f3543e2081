import { useId, type InputHTMLAttributes, type ReactNode, type SelectHTMLAttributes, type TextareaHTMLAttributes, forwardRef } from 'react';

const control = 'w-full rounded-md border border-line bg-surface-raised px-3 py-2 min-h-11 text-ink aria-[invalid=true]:border-danger';

type FieldProps = { label: string; error?: string; hint?: ReactNode; className?: string };

function FieldShell({ id, label, error, hint, className = '', children }: FieldProps & { id: string; children: ReactNode }) {
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="text-sm font-semibold text-ink">{label}</label>
      {children}
      {hint && <p id={`${id}-hint`} className="text-sm text-ink-soft">{hint}</p>}
      {error && <p id={`${id}-error`} role="alert" className="text-sm text-danger">{error}</p>}
    </div>
  );
}

const describedBy = (id: string, error?: string, hint?: ReactNode) =>
  [hint ? `${id}-hint` : '', error ? `${id}-error` : ''].filter(Boolean).join(' ') || undefined;

/** A labelled text input; forwards its ref so react-hook-form's register() works. */
export const TextField = forwardRef<HTMLInputElement, FieldProps & InputHTMLAttributes<HTMLInputElement>>(
  function TextField({ label, error, hint, className, id: given, ...rest }, ref) {
    const auto = useId();
    const id = given ?? auto;
    return (
      <FieldShell id={id} label={label} error={error} hint={hint} className={className}>
        <input ref={ref} id={id} className={control} aria-invalid={error ? true : undefined} aria-describedby={describedBy(id, error, hint)} {...rest} />
      </FieldShell>
    );
  },
);

export const SelectField = forwardRef<HTMLSelectElement, FieldProps & SelectHTMLAttributes<HTMLSelectElement>>(
  function SelectField({ label, error, hint, className, id: given, children, ...rest }, ref) {
    const auto = useId();
    const id = given ?? auto;
    return (
      <FieldShell id={id} label={label} error={error} hint={hint} className={className}>
        <select ref={ref} id={id} className={control} aria-invalid={error ? true : undefined} aria-describedby={describedBy(id, error, hint)} {...rest}>
          {children}
        </select>
      </FieldShell>
    );
  },
);

export const TextAreaField = forwardRef<HTMLTextAreaElement, FieldProps & TextareaHTMLAttributes<HTMLTextAreaElement>>(
  function TextAreaField({ label, error, hint, className, id: given, ...rest }, ref) {
    const auto = useId();
    const id = given ?? auto;
    return (
      <FieldShell id={id} label={label} error={error} hint={hint} className={className}>
        <textarea ref={ref} id={id} className={`${control} min-h-24`} aria-invalid={error ? true : undefined} aria-describedby={describedBy(id, error, hint)} {...rest} />
      </FieldShell>
    );
  },
);
