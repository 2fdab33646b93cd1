import type { ReactNode } from 'react';

// The swatch is decoration; the words beside it carry the meaning for screen readers.
export function LegendKey({ swatch, children }: { swatch: string; children: ReactNode }) {
  return (
    <span className="inline-flex items-center gap-1.5">
      <span aria-hidden="true" className={`inline-block ${swatch}`} />
      {children}
    </span>
  );
}
