import { useId, type InputHTMLAttributes, type ReactNode, type SelectHTMLAttributes } from 'react';

type FieldProps = { label: string; error?: string; hint?: ReactNode; unit?: string };

// One frame for every labelled control, so the label, hint and error are tied to it the same way everywhere.
function FieldFrame({ id, label, error, hint, className, children }: FieldProps & { id: string; className: string; children: ReactNode }) {
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="text-sm font-semibold text-ink">
        {label}
      </label>
      {children}
      {hint && !error && (
        <p id={`${id}-hint`} className="text-xs text-muted">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} role="alert" className="text-xs font-semibold text-act">
          {error}
        </p>
      )}
    </div>
  );
}

const describedBy = (id: string, error?: string, hint?: ReactNode) => (error ? `${id}-error` : hint ? `${id}-hint` : undefined);

export function TextField({ label, error, hint, unit, className = '', ...input }: FieldProps & InputHTMLAttributes<HTMLInputElement>) {
  const id = useId();
  return (
    <FieldFrame id={id} label={label} error={error} hint={hint} className={className}>
      <div className="flex items-center gap-2">
        <input
          id={id}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy(id, error, hint)}
          className={`w-full rounded-md border bg-white px-3 py-2 text-sm ${error ? 'border-act' : 'border-line'}`}
          {...input}
        />
        {unit && <span className="shrink-0 text-sm text-muted">{unit}</span>}
      </div>
    </FieldFrame>
  );
}

export function SelectField({
  label,
  error,
  hint,
  children,
  className = '',
  ...select
}: Omit<FieldProps, 'unit'> & SelectHTMLAttributes<HTMLSelectElement>) {
  const id = useId();
  return (
    <FieldFrame id={id} label={label} error={error} hint={hint} className={className}>
      <select
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, error, hint)}
        className="rounded-md border border-line bg-white px-3 py-2 text-sm"
        {...select}
      >
        {children}
      </select>
    </FieldFrame>
  );
}
