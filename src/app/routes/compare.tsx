import { useEffect, useRef, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { parseRunResult } from '../../../shared/schemas/run-result-stored';
import { FRACTIONS, type Fraction } from '../../../shared/vocabulary/fractions';
import { Cautions } from '@/components/cautions';
import { Page } from '@/components/ui/page';
import { Button } from '@/components/ui/button';
import { EmptyState, ErrorMessage, Spinner } from '@/components/ui/status';
import { CompareResults } from '@/features/compare/components/compare-results';
import { ScenarioPicker } from '@/features/compare/components/scenario-picker';
import { useCompareColumns, type CompareSources } from '@/features/compare/hooks/use-compare-columns';
import { formatSelection, MAX_SELECTED, MIN_SELECTED, parseSelection, toggleId } from '@/features/compare/lib/selection';
import { targetFor } from '@/features/compare/lib/target';
import { RATING_LABEL } from '../../../shared/vocabulary/index';
import { runQueryOptions } from '@/features/scenarios/api/get-run';
import { scenarioQueryOptions } from '@/features/scenarios/api/get-scenario';
import { scenarioKeys, useScenarios } from '@/features/scenarios/api/get-scenarios';

// Scenarios and runs come from the scenarios feature; the shared result schema reads a stored result of any engine version.
const SOURCES: CompareSources<ReturnType<typeof scenarioKeys.detail>, (string | number)[]> = {
  scenario: scenarioQueryOptions,
  run: runQueryOptions,
  figures: (stored) => {
    const { breathingZone, fate, limit } = parseRunResult(stored);
    const { emitted_mg, ...shares } = fate;
    return {
      fractions: breathingZone.fractions,
      series: { time_s: breathingZone.series.time_s, bands: breathingZone.series },
      fate: { emitted_mg, shares },
      limit,
      ratingName: limit ? RATING_LABEL[limit.ratingCategory].name : undefined,
    };
  },
};

const PICKER_FILTERS = { pageSize: 200 } as const;

// The selection, target and chart fraction live in the URL so a comparison can be shared as a link.
export function CompareRoute() {
  const [params, setParams] = useSearchParams();
  const selection = parseSelection(params.get('ids'));
  const target = targetFor(params.get('target'));
  const fractionParam = params.get('fraction');
  const chartFraction = FRACTIONS.includes(fractionParam as Fraction) ? (fractionParam as Fraction) : null;
  const list = useScenarios(PICKER_FILTERS);
  const enough = selection.ids.length >= MIN_SELECTED && !selection.tooMany;
  const state = useCompareColumns(enough ? selection.ids : [], SOURCES);

  const update = (next: Record<string, string | undefined>) => {
    const p = new URLSearchParams(params);
    for (const [k, v] of Object.entries(next)) {
      if (!v) p.delete(k);
      else p.set(k, v);
    }
    setParams(p, { replace: true });
  };
  const setIds = (ids: number[]) => update({ ids: formatSelection(ids) });
  // The address changes in a transition, after the click: the picker shows the ticks at once from
  // its own copy, and each tick builds on the latest one (a ref), so quick ticks are neither lost
  // nor shown unticked in between. The copy gives way once the address has caught up.
  const idsParam = params.get('ids') ?? '';
  const latest = useRef<number[]>(selection.ids);
  const [ticked, setTicked] = useState<number[] | null>(null);
  useEffect(() => {
    const fromAddress = parseSelection(idsParam).ids;
    setTicked((pending) => {
      if (pending && formatSelection(pending) !== formatSelection(fromAddress)) return pending;
      latest.current = fromAddress;
      return null;
    });
  }, [idsParam]);
  const toggle = (id: number) => {
    const next = toggleId(latest.current, id);
    latest.current = next;
    setTicked(next);
    setIds(next);
  };

  return (
    <Page
      title="Side by side"
      intro="Compare 2 to 4 scenarios from their latest saved runs, ordered by the hierarchy of controls. The link holds the selection, so it can be shared."
    >
      <ScenarioPicker
        scenarios={list.data?.items}
        pending={list.isPending}
        error={list.error}
        selected={ticked ?? selection.ids}
        onToggle={toggle}
      />
      {selection.ignored.length > 0 && (
        <p role="status" className="mb-4 text-sm text-watch">
          The link held parts that are not scenario ids and were left out: {selection.ignored.map((s) => `“${s}”`).join(', ')}.
        </p>
      )}
      {selection.tooMany ? (
        <div role="alert" className="mb-4 rounded-md border-2 border-act bg-act-soft p-3 text-sm text-act">
          <strong>✕ Too many scenarios:</strong> side by side compares at most {MAX_SELECTED}, and this link holds {selection.ids.length}.
          Untick some above, or{' '}
          <Button variant="ghost" className="px-1 py-0 underline" onClick={() => setIds(selection.ids.slice(0, MAX_SELECTED))}>
            keep the first {MAX_SELECTED}
          </Button>
          .
        </div>
      ) : !enough ? (
        <EmptyState title={selection.ids.length === 0 ? 'Choose scenarios to compare' : 'Choose at least one more scenario'}>
          Side by side needs at least {MIN_SELECTED} scenarios; tick them in the list above.
        </EmptyState>
      ) : (
        <>
          {state.problems.map((p) => (
            <div key={p.id} className="mb-3 flex flex-wrap items-center gap-3">
              <ErrorMessage error={p.message} title={`Scenario ${p.name ? `“${p.name}”` : `#${p.id}`} left out`} />
              <Button variant="secondary" onClick={() => setIds(selection.ids.filter((id) => id !== p.id))}>
                Remove it from the selection
              </Button>
            </div>
          ))}
          {state.pending ? (
            <Spinner label="Loading the scenarios and their latest runs…" />
          ) : state.columns.length < MIN_SELECTED ? (
            <EmptyState title="Not enough scenarios to compare">
              Fewer than {MIN_SELECTED} of the chosen scenarios could be loaded.
            </EmptyState>
          ) : (
            <CompareResults
              columns={state.columns}
              target={target}
              onTargetChange={(id) => update({ target: id })}
              chartFraction={chartFraction}
              onChartFractionChange={(f) => update({ fraction: f })}
            />
          )}
        </>
      )}
      <Cautions />
    </Page>
  );
}
