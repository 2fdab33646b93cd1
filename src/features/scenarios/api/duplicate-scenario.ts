import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ScenarioDetail } from '../../../../shared/schemas/workspace-views';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';
import { scenarioKeys } from './get-scenarios';

export const duplicateScenario = ({ id, name }: { id: number; name?: string }) =>
  apiFetch<ScenarioDetail>(api.duplicateScenario(id), { method: 'POST', body: name ? { name } : {} });

export function useDuplicateScenario() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: duplicateScenario, onSuccess: () => qc.invalidateQueries({ queryKey: scenarioKeys.all }) });
}
