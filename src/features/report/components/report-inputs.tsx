import type { Scenario } from '../../../../shared/schemas/scenario';
import { DownloadCsvButton } from '@/components/ui/download-csv-button';
import { HOODS_HEADER, hoodCsvRows } from '@/features/report/lib/hoods-csv';
import { hoodRows, inputSections, type AgentInfo } from '@/features/report/lib/input-sections';

// On a narrow screen the table scrolls inside its box and the column naming each hood stays in view; paper has no scroll box.
const FIRST = 'sticky left-0 z-[1] bg-white max-md:min-w-32 max-md:shadow-[1px_0_0_var(--color-line)] print:static';

type Props = { scenario: Scenario; agent?: AgentInfo; sizeProfileName?: string; title?: string };

export function ReportInputs({ scenario, agent, sizeProfileName, title }: Props) {
  const sections = inputSections(scenario, { agent, sizeProfileName });
  const hoods = hoodRows(scenario);
  return (
    <section aria-labelledby="report-inputs" className="report-section mt-8">
      <h2 id="report-inputs">1. Inputs</h2>
      <div className="mt-3 grid gap-4 md:grid-cols-2 print:grid-cols-2">
        {sections.map((s) => (
          <div key={s.title} className="break-inside-avoid rounded-md border border-line bg-white p-3 print:border-black/30">
            <h3 className="mb-1 text-sm font-semibold">{s.title}</h3>
            <dl className="grid grid-cols-[minmax(9rem,auto)_1fr] gap-x-3 gap-y-0.5 text-sm">
              {s.rows.map(([label, value]) => (
                <div key={label} className="contents">
                  <dt className="text-muted print:text-black">{label}</dt>
                  <dd>{value}</dd>
                </div>
              ))}
            </dl>
          </div>
        ))}
      </div>
      <div className="mt-4 mb-1 flex flex-wrap items-end justify-between gap-2">
        <h3 className="text-sm font-semibold">Hoods</h3>
        {hoods.length > 0 && <DownloadCsvButton name={[title, 'hoods']} header={HOODS_HEADER} rows={() => hoodCsvRows(scenario)} />}
      </div>
      {hoods.length === 0 ? (
        <p className="text-sm">No local exhaust: the scenario has no hood.</p>
      ) : (
        <div className="overflow-x-auto">
          <table className="w-full break-inside-avoid border-collapse text-sm">
            <caption className="sr-only">Hoods</caption>
            <thead>
              <tr className="border-b border-line text-left">
                {['Hood', 'Type', 'Face', 'Face centre', 'Facing', 'Airflow', 'Face velocity'].map((h, i) => (
                  <th key={h} scope="col" className={`py-1 pr-3 font-semibold ${i === 0 ? FIRST : ''}`}>
                    {h}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {hoods.map((h) => (
                <tr key={h.name} className="border-b border-line align-top">
                  <td className={`py-1 pr-3 ${FIRST}`}>{h.name}</td>
                  <td className="py-1 pr-3">{h.kind}</td>
                  <td className="py-1 pr-3">{h.face}</td>
                  <td className="py-1 pr-3">{h.position}</td>
                  <td className="py-1 pr-3">{h.direction}</td>
                  <td className="py-1 pr-3 tabular-nums">{h.airflow}</td>
                  <td className="py-1 pr-3 tabular-nums">{h.faceVelocity}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
