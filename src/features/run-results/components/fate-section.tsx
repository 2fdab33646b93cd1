import { readableNumber } from '../../../../shared/format/index';
import { FATE_LABEL, FATES } from '../../../../shared/vocabulary/index';
import { FATE_COLOUR } from '@/features/run-results/lib/fate-colours';
import type { RunResult } from '../../../../shared/schemas/run-result';
import { MassLeftOutNote } from './mass-left-out-note';
import { Section } from './section';
import { DownloadCsvButton } from '@/components/ui/download-csv-button';
import { fateTable } from '@/features/run-results/lib/section-csv';

export function FateSection({ view, fileName }: { view: RunResult; fileName: (what: string) => (string | undefined)[] }) {
  const { emitted_mg, ...shares } = view.fate;
  const total = FATES.reduce((a, f) => a + (Number.isFinite(shares[f]) ? shares[f] : 0), 0);
  // With variance reduction the shares are estimates that add up to the simulated share only on
  // average; the bar is scaled to their sum when it passes 100 % so it never runs off its frame.
  const scale = Math.max(1, total);
  const widths = FATES.map((f) => (1000 * Math.max(0, shares[f] || 0)) / scale);
  const leftOut = view.massLeftOut?.share ?? 0;
  const offBy = total + leftOut - 1;
  const starts = widths.map((_, i) => widths.slice(0, i).reduce((a, w) => a + w, 0));
  return (
    <Section
      title="Where the dust went"
      intro={`Fate of the ${readableNumber(emitted_mg)} mg emitted during the simulated window.`}
      actions={<DownloadCsvButton name={fileName('fate')} header={fateTable(view).header} rows={() => fateTable(view).rows} />}
    >
      <svg
        viewBox="0 0 1000 44"
        preserveAspectRatio="none"
        className="h-11 w-full rounded-md border border-line bg-white"
        role="img"
        aria-label={FATES.map((f) => `${FATE_LABEL[f]} ${readableNumber(100 * shares[f], 3)} %`).join(', ')}
      >
        {FATES.map((f, i) => {
          const w = widths[i];
          return (
            <rect
              key={f}
              x={starts[i]}
              y={0}
              width={w}
              height={44}
              fill={FATE_COLOUR[f]}
              stroke="white"
              strokeWidth={w > 2 ? 2 : 0}
              vectorEffect="non-scaling-stroke"
              data-testid={`fate-${f}`}
            />
          );
        })}
      </svg>
      <table className="mt-3 w-full max-w-xl text-sm">
        <caption className="sr-only">Fate of the emitted mass</caption>
        <thead>
          <tr className="text-left text-muted">
            <th scope="col" className="py-1 font-semibold">
              Fate
            </th>
            <th scope="col" className="py-1 text-right font-semibold">
              Share (%)
            </th>
            <th scope="col" className="py-1 text-right font-semibold">
              Mass (mg)
            </th>
          </tr>
        </thead>
        <tbody>
          {FATES.map((f) => (
            <tr key={f} className="border-t border-line">
              <th scope="row" className="py-1.5 text-left font-normal">
                <span
                  aria-hidden="true"
                  className="mr-2 inline-block h-3 w-3 rounded-sm align-middle"
                  style={{ background: FATE_COLOUR[f] }}
                />
                {FATE_LABEL[f]}
              </th>
              <td className="py-1.5 text-right tabular-nums">{readableNumber(100 * shares[f], 3)}</td>
              <td className="py-1.5 text-right tabular-nums">{readableNumber(shares[f] * emitted_mg, 3)}</td>
            </tr>
          ))}
          <tr className="border-t-2 border-ink font-semibold">
            <th scope="row" className="py-1.5 text-left">
              Sum
            </th>
            <td className="py-1.5 text-right tabular-nums" data-testid="fate-sum">
              {readableNumber(100 * total, 4)}
            </td>
            <td className="py-1.5 text-right tabular-nums">{readableNumber(total * emitted_mg, 4)}</td>
          </tr>
        </tbody>
      </table>
      {Math.abs(offBy) > 0.005 && (
        <p className="mt-2 max-w-xl text-sm text-muted" data-testid="fate-estimate-note">
          These shares are estimates: variance reduction splits particles and removes some by Russian roulette, so the fates add up to the
          emission only on average. This run’s add up to {readableNumber(100 * (total + leftOut), 3)} % with what was left out; more
          particles bring them closer.
        </p>
      )}
      <MassLeftOutNote view={view} />
    </Section>
  );
}
