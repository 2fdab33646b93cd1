import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SavedRun } from '../../../../shared/schemas/workspace-views';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';

export const getRun = (id: number) => apiFetch<SavedRun>(api.run(id));

export const runQueryOptions = (id: number) => queryOptions({ queryKey: ['runs', id], queryFn: () => getRun(id), staleTime: Infinity });

export const useRun = (id: number) => useQuery(runQueryOptions(id));
