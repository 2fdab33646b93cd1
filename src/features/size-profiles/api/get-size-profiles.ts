import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SizeProfileList } from '../../../../shared/schemas/size-profiles';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';

// The page sorts in the table; one page of 200 covers any team's profiles today.
export const getSizeProfiles = () => apiFetch<SizeProfileList>(`${api.sizeProfiles}?pageSize=200&sort=createdAt&order=desc`);

export const sizeProfilesQueryOptions = () => queryOptions({ queryKey: ['size-profiles'], queryFn: getSizeProfiles });

export const useSizeProfiles = () => useQuery(sizeProfilesQueryOptions());
