import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Scenario } from '../../../../shared/schemas/scenario';
import { toJsonFriendly } from '../../../../shared/schemas/runs';
import type { SavedRun } from '../../../../shared/schemas/workspace-views';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';
import { scenarioKeys } from './get-scenarios';

export const saveRun = ({
  scenarioId,
  scenarioVersion,
  input,
  result,
}: {
  scenarioId: number;
  scenarioVersion: number;
  input: Scenario;
  result: unknown;
}) =>
  apiFetch<SavedRun>(api.scenarioRuns(scenarioId), { method: 'POST', body: { scenarioVersion, input, result: toJsonFriendly(result) } });

export function useSaveRun() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: saveRun, onSuccess: () => qc.invalidateQueries({ queryKey: scenarioKeys.all }) });
}
