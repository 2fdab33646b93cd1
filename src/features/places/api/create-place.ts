import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RoomInput, SiteInput, WorkstationInput } from '../../../../shared/schemas/workspace';
import type { RoomRecord, SiteRecord, WorkstationRecord } from '../../../../shared/schemas/workspace-views';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';
import { placeKeys } from './get-sites';

export const createSite = (body: SiteInput) => apiFetch<SiteRecord>(api.sites, { method: 'POST', body });
export const createRoom = (body: RoomInput) => apiFetch<RoomRecord>(api.rooms, { method: 'POST', body });
export const createWorkstation = (body: WorkstationInput) => apiFetch<WorkstationRecord>(api.workstations, { method: 'POST', body });

function usePlaceMutation<T, R>(fn: (body: T) => Promise<R>) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: fn, onSuccess: () => qc.invalidateQueries({ queryKey: placeKeys.all }) });
}

export const useCreateSite = () => usePlaceMutation(createSite);
export const useCreateRoom = () => usePlaceMutation(createRoom);
export const useCreateWorkstation = () => usePlaceMutation(createWorkstation);
