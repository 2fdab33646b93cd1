import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RoomInput, SiteInput, WorkstationInput } from '../../../../shared/schemas/workspace';
import { api } from '../../../config/paths';
import { apiFetch } from '../../../lib/api-client';
import { placeKeys } from './get-sites';

type Created = { id: number; name: string };

export const createSite = (body: SiteInput) => apiFetch<Created>(api.sites, { method: 'POST', body });
export const createRoom = (body: RoomInput) => apiFetch<Created>(api.rooms, { method: 'POST', body });
export const createWorkstation = (body: WorkstationInput) => apiFetch<Created>(api.workstations, { method: 'POST', body });

function usePlaceMutation<T>(fn: (body: T) => Promise<Created>) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: fn, onSuccess: () => qc.invalidateQueries({ queryKey: placeKeys.all }) });
}

export const useCreateSite = () => usePlaceMutation(createSite);
export const useCreateRoom = () => usePlaceMutation(createRoom);
export const useCreateWorkstation = () => usePlaceMutation(createWorkstation);
