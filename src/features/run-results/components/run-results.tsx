import { useDeferredValue, useMemo } from 'react';
import { Cautions } from '@/components/cautions';
import { ErrorMessage } from '@/components/ui/status';
import type { Scenario } from '../../../../shared/schemas/scenario';
import type { RunResult } from '../../../../shared/schemas/run-result';
import { parseRunResult } from '../../../../shared/schemas/run-result-stored';
import { ConcentrationSection } from './concentration-section';
import { CrossChecks } from './cross-checks';
import { FateSection } from './fate-section';
import { FractionTable } from './fraction-table';
import { Headline } from './headline';
import { MapsSection } from './maps-section';
import { ModelSection } from './model-section';
import { JetSensitivity } from './jet-sensitivity';
import { ParticleViews } from './particle-views';
import { Section } from './section';
import { csvFileName } from '@/lib/csv';

export interface RunResultsProps {
  /** The engine's Results, or its JSON as stored by the server. */
  result: unknown;
  scenario: Scenario;
  agentName?: string;
  limitSource?: string;
  /** The scenario's name, for the names of downloaded files. */
  title?: string;
}

function read(result: unknown): { view: RunResult } | { error: unknown } {
  try {
    return { view: parseRunResult(result) };
  } catch (error) {
    return { error };
  }
}

// File names carry the scenario's name, the seed and the day, so two downloads from different runs never overwrite each other.
const fileParts = (view: RunResult, title?: string) => (what: string) => [title, 'seed', String(view.engine.seed), what];

/** Everything one run says, from the banner down to the cautions; presentational, nothing fetched. */
export function RunResults({ result, scenario, agentName, limitSource, title }: RunResultsProps) {
  const read_ = useMemo(() => read(result), [result]);
  // The headline (banner, interval, why the run stopped) is drawn at once; the charts, maps and tables below it in a
  // render React may interrupt, after the headline is on screen. Drawing all of it at once held the decision back by
  // about 0.3 s on two cores with no GPU (bench:browser), most of it SVG and layout.
  const details = useDeferredValue(read_, null);
  if ('error' in read_) {
    return (
      <div>
        <ErrorMessage error={read_.error} title="This run's results cannot be shown" />
        <Cautions />
      </div>
    );
  }
  const { view } = read_;
  return (
    <div className="text-ink">
      <Section title="Headline">
        <Headline view={view} scenario={scenario} agentName={agentName} limitSource={limitSource} />
      </Section>
      {details === read_ ? (
        <>
          <ConcentrationSection view={view} />
          <FractionTable view={view} fileName={(what) => csvFileName(fileParts(view, title)(what))} />
          <FateSection view={view} fileName={fileParts(view, title)} />
          <ParticleViews view={view} scenario={scenario} />
          <MapsSection view={view} scenario={scenario} />
          <CrossChecks view={view} fileName={fileParts(view, title)} />
          <ModelSection view={view} />
          <JetSensitivity view={view} scenario={scenario} />
        </>
      ) : (
        <p role="status" className="my-4 text-sm text-muted">
          Drawing the charts, maps and tables…
        </p>
      )}
      <Cautions />
    </div>
  );
}
