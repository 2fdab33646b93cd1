import { queryOptions, useQuery } from '@tanstack/react-query';
import type { OutboxMessage, Page } from '../../../../shared/schemas/workspace-views';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';

export const getOutbox = () => apiFetch<Page<OutboxMessage>>(`${api.outbox}?pageSize=100`);

export const outboxQueryOptions = () => queryOptions({ queryKey: ['outbox'], queryFn: getOutbox, refetchInterval: 10_000 });

export const useOutbox = () => useQuery(outboxQueryOptions());
