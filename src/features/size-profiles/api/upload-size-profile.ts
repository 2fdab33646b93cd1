import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SizeProfileDetail } from '../../../../shared/schemas/size-profiles';
import type { UploadFormat } from '../../../../shared/size-profiles/index';
import { api } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { sizeProfilesQueryOptions } from './get-size-profiles';

export type UploadInput = { file: File; format: UploadFormat; name: string; density_kgPerM3?: number; densityConfirmed?: boolean };

// apiFetch sends JSON only; a file needs multipart, and the browser's own Origin header passes the same-origin check.
export async function uploadSizeProfile(input: UploadInput): Promise<SizeProfileDetail> {
  const form = new FormData();
  form.set('format', input.format);
  form.set('name', input.name);
  if (input.format === 'counter') {
    if (input.density_kgPerM3 !== undefined) form.set('density_kgPerM3', String(input.density_kgPerM3));
    form.set('density_confirmed', input.densityConfirmed ? 'true' : 'false');
  }
  form.set('file', input.file);
  let res: Response;
  try {
    res = await fetch(api.sizeProfileUpload, {
      method: 'POST',
      body: form,
      credentials: 'same-origin',
      headers: { Accept: 'application/json' },
    });
  } catch {
    throw new ApiError(0, 'network', 'The server could not be reached. Check your connection and try again.');
  }
  const data = await res.json().catch(() => ({}));
  if (!res.ok)
    throw new ApiError(res.status, data.code ?? 'error', data.message ?? `The server answered ${res.status}`, data.issues ?? [], data);
  return data as SizeProfileDetail;
}

export function useUploadSizeProfile() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: uploadSizeProfile,
    onSuccess: () => qc.invalidateQueries({ queryKey: sizeProfilesQueryOptions().queryKey }),
  });
}
