import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ScenarioDetail } from '../../../../shared/schemas/workspace-views';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';
import { scenarioKeys } from './get-scenarios';

export const getScenario = (id: number) => apiFetch<ScenarioDetail>(api.scenario(id));

export const scenarioQueryOptions = (id: number) => queryOptions({ queryKey: scenarioKeys.detail(id), queryFn: () => getScenario(id) });

export const useScenario = (id: number) => useQuery(scenarioQueryOptions(id));
