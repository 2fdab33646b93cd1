import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ScenarioUpdate } from '../../../../shared/schemas/workspace';
import type { ScenarioDetail } from '../../../../shared/schemas/workspace-views';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';
import { scenarioKeys } from './get-scenarios';

export const updateScenario = ({ id, patch }: { id: number; patch: ScenarioUpdate }) =>
  apiFetch<ScenarioDetail>(api.scenario(id), { method: 'PATCH', body: patch });

export function useUpdateScenario() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: updateScenario,
    onSuccess: (saved) => {
      qc.setQueryData(scenarioKeys.detail(saved.id), saved);
      return qc.invalidateQueries({ queryKey: scenarioKeys.all });
    },
  });
}
