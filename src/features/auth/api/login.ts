import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { LoginInput } from '../../../../shared/schemas/auth';
import { api } from '@/config/paths';
import { apiFetch, setCsrfToken } from '@/lib/api-client';
import { meQueryOptions, type SignedInUser } from '@/lib/auth';

export async function login(input: LoginInput) {
  const data = await apiFetch<{ user: SignedInUser; csrfToken: string }>(api.login, { method: 'POST', body: input, quiet401: true });
  setCsrfToken(data.csrfToken);
  return data.user;
}

export function useLogin() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: login, onSuccess: (user) => qc.setQueryData(meQueryOptions().queryKey, user) });
}
