import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AgentInput } from '../../../../shared/schemas/workspace';
import type { AgentRecord } from '../../../../shared/schemas/workspace-views';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';
import { agentKeys } from './get-agents';

export const saveAgent = ({ id, body }: { id?: number; body: AgentInput }) =>
  apiFetch<AgentRecord>(id ? api.agent(id) : api.agents, { method: id ? 'PUT' : 'POST', body });

export function useSaveAgent() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: saveAgent, onSuccess: () => qc.invalidateQueries({ queryKey: agentKeys.all }) });
}
