import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../config/paths';
import { apiFetch } from '../../../lib/api-client';

export type OutboxMessage = { id: number; to: string; subject: string; text: string; html: string | null; createdAt: string };

export const getOutbox = () => apiFetch<{ items: OutboxMessage[]; total: number }>(`${api.outbox}?pageSize=100`);

export const outboxQueryOptions = () => queryOptions({ queryKey: ['outbox'], queryFn: getOutbox, refetchInterval: 10_000 });

export const useOutbox = () => useQuery(outboxQueryOptions());
