import type { ReactNode } from 'react';
import { ApiError } from '@/lib/api-client';

export function Spinner({ label = 'Loading…' }: { label?: string }) {
  return (
    <p role="status" className="flex items-center gap-2 py-6 text-sm text-muted">
      <span aria-hidden="true" className="inline-block h-4 w-4 animate-spin rounded-full border-2 border-line border-t-accent" />
      {label}
    </p>
  );
}

export function ErrorMessage({ error, title = 'Something went wrong' }: { error: unknown; title?: string }) {
  const message = error instanceof ApiError || error instanceof Error ? error.message : String(error);
  return (
    <div role="alert" className="rounded-md border border-act bg-act-soft p-3 text-sm text-act">
      <strong className="font-semibold">
        <span aria-hidden="true">✕ </span>
        {title}:
      </strong>{' '}
      {message}
    </div>
  );
}

export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="rounded-lg border border-dashed border-line bg-white p-8 text-center">
      <p className="font-semibold">{title}</p>
      {children && <div className="mt-2 text-sm text-muted">{children}</div>}
    </div>
  );
}

export function Notice({ children }: { children: ReactNode }) {
  return (
    <p role="status" className="rounded-md border border-clear bg-clear-soft p-3 text-sm text-clear">
      <span aria-hidden="true">✓ </span>
      {children}
    </p>
  );
}
