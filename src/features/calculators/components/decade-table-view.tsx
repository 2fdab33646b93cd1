import { readableNumber } from '../../../../shared/format/index';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { decadeColumns, decadeRows, decadeTableCsv, decadeTableTsv } from '@/features/calculators/lib/decade-table';
import { copyText, downloadText } from '@/lib/download';
import { diameterTick } from '@/features/calculators/lib/chart-ticks';
import type { ParticleMedium } from '@/features/calculators/lib/particle-properties';

type CopyState = 'idle' | 'copied' | 'blocked';

export function DecadeTableView({ medium }: { medium: ParticleMedium }) {
  const [copy, setCopy] = useState<CopyState>('idle');
  const columns = decadeColumns(medium.window_s).slice(1);
  const rows = decadeRows(medium);

  async function onCopy() {
    setCopy((await copyText(decadeTableTsv(medium))) ? 'copied' : 'blocked');
  }

  return (
    <section aria-labelledby="decade-table" className="space-y-3">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="decade-table">By decade of diameter</h2>
        <div className="flex gap-2">
          <Button variant="secondary" onClick={onCopy}>
            Copy table
          </Button>
          <Button variant="secondary" onClick={() => downloadText('motewalk-particle-decades.csv', decadeTableCsv(medium))}>
            Download CSV
          </Button>
        </div>
      </div>
      <p role="status" aria-live="polite" className="min-h-5 text-sm" data-testid="copy-status">
        {copy === 'copied' && (
          <span className="text-clear">
            <span aria-hidden="true">✓ </span>Copied as tab-separated text; paste it into a spreadsheet.
          </span>
        )}
        {copy === 'blocked' && (
          <span className="text-watch">
            <span aria-hidden="true">! </span>This browser did not allow copying. Select the table with the mouse and copy it, or download
            the CSV.
          </span>
        )}
      </p>
      <div
        className="overflow-x-auto rounded-lg border border-line bg-white"
        role="region"
        tabIndex={0}
        aria-label="Decade table, scrolls sideways"
      >
        <table className="w-full border-collapse text-sm" data-testid="decade-table">
          <caption className="sr-only">Particle properties at each decade of diameter, same air and density as above</caption>
          <thead className="bg-paper-deep text-left">
            <tr>
              <th scope="col" className="px-2 py-2 font-semibold">
                Diameter
              </th>
              {columns.map((c) => (
                <th key={c.key} scope="col" className="px-2 py-2 text-right align-bottom font-semibold">
                  {c.header}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {rows.map((row) => (
              <tr key={row.diameter_m} className="border-t border-line">
                <th scope="row" className="whitespace-nowrap px-2 py-2 text-left font-semibold">
                  {diameterTick(row.diameter_m)}
                </th>
                {columns.map((c) => (
                  <td key={c.key} className="whitespace-nowrap px-2 py-2 text-right tabular-nums">
                    {readableNumber(c.value(row))}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
