import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SiteTree, WorkstationDetail } from '../../../../shared/schemas/workspace-views';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';

export const placeKeys = { all: ['places'] as const, workstation: (id: number) => ['places', 'workstation', id] as const };

export const getSites = () => apiFetch<{ items: SiteTree[] }>(api.sites);
export const sitesQueryOptions = () => queryOptions({ queryKey: placeKeys.all, queryFn: getSites });
export const useSites = () => useQuery(sitesQueryOptions());

export const getWorkstation = (id: number) => apiFetch<WorkstationDetail>(api.workstation(id));
export const workstationQueryOptions = (id: number) =>
  queryOptions({ queryKey: placeKeys.workstation(id), queryFn: () => getWorkstation(id) });
export const useWorkstation = (id: number) => useQuery(workstationQueryOptions(id));
