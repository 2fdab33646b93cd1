import { readableNumber } from '../../../../shared/format/index';
import { FRACTION_LABEL } from '../../../../shared/vocabulary/index';
import type { RunResult } from '../../../../shared/schemas/run-result';
import { Section } from './section';
import { DownloadCsvButton } from '@/components/ui/download-csv-button';
import { crossChecksTable } from '@/features/run-results/lib/section-csv';

type Row = { key: string; model: string; value: number; assumes: string };

function rows(view: RunResult): Row[] {
  const c = view.crossChecks;
  return [
    {
      key: 'well-mixed',
      model: 'Well-mixed room',
      value: c.wellMixed_mgPerM3,
      assumes: 'Dust spreads instantly and evenly through the whole room; general ventilation, hood airflow and settling remove it.',
    },
    {
      key: 'near',
      model: 'Near field',
      value: c.nearField_mgPerM3,
      assumes:
        'A sphere around the source reaching to the breathing zone, trading air with the rest of the room at half its surface times the random air speed.',
    },
    {
      key: 'far',
      model: 'Far field',
      value: c.farField_mgPerM3,
      assumes: 'The rest of the room in the same two-zone model, well mixed among itself.',
    },
    {
      key: 'eddy',
      model: 'Eddy diffusion, steady state',
      value: c.eddySteady_mgPerM3,
      assumes:
        "A continuous point source spreading by the room's eddy diffusivity, at the source-to-breathing-zone distance, after it has run long enough to settle.",
    },
  ];
}

// The model's name stays in view while a narrow screen scrolls the table sideways.
const STICKY = 'sticky left-0 z-[1] shadow-[1px_0_0_var(--color-line)]';

const ratio = (mc: number, model: number) => (model > 0 && Number.isFinite(mc) ? `${readableNumber(mc / model, 2)}×` : '—');

export function CrossChecks({ view, fileName }: { view: RunResult; fileName: (what: string) => (string | undefined)[] }) {
  const fraction = view.crossChecks.fraction;
  const mc = view.breathingZone.fractions[fraction].taskMean_mgPerM3;
  const hoods = view.fate.captured > 0;
  return (
    <Section
      title="Analytic cross-checks"
      actions={
        <DownloadCsvButton
          name={fileName('cross-checks')}
          header={crossChecksTable(view).header}
          rows={() => crossChecksTable(view).rows}
        />
      }
      intro={`Box and diffusion models for the same source, room and airflow, ${FRACTION_LABEL[fraction].toLowerCase()} fraction, averaged over the simulated window; compared with the Monte-Carlo task mean in the breathing zone.`}
    >
      <div className="overflow-x-auto rounded-lg border border-line bg-white">
        <table className="w-full border-collapse text-sm">
          <caption className="sr-only">Monte-Carlo breathing-zone concentration beside the analytic models</caption>
          <thead className="bg-paper-deep text-left">
            <tr>
              <th scope="col" className={`px-3 py-2 font-semibold ${STICKY} bg-paper-deep`}>
                Model
              </th>
              <th scope="col" className="px-3 py-2 text-right font-semibold">
                Concentration (mg/m³)
              </th>
              <th scope="col" className="px-3 py-2 text-right font-semibold">
                Monte-Carlo ÷ model
              </th>
              {/* A floor on its width, so on a phone the sentences scroll with the table instead of standing a word per line. */}
              <th scope="col" className="min-w-64 px-3 py-2 font-semibold">
                What it assumes
              </th>
            </tr>
          </thead>
          <tbody>
            <tr className="border-t border-line bg-accent-soft/50">
              <th
                scope="row"
                className={`px-3 py-2 text-left font-semibold ${STICKY} [background:color-mix(in_oklab,var(--color-accent-soft)_50%,white)]`}
              >
                Monte-Carlo, breathing zone
              </th>
              <td className="px-3 py-2 text-right font-semibold tabular-nums" data-testid="cross-check-mc">
                {readableNumber(mc)}
              </td>
              <td className="px-3 py-2 text-right text-muted">—</td>
              <td className="px-3 py-2 text-muted">
                Particles followed one by one with settling, hood suction, draft and turbulent and Brownian diffusion; counted while inside
                the breathing zone.
              </td>
            </tr>
            {rows(view).map((r) => (
              <tr key={r.key} className="border-t border-line">
                <th scope="row" className={`px-3 py-2 text-left font-normal ${STICKY} bg-white`}>
                  {r.model}
                </th>
                <td className="px-3 py-2 text-right tabular-nums">{readableNumber(r.value)}</td>
                <td className="px-3 py-2 text-right tabular-nums">{ratio(mc, r.value)}</td>
                <td className="px-3 py-2 text-muted">{r.assumes}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <div className="mt-3 max-w-3xl space-y-2 text-sm">
        <p>
          <strong className="font-semibold">What a large disagreement means.</strong> The well-mixed figure ignores the concentration
          gradient near the source; a Monte-Carlo value far above it is expected close to an unhooded source, and the near-field figure is
          the better comparison there.
        </p>
        <p>
          The box models count the hood only as extra room exhaust, not as capture at the source, so with a working hood the Monte-Carlo
          value {hoods ? '(here the hood captured part of the dust) ' : ''}should sit below them. A value far below all cross-checks with no
          hood usually means too few particles or a breathing zone outside the plume.
        </p>
      </div>
    </Section>
  );
}
