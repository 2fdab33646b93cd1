import type { ReactNode } from 'react';

// The value sits in its own element so tests and screen readers get the number without the unit glued on.
export function ResultItem({
  label,
  value,
  unit,
  testId,
  note,
}: {
  label: string;
  value: string;
  unit: string;
  testId: string;
  note?: ReactNode;
}) {
  return (
    <div className="rounded-lg border border-line bg-white p-3">
      <dt className="text-xs font-semibold uppercase tracking-wide text-muted">{label}</dt>
      <dd className="mt-1">
        <span className="text-lg font-semibold tabular-nums text-ink" data-testid={testId}>
          {value}
        </span>
        {unit && <span className="ml-1.5 text-sm text-muted">{unit}</span>}
        {note && <div className="mt-1 text-xs text-muted">{note}</div>}
      </dd>
    </div>
  );
}

export function ResultGrid({ label, children }: { label: string; children: ReactNode }) {
  return (
    <dl aria-label={label} className="grid grid-cols-1 gap-3 sm:grid-cols-2 xl:grid-cols-3">
      {children}
    </dl>
  );
}

export function InvalidInputs() {
  return (
    <p role="status" className="rounded-lg border border-dashed border-act bg-act-soft p-4 text-sm text-act">
      <span aria-hidden="true">✕ </span>
      No results while a field is marked. Correct the marked values and the results come back as you type.
    </p>
  );
}
