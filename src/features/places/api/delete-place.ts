import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';
import { placeKeys } from './get-sites';

export type PlaceKind = 'site' | 'room' | 'workstation';

const URL: Record<PlaceKind, (id: number) => string> = { site: api.site, room: api.room, workstation: api.workstation };

// Soft delete: the server refuses (409, naming them) while rooms, workstations or scenarios remain inside.
export const deletePlace = ({ kind, id }: { kind: PlaceKind; id: number }) => apiFetch<void>(URL[kind](id), { method: 'DELETE' });

export function useDeletePlace() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: deletePlace, onSuccess: () => qc.invalidateQueries({ queryKey: placeKeys.all }) });
}
