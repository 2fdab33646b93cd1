import { useState } from 'react';
import type { ReleaseCondition } from '../../../../shared/physics/index';
import { captureCheck } from '../../../../shared/physics/capture-verdict';
import type { Scenario } from '../../../../shared/schemas/scenario';
import { Cautions } from '@/components/cautions';
import { ErrorMessage } from '@/components/ui/status';
import { useSweepRun } from '@/features/sweep/hooks/use-sweep-run';
import { pointScenarioName } from '@/features/sweep/lib/parameter-format';
import { sourceDistance_m } from '@/features/sweep/lib/sweep-points';
import { SweepAnswer } from './sweep-answer';
import { SweepChart } from './sweep-chart';
import { SweepForm, type SweepRequest } from './sweep-form';
import { SweepProgress } from './sweep-progress';
import { SweepTable, type TableRow } from './sweep-table';

export type SavePoint = (name: string, input: Scenario) => Promise<{ id: number; name: string }>;

type Props = { scenario: Scenario; release: ReleaseCondition; onSavePoint: SavePoint };

/** The whole placement sweep: settings, one progress bar for all points, chart, answer and points table. Nothing fetched here. */
export function SweepPanel({ scenario, release, onSavePoint }: Props) {
  const sweep = useSweepRun();
  const [request, setRequest] = useState<SweepRequest | null>(null);
  const [saved, setSaved] = useState<Record<number, { id: number; name: string } | 'saving'>>({});
  const [saveError, setSaveError] = useState<unknown>(null);

  if (!scenario.limit)
    return (
      <ErrorMessage
        title="No exposure limit"
        error="This scenario has no limit, so there is no target to sweep towards. Choose a dust agent with a limit in the scenario first."
      />
    );
  if (scenario.hoods.length === 0)
    return <ErrorMessage title="No hood" error="This scenario has no hood to move or resize. Add one in the scenario first." />;

  const start = (r: SweepRequest) => {
    setRequest(r);
    setSaved({});
    setSaveError(null);
    void sweep.start(r.points);
  };
  const state = sweep.state;
  const results = state.phase === 'idle' ? [] : state.results;
  const rows: TableRow[] = request
    ? results.map((result, i) => {
        const s = saved[i];
        const point = request.points[i].scenario;
        const capture = captureCheck({ ...point, source: { ...point.source, releaseType: point.source.releaseType ?? release } })?.sentence;
        return {
          index: i,
          value: request.points[i].value,
          result,
          capture,
          saved: s && s !== 'saving' ? s : undefined,
          saving: s === 'saving',
        };
      })
    : [];
  const targetPercent = (request?.targetFraction ?? 0.5) * 100;

  // The saved option keeps the scenario's own particle count: a few thousand is a sweep setting, not a design run.
  const save = async (row: TableRow) => {
    if (!request) return;
    const point = request.points[row.index];
    const name = pointScenarioName(scenario.hoods[request.spec.hoodIndex], request.spec.parameter, point.value);
    setSaved((s) => ({ ...s, [row.index]: 'saving' }));
    setSaveError(null);
    try {
      const created = await onSavePoint(name, { ...point.scenario, name, run: scenario.run });
      setSaved((s) => ({ ...s, [row.index]: created }));
    } catch (error) {
      setSaved(({ [row.index]: _, ...rest }) => rest);
      setSaveError(error);
    }
  };

  return (
    <div className="space-y-6">
      <SweepForm scenario={scenario} disabled={state.phase === 'running'} onStart={start} />
      {state.phase === 'running' && <SweepProgress progress={state.progress} onCancel={sweep.cancel} />}
      {state.phase === 'cancelled' && (
        <p role="status" className="text-sm text-muted">
          Sweep cancelled after {results.length} of {request?.points.length} points; the finished points are kept below.
        </p>
      )}
      {state.phase === 'failed' && <ErrorMessage title="The sweep failed" error={state.error} />}
      {request && rows.length >= 2 && (
        <SweepChart
          parameter={request.spec.parameter}
          targetPercent={targetPercent}
          points={rows.map((r) => ({
            value: r.value,
            percent: r.result.percentOfLimit,
            lower: r.result.percentOfLimitLower,
            upper: r.result.percentOfLimitUpper,
          }))}
        />
      )}
      {request && state.phase === 'done' && (
        <SweepAnswer
          points={rows.map((r) => ({ value: r.value, upperPercent: r.result.percentOfLimitUpper }))}
          parameter={request.spec.parameter}
          targetPercent={targetPercent}
          hood={scenario.hoods[request.spec.hoodIndex]}
          distance_m={sourceDistance_m(scenario, request.spec.hoodIndex)}
          release={release}
        />
      )}
      {request && rows.length > 0 && (
        <SweepTable rows={rows} parameter={request.spec.parameter} onSave={save} canSave={state.phase !== 'running'} />
      )}
      {saveError !== null && <ErrorMessage title="Point not saved" error={saveError} />}
      <Cautions />
    </div>
  );
}
