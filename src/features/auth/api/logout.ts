import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/config/paths';
import { apiFetch, setCsrfToken } from '@/lib/api-client';
import { meQueryOptions } from '@/lib/auth';

export const logout = () => apiFetch<void>(api.logout, { method: 'POST', quiet401: true });

export function useLogout() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: logout,
    onSettled: () => {
      setCsrfToken(undefined);
      qc.clear();
      qc.setQueryData(meQueryOptions().queryKey, null);
    },
  });
}
