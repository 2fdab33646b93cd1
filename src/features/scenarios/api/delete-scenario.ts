import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';
import { scenarioKeys } from './get-scenarios';

export const deleteScenario = (id: number) => apiFetch<void>(api.scenario(id), { method: 'DELETE' });

export function useDeleteScenario() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: deleteScenario, onSuccess: () => qc.invalidateQueries({ queryKey: scenarioKeys.all }) });
}
