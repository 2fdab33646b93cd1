import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { OperatorAssignment } from '../../../../shared/schemas/workspace-views';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';
import { placeKeys } from './get-sites';

export const assignOperators = ({ workstationId, personIds }: { workstationId: number; personIds: number[] }) =>
  apiFetch<OperatorAssignment>(api.operators(workstationId), { method: 'PUT', body: { personIds } });

export function useAssignOperators() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: assignOperators,
    onSuccess: (_r, v) => qc.invalidateQueries({ queryKey: placeKeys.workstation(v.workstationId) }),
  });
}
