import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ScenarioCreate } from '../../../../shared/schemas/workspace';
import type { ScenarioDetail } from '../../../../shared/schemas/workspace-views';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';
import { scenarioKeys } from './get-scenarios';

export const createScenario = (body: ScenarioCreate) => apiFetch<ScenarioDetail>(api.scenarios, { method: 'POST', body });

export function useCreateScenario() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: createScenario, onSuccess: () => qc.invalidateQueries({ queryKey: scenarioKeys.all }) });
}
