import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SizeProfileDetail } from '../../../../shared/schemas/size-profiles';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';
import { sizeProfilesQueryOptions } from './get-size-profiles';

export const getSizeProfile = (id: number) => apiFetch<SizeProfileDetail>(api.sizeProfile(id));

export const sizeProfileQueryOptions = (id: number) =>
  queryOptions({ queryKey: [...sizeProfilesQueryOptions().queryKey, id], queryFn: () => getSizeProfile(id) });

export const useSizeProfile = (id: number) => useQuery({ ...sizeProfileQueryOptions(id), enabled: Number.isInteger(id) && id > 0 });
