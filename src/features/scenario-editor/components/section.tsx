import type { ReactNode } from 'react';

export function Section({ legend, intro, children }: { legend: string; intro?: ReactNode; children: ReactNode }) {
  return (
    <fieldset className="min-w-0 rounded-lg border border-line bg-white px-5 pt-2 pb-6 sm:px-6">
      <legend className="px-2 text-base font-semibold text-ink">{legend}</legend>
      {intro && <p className="mb-4 max-w-prose text-sm text-muted">{intro}</p>}
      <div className="flex flex-col gap-6">{children}</div>
    </fieldset>
  );
}

// Fields flow into as many columns as fit, so the same section works beside the views and stacked.
export function FieldGrid({ children }: { children: ReactNode }) {
  return <div className="grid grid-cols-[repeat(auto-fill,minmax(10.5rem,1fr))] items-start gap-x-5 gap-y-4">{children}</div>;
}

export function Subheading({ children }: { children: ReactNode }) {
  return <h3 className="text-sm font-semibold tracking-wide text-muted uppercase">{children}</h3>;
}

export type SectionProps<V> = {
  value: V;
  onChange: (next: V) => void;
  errors: Record<string, string>;
};
