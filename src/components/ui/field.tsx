import { useId, type InputHTMLAttributes, type ReactNode, type SelectHTMLAttributes } from 'react';

type FieldProps = { label: string; error?: string; hint?: ReactNode; unit?: string };

export function TextField({ label, error, hint, unit, className = '', ...input }: FieldProps & InputHTMLAttributes<HTMLInputElement>) {
  const id = useId();
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="text-sm font-semibold text-ink">
        {label}
      </label>
      <div className="flex items-center gap-2">
        <input
          id={id}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : hint ? `${id}-hint` : undefined}
          className={`w-full rounded-md border bg-white px-3 py-2 text-sm ${error ? 'border-act' : 'border-line'}`}
          {...input}
        />
        {unit && <span className="shrink-0 text-sm text-muted">{unit}</span>}
      </div>
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

export function SelectField({ label, error, children, className = '', ...select }: FieldProps & SelectHTMLAttributes<HTMLSelectElement>) {
  const id = useId();
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="text-sm font-semibold text-ink">
        {label}
      </label>
      <select
        id={id}
        aria-invalid={error ? true : undefined}
        className="rounded-md border border-line bg-white px-3 py-2 text-sm"
        {...select}
      >
        {children}
      </select>
      {error && (
        <p role="alert" className="text-xs font-semibold text-act">
          {error}
        </p>
      )}
    </div>
  );
}
