import type { Cell } from '@/lib/csv';
import { downloadTable } from '@/lib/csv';
import { Button } from './button';

type Props = {
  /** What the file holds, for its name: the scenario's name first where there is one. */
  name: (string | null | undefined)[];
  header: string[];
  /** Built on click, so a long table costs nothing until someone wants it. */
  rows: () => Cell[][];
  label?: string;
};

export function DownloadCsvButton({ name, header, rows, label = 'Download CSV' }: Props) {
  return (
    <Button variant="secondary" className="no-print" onClick={() => downloadTable(name, header, rows())}>
      <span aria-hidden="true">↓</span> {label}
    </Button>
  );
}
