import { useId, type ReactNode } from 'react';

export function Section({
  title,
  intro,
  actions,
  children,
}: {
  title: string;
  intro?: ReactNode;
  actions?: ReactNode;
  children: ReactNode;
}) {
  const id = useId();
  return (
    <section aria-labelledby={id} className="mt-10 print:break-inside-avoid">
      <div className="mb-3 flex flex-wrap items-end justify-between gap-3">
        <div>
          <h2 id={id}>{title}</h2>
          {intro && <p className="mt-1 max-w-3xl text-sm text-muted">{intro}</p>}
        </div>
        {actions && <div className="no-print flex flex-wrap gap-2">{actions}</div>}
      </div>
      {children}
    </section>
  );
}
