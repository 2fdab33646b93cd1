import { useMutation, useQueryClient, type QueryKey } from '@tanstack/react-query';
import type { ApproveInput } from '../../../../shared/schemas/workspace';
import type { Approval } from '../../../../shared/schemas/workspace-views';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';

export const approveScenario = ({ scenarioId, body }: { scenarioId: number; body: ApproveInput }) =>
  apiFetch<Approval>(api.approve(scenarioId), { method: 'POST', body });

/**
 * An approval changes the scenario, its lists, the workstation page, the boards and the audit trail. Those queries
 * belong to other features, so the route that composes them passes their keys (from their query-options factories).
 */
export function useApprove(refresh: readonly QueryKey[]) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: approveScenario,
    onSuccess: () => Promise.all(refresh.map((queryKey) => qc.invalidateQueries({ queryKey }))),
  });
}
