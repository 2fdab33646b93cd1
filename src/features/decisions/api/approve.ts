import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ApproveInput } from '../../../../shared/schemas/workspace';
import type { Approval } from '../../../../shared/schemas/workspace-views';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';

export const approveScenario = ({ scenarioId, body }: { scenarioId: number; body: ApproveInput }) =>
  apiFetch<Approval>(api.approve(scenarioId), { method: 'POST', body });

// An approval changes lists, boards and workstation pages alike: refresh them all.
export function useApprove() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: approveScenario, onSuccess: () => qc.invalidateQueries() });
}
