import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';
import { sizeProfilesQueryOptions } from './get-size-profiles';

export const deleteSizeProfile = (id: number) => apiFetch<void>(api.sizeProfile(id), { method: 'DELETE' });

export function useDeleteSizeProfile() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: deleteSizeProfile,
    onSuccess: () => qc.invalidateQueries({ queryKey: sizeProfilesQueryOptions().queryKey }),
  });
}
