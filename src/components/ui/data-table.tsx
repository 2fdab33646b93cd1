import { useMemo, useState, type ReactNode } from 'react';

export type Column<T> = {
  key: string;
  header: string;
  render: (row: T) => ReactNode;
  sortValue?: (row: T) => string | number | null;
  align?: 'left' | 'right';
};

type Sort = { key: string; dir: 'asc' | 'desc' };
type Figure<T> = { value: (row: T) => number; show: (v: number) => ReactNode };

// A figure sorts by its number, never by the text it is shown as.
export function figureColumn<T>({ value, show, ...column }: Pick<Column<T>, 'key' | 'header'> & Figure<T>): Column<T> {
  return { ...column, render: (row) => show(value(row)), sortValue: value, align: 'right' };
}

type RowKey<T> = (row: T) => string | number;
// Stored records are told apart by their id; any other row says how.
type Keyed<T> = T extends { id: string | number } ? { rowKey?: RowKey<T> } : { rowKey: RowKey<T> };

type Props<T> = Keyed<T> & {
  rows: T[];
  columns: Column<T>[];
  caption: string;
  initialSort?: Sort;
  // Given, the parent sorts (e.g. on the server) and the table only shows the state.
  sort?: Sort;
  onSortChange?: (sort: Sort) => void;
};

export type { Sort as TableSort };

// The first column names the row: it stays in view while a narrow screen scrolls the table sideways.
const STICKY = 'sticky left-0 z-[1] shadow-[1px_0_0_var(--color-line)]';

const byId = <T,>(row: T) => (row as { id: string | number }).id;

export function DataTable<T>({ rows, columns, rowKey = byId, caption, initialSort, sort: controlled, onSortChange }: Props<T>) {
  const [own, setOwn] = useState<Sort | undefined>(initialSort);
  const sort = onSortChange ? controlled : own;
  const sorted = useMemo(() => {
    const col = columns.find((c) => c.key === sort?.key);
    if (onSortChange || !col?.sortValue || !sort) return rows;
    const value = col.sortValue;
    const sign = sort.dir === 'asc' ? 1 : -1;
    return [...rows].sort((a, b) => {
      const va = value(a);
      const vb = value(b);
      if (va === vb) return 0;
      if (va === null) return 1;
      if (vb === null) return -1;
      return va < vb ? -sign : sign;
    });
  }, [rows, columns, sort, onSortChange]);

  const toggle = (key: string) => {
    const next: Sort = sort?.key === key ? { key, dir: sort.dir === 'asc' ? 'desc' : 'asc' } : { key, dir: 'asc' };
    if (onSortChange) onSortChange(next);
    else setOwn(next);
  };

  return (
    <div className="overflow-x-auto rounded-lg border border-line bg-white">
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-paper-deep text-left">
          <tr>
            {columns.map((c, i) => {
              const active = sort?.key === c.key;
              return (
                <th
                  key={c.key}
                  scope="col"
                  aria-sort={active ? (sort.dir === 'asc' ? 'ascending' : 'descending') : undefined}
                  className={`px-3 py-2 font-semibold ${c.align === 'right' ? 'text-right' : ''} ${i === 0 ? `${STICKY} bg-paper-deep` : ''}`}
                >
                  {c.sortValue ? (
                    <>
                      <button
                        type="button"
                        onClick={() => toggle(c.key)}
                        className="inline-flex items-center gap-1 hover:text-accent print:hidden"
                      >
                        {c.header}
                        <span aria-hidden="true" className="text-xs text-muted">
                          {active ? (sort.dir === 'asc' ? '▲' : '▼') : '↕'}
                        </span>
                      </button>
                      {/* Paper has nothing to sort, and Chromium leaves a button blank in the headings it repeats on a new page. */}
                      <span aria-hidden="true" className="hidden print:inline">
                        {c.header}
                      </span>
                    </>
                  ) : (
                    c.header
                  )}
                </th>
              );
            })}
          </tr>
        </thead>
        <tbody>
          {sorted.map((row) => (
            <tr key={rowKey(row)} className="border-t border-line">
              {columns.map((c, i) => (
                <td
                  key={c.key}
                  className={`px-3 py-2 align-top ${c.align === 'right' ? 'text-right tabular-nums' : ''} ${i === 0 ? `${STICKY} bg-white` : ''}`}
                >
                  {c.render(row)}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
