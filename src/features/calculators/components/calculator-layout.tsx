import type { ReactNode } from 'react';
import { Cautions } from '@/components/cautions';
import { Page } from '@/components/ui/page';
import { InvalidInputs } from './result-item';

// Whole class names, so Tailwind finds them in the source.
const FORM_COLUMN = {
  narrow: 'grid gap-6 lg:grid-cols-[18rem_minmax(0,1fr)] lg:items-start',
  wide: 'grid gap-6 lg:grid-cols-[20rem_minmax(0,1fr)] lg:items-start',
} as const;

// Results are null while any field is marked, and the column says so instead of showing stale figures.
export function CalculatorLayout({
  title,
  intro,
  formColumn,
  form,
  results,
  wide,
}: {
  title: string;
  intro: string;
  formColumn: keyof typeof FORM_COLUMN;
  form: ReactNode;
  results: ReactNode;
  /** Below form and results at the page's full width: for tables too wide for the results column. */
  wide?: ReactNode;
}) {
  return (
    <Page title={title} intro={intro}>
      <div className={FORM_COLUMN[formColumn]}>
        {form}
        <div className="min-w-0 space-y-6">{results ?? <InvalidInputs />}</div>
      </div>
      {wide && <div className="mt-8 min-w-0">{wide}</div>}
      <Cautions />
    </Page>
  );
}
