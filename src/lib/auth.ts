import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Role } from '../../shared/auth/permissions';
import { api } from '@/config/paths';
import { ApiError, apiFetch, setCsrfToken } from './api-client';

export type SignedInUser = { id: number; email: string; name: string; role: Role; status: string };
type MeResponse = { user: SignedInUser; csrfToken: string };

export async function getMe(): Promise<SignedInUser | null> {
  try {
    const data = await apiFetch<MeResponse>(api.me, { quiet401: true });
    setCsrfToken(data.csrfToken);
    return data.user;
  } catch (err) {
    if (err instanceof ApiError && err.status === 401) return null;
    throw err;
  }
}

export const meQueryOptions = () => queryOptions({ queryKey: ['auth', 'me'], queryFn: getMe, staleTime: 60_000 });

export const useUser = () => useQuery(meQueryOptions());
