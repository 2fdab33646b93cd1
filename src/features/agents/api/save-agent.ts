import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AgentInput } from '../../../../shared/schemas/workspace';
import type { AgentRecord } from '../../../../shared/schemas/workspace-views';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';
import { agentKeys } from './get-agents';

// An edit names the version it was made from; the server answers 409 with the stored agent when it moved on.
export const saveAgent = ({ id, version, body }: { id?: number; version?: number; body: AgentInput }) =>
  id
    ? apiFetch<AgentRecord>(api.agent(id), { method: 'PUT', body: { ...body, version } })
    : apiFetch<AgentRecord>(api.agents, { method: 'POST', body });

export function useSaveAgent() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: saveAgent, onSuccess: () => qc.invalidateQueries({ queryKey: agentKeys.all }) });
}
