import { countText } from '../../../../shared/format/index';
import type { ReactNode } from 'react';
import type { Scenario } from '../../../../shared/schemas/scenario';
import type { Approval } from '../../../../shared/schemas/workspace-views';
import { Cautions } from '@/components/cautions';
import { Button } from '@/components/ui/button';
import { dateTime } from '@/lib/format';
import type { AgentInfo } from '@/features/report/lib/input-sections';
import { ReportInputs } from './report-inputs';
import { ReportModel } from './report-model';
import { ReportSignOff } from './report-sign-off';
import './report-print.css';

export interface ReportRun {
  id: number;
  createdAt: string;
  ranBy: string | null;
  seed: string;
  engineVersion: string;
  particles: number;
  outOfDate: boolean;
}

type Props = {
  scenarioId: number;
  title: string;
  place: { workstation: string; room: string; site: string };
  control: string;
  input: Scenario;
  run: ReportRun | null;
  agent?: AgentInfo;
  sizeProfileName?: string;
  approval: Approval | null;
  /** A picker of saved runs, shown on screen only. */
  runPicker?: ReactNode;
  /** The run's results, passed in by the route so this feature stays independent of how results are drawn. */
  children?: ReactNode;
};

/** A document page: reads top to bottom on screen and prints to A4 without the app around it. */
export function ReportDocument({
  scenarioId,
  title,
  place,
  control,
  input,
  run,
  agent,
  sizeProfileName,
  approval,
  runPicker,
  children,
}: Props) {
  return (
    <article
      data-report-document
      aria-label={`Report: ${title}`}
      className="mx-auto w-full max-w-5xl bg-white px-4 py-8 text-ink sm:px-6 print:max-w-none print:p-0"
    >
      <div className="no-print mb-6 flex flex-wrap items-center justify-between gap-3 rounded-md border border-line bg-paper p-3">
        <div className="text-sm">{runPicker}</div>
        <Button onClick={() => window.print()}>Print or save as PDF</Button>
      </div>
      {run?.outOfDate && (
        <p
          role="status"
          data-testid="report-out-of-date"
          className="mb-4 rounded-md border-2 border-watch bg-watch-soft p-3 text-sm font-semibold text-watch print:border-black"
        >
          ⟳ Out of date: the scenario has changed since this run. The inputs and results below are those of the run, not of the scenario as
          it stands now.
        </p>
      )}
      <header className="border-b-2 border-ink pb-4">
        <p className="text-xs font-semibold uppercase tracking-wide text-muted">Motewalk exposure assessment</p>
        <h1 className="mt-1">{title}</h1>
        <dl className="mt-3 grid gap-x-6 gap-y-1 text-sm sm:grid-cols-2 print:grid-cols-2">
          <div>
            <dt className="inline font-semibold">Workstation: </dt>
            <dd className="inline">
              {place.workstation}, {place.room}, {place.site}
            </dd>
          </div>
          <div>
            <dt className="inline font-semibold">Control: </dt>
            <dd className="inline">{control || 'not described'}</dd>
          </div>
          <div>
            <dt className="inline font-semibold">Run: </dt>
            <dd className="inline">
              {run
                ? `${dateTime(run.createdAt)} · ${countText(run.particles)} particles · seed ${run.seed} · engine ${run.engineVersion}`
                : 'no saved run'}
            </dd>
          </div>
          <div>
            <dt className="inline font-semibold">Run by: </dt>
            <dd className="inline">{run ? (run.ranBy ?? 'not recorded') : '—'}</dd>
          </div>
          <div>
            <dt className="inline font-semibold">Report printed: </dt>
            <dd className="inline">{dateTime(new Date().toISOString())}</dd>
          </div>
        </dl>
      </header>
      <ReportInputs scenario={input} agent={agent} sizeProfileName={sizeProfileName} title={title} />
      <ReportModel />
      <section aria-labelledby="report-results" className="report-section mt-8">
        <h2 id="report-results">3. Results</h2>
        {run ? (
          <div className="mt-3">{children}</div>
        ) : (
          <p className="mt-2 text-sm">This scenario has no saved run yet; run it and save the run to report results.</p>
        )}
      </section>
      <ReportSignOff approval={approval} scenarioId={scenarioId} />
      {/* The run's results end with the cautions; a report without a run must still carry them. */}
      {!run && <Cautions />}
    </article>
  );
}
