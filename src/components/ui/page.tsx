import type { ReactNode } from 'react';

export function Page({ title, intro, actions, children }: { title: string; intro?: ReactNode; actions?: ReactNode; children: ReactNode }) {
  return (
    <main id="main" className="mx-auto w-full max-w-6xl px-4 py-8 sm:px-6">
      <div className="mb-6 flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1>{title}</h1>
          {intro && <p className="mt-1 max-w-3xl text-sm text-muted">{intro}</p>}
        </div>
        {actions}
      </div>
      {children}
    </main>
  );
}
