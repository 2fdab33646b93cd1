import { useMemo } from 'react';
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
import { ParticleViews } from './particle-views';
import { Section } from './section';

export interface RunResultsProps {
  /** The engine's Results, or its JSON as stored by the server. */
  result: unknown;
  scenario: Scenario;
  agentName?: string;
  limitSource?: string;
}

function read(result: unknown): { view: RunResult } | { error: unknown } {
  try {
    return { view: parseRunResult(result) };
  } catch (error) {
    return { error };
  }
}

// File names carry the seed so two downloads from different runs never overwrite each other.
const runLabel = (view: RunResult) => `motewalk-run-seed-${String(view.engine.seed).replace(/[^\w-]/g, '_')}`;

/** Everything one run says, from the banner down to the cautions; presentational, nothing fetched. */
export function RunResults({ result, scenario, agentName, limitSource }: RunResultsProps) {
  const read_ = useMemo(() => read(result), [result]);
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
      <ConcentrationSection view={view} />
      <FractionTable view={view} runLabel={runLabel(view)} />
      <FateSection view={view} />
      <ParticleViews view={view} scenario={scenario} />
      <MapsSection view={view} scenario={scenario} />
      <CrossChecks view={view} />
      <ModelSection view={view} />
      <Cautions />
    </div>
  );
}
