import { queryOptions, useQuery } from '@tanstack/react-query';
import type { AgentRecord } from '../../../../shared/schemas/workspace-views';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';

export const agentKeys = { all: ['agents'] as const };

export const getAgents = () => apiFetch<{ items: AgentRecord[] }>(api.agents);

export const agentsQueryOptions = () => queryOptions({ queryKey: agentKeys.all, queryFn: getAgents });

export const useAgents = () => useQuery(agentsQueryOptions());
