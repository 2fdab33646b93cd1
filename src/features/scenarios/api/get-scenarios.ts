import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { Page, ScenarioSummary } from '../../../../shared/schemas/workspace-views';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';

export type ScenarioFilters = {
  sort?: string;
  order?: 'asc' | 'desc';
  siteId?: number;
  workstationId?: number;
  agentId?: number;
  status?: 'draft' | 'approved';
  q?: string;
  pageSize?: number;
};

export const scenarioKeys = {
  all: ['scenarios'] as const,
  list: (f: ScenarioFilters) => ['scenarios', 'list', f] as const,
  detail: (id: number) => ['scenarios', 'detail', id] as const,
};

export function getScenarios(f: ScenarioFilters) {
  const params = new URLSearchParams();
  for (const [k, v] of Object.entries(f)) if (v !== undefined && v !== '') params.set(k, String(v));
  return apiFetch<Page<ScenarioSummary>>(`${api.scenarios}?${params}`);
}

export const scenariosQueryOptions = (f: ScenarioFilters) =>
  queryOptions({ queryKey: scenarioKeys.list(f), queryFn: () => getScenarios(f), placeholderData: keepPreviousData });

export const useScenarios = (f: ScenarioFilters) => useQuery(scenariosQueryOptions(f));
