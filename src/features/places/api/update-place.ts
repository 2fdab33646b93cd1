import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RoomInput, SiteInput, WorkstationInput } from '../../../../shared/schemas/workspace';
import type { RoomRecord, SiteRecord, WorkstationRecord } from '../../../../shared/schemas/workspace-views';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';
import { placeKeys } from './get-sites';

// An edit names the version it was made from; a place keeps its parent, so the parent id is not sent.
export type PlaceEdit<B> = { id: number; version: number; body: B };

export const updateSite = ({ id, version, body }: PlaceEdit<SiteInput>) =>
  apiFetch<SiteRecord>(api.site(id), { method: 'PUT', body: { ...body, version } });
export const updateRoom = ({ id, version, body: { siteId: _site, ...body } }: PlaceEdit<RoomInput>) =>
  apiFetch<RoomRecord>(api.room(id), { method: 'PUT', body: { ...body, version } });
export const updateWorkstation = ({ id, version, body: { roomId: _room, ...body } }: PlaceEdit<WorkstationInput>) =>
  apiFetch<WorkstationRecord>(api.workstation(id), { method: 'PUT', body: { ...body, version } });

function usePlaceUpdate<B, R>(fn: (edit: PlaceEdit<B>) => Promise<R>) {
  const qc = useQueryClient();
  return useMutation({ mutationFn: fn, onSuccess: () => qc.invalidateQueries({ queryKey: placeKeys.all }) });
}

export const useUpdateSite = () => usePlaceUpdate(updateSite);
export const useUpdateRoom = () => usePlaceUpdate(updateRoom);
export const useUpdateWorkstation = () => usePlaceUpdate(updateWorkstation);
