import type { ReactNode } from 'react';

export function AuthCard({ title, intro, children }: { title: string; intro?: string; children: ReactNode }) {
  return (
    <main id="main" className="flex min-h-screen items-center justify-center px-4">
      <div className="w-full max-w-sm rounded-xl border border-line bg-white p-8 shadow-sm">
        <p className="mb-6 flex items-center gap-2 text-lg font-bold">
          <span aria-hidden="true" className="inline-block h-3 w-3 rounded-full bg-accent" />
          Motewalk
        </p>
        <h1 className="text-xl">{title}</h1>
        {intro && <p className="mb-6 mt-1 text-sm text-muted">{intro}</p>}
        {children}
      </div>
    </main>
  );
}
