import { useMutation, useQueryClient, type QueryKey } from '@tanstack/react-query';
import type { Scenario } from '../../../../shared/schemas/scenario';
import { toJsonFriendly } from '../../../../shared/schemas/runs';
import type { SavedRun } from '../../../../shared/schemas/workspace-views';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';
import { scenarioKeys } from './get-scenarios';

export const saveRun = ({
  scenarioId,
  scenarioVersion,
  ticket,
  input,
  result,
}: {
  scenarioId: number;
  scenarioVersion: number;
  ticket: string;
  input: Scenario;
  result: unknown;
}) =>
  apiFetch<SavedRun>(api.scenarioRuns(scenarioId), {
    method: 'POST',
    body: { scenarioVersion, ticket, input, result: toJsonFriendly(result) },
  });

/** A saved run changes the scenario's detail and lists; \`also\` names other features' queries it makes stale (the audit trail). */
export function useSaveRun(also: readonly QueryKey[] = []) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: saveRun,
    onSuccess: () => Promise.all([scenarioKeys.all, ...also].map((queryKey) => qc.invalidateQueries({ queryKey }))),
  });
}
