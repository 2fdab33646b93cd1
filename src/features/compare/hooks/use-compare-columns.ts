import { useQueries, type QueryKey, type UseQueryOptions } from '@tanstack/react-query';
import type { ScenarioDetail, SavedRun } from '../../../../shared/schemas/workspace-views';
import { buildColumn } from '@/features/compare/lib/build-column';
import { orderByHierarchy } from '@/features/compare/lib/control-order';
import type { CompareColumn, RunFigures } from '@/features/compare/lib/types';

/** How to fetch and read scenarios and runs; the route passes in the owning features' query options. */
export interface CompareSources<KS extends QueryKey, KR extends QueryKey> {
  scenario: (id: number) => UseQueryOptions<ScenarioDetail, Error, ScenarioDetail, KS>;
  run: (id: number) => UseQueryOptions<SavedRun, Error, SavedRun, KR>;
  figures: (result: unknown) => RunFigures;
}

export interface CompareState {
  pending: boolean;
  columns: CompareColumn[];
  problems: { id: number; name?: string; message: string }[];
}

// A stored run is large; reading it once per response object keeps re-renders cheap.
const figuresCache = new WeakMap<object, RunFigures | Error>();

function figuresOf(run: SavedRun, read: (result: unknown) => RunFigures): RunFigures | Error {
  let cached = figuresCache.get(run);
  if (!cached) {
    try {
      cached = read(run.result);
    } catch (err) {
      cached = err instanceof Error ? err : new Error(String(err));
    }
    figuresCache.set(run, cached);
  }
  return cached;
}

export function useCompareColumns<KS extends QueryKey, KR extends QueryKey>(
  ids: readonly number[],
  sources: CompareSources<KS, KR>,
): CompareState {
  const details = useQueries({ queries: ids.map((id) => sources.scenario(id)) });
  const runIds = details.map((d) => d.data?.lastRun?.id ?? null);
  const runs = useQueries({ queries: runIds.filter((id): id is number => id !== null).map((id) => sources.run(id)) });
  let k = 0;
  const runFor = runIds.map((id) => (id === null ? null : runs[k++]));

  const problems: CompareState['problems'] = [];
  const columns: CompareColumn[] = [];
  let pending = details.some((d) => d.isPending) || runs.some((r) => r.isPending);
  details.forEach((d, i) => {
    if (d.error) return problems.push({ id: ids[i], message: d.error.message });
    if (!d.data) return;
    const runQuery = runFor[i];
    if (!runQuery) return columns.push(buildColumn(d.data, null, null));
    if (runQuery.error)
      return problems.push({ id: ids[i], name: d.data.name, message: `its latest run could not be loaded: ${runQuery.error.message}` });
    const run = runQuery.data;
    if (!run) return (pending = true);
    const figures = figuresOf(run, sources.figures);
    if (figures instanceof Error)
      return problems.push({ id: ids[i], name: d.data.name, message: `its latest run could not be read: ${figures.message}` });
    columns.push(buildColumn(d.data, run, figures));
  });
  return { pending, columns: orderByHierarchy(columns), problems };
}
