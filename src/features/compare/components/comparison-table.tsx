import { Link } from 'react-router-dom';
import type { Fraction } from '../../../../shared/vocabulary/fractions';
import { paths } from '@/config/paths';
import { dateTime } from '@/lib/format';
import type { Target } from '@/features/compare/lib/target';
import type { CompareColumn } from '@/features/compare/lib/types';
import { tableRows } from './table-rows';

type Props = { columns: CompareColumn[]; fraction: Fraction; target: Target; bestId: number | null };

// The highlighted column gets a border and a label as well as a tint, so it reads without colour.
const mark = (best: boolean, last = false) => (best ? `border-x-2 border-accent bg-accent-soft/40 ${last ? 'border-b-2' : ''}` : '');

export function ComparisonTable({ columns, fraction, target, bestId }: Props) {
  const rows = tableRows(columns, fraction, target);
  return (
    <div className="overflow-x-auto rounded-lg border border-line bg-white">
      <table className="w-full border-collapse text-sm" aria-label="Side-by-side comparison">
        <thead className="bg-paper-deep text-left align-bottom">
          <tr>
            <td className="w-48 px-3 py-2 text-xs text-muted">Ordered by the hierarchy of controls</td>
            {columns.map((c) => (
              <th
                key={c.id}
                scope="col"
                data-testid="compare-column"
                className={`px-3 py-2 font-semibold ${bestId === c.id ? 'border-x-2 border-t-2 border-accent bg-accent-soft' : ''}`}
              >
                {bestId === c.id && (
                  <span className="mb-1 block text-xs font-bold text-accent-strong">
                    <span aria-hidden="true">✓ </span>Meets the target with the least airflow
                  </span>
                )}
                <Link to={paths.scenario(c.id)} className="text-base underline decoration-line underline-offset-2 hover:decoration-accent">
                  {c.name}
                </Link>
                <span className="block text-xs font-normal text-muted">
                  {c.run ? (
                    <>
                      run of {dateTime(c.run.createdAt)}
                      {c.run.outOfDate && <strong className="text-watch"> · ⟳ out of date</strong>}
                    </>
                  ) : (
                    'not run'
                  )}
                </span>
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((r, ri) => (
            <tr key={r.key} className="border-t border-line">
              <th scope="row" className="px-3 py-2 text-left align-top font-semibold">
                {r.label}
              </th>
              {columns.map((c, i) => (
                <td key={c.id} className={`px-3 py-2 align-top ${mark(bestId === c.id, ri === rows.length - 1)}`}>
                  {r.needsRun && !c.run ? <span className="text-muted">not run</span> : r.cell(c, i)}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
