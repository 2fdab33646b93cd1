import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateSizeProfileInput, SizeProfileDetail } from '../../../../shared/schemas/size-profiles';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';
import { sizeProfilesQueryOptions } from './get-size-profiles';

export const createSizeProfile = (input: CreateSizeProfileInput) =>
  apiFetch<SizeProfileDetail>(api.sizeProfiles, { method: 'POST', body: input });

export function useCreateSizeProfile() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: createSizeProfile,
    onSuccess: () => qc.invalidateQueries({ queryKey: sizeProfilesQueryOptions().queryKey }),
  });
}
