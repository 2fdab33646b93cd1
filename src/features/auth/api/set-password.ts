import { useMutation } from '@tanstack/react-query';
import type { SetPasswordInput } from '../../../../shared/schemas/auth';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';

export const setPassword = (input: SetPasswordInput) => apiFetch<{ email: string }>(api.setPassword, { method: 'POST', body: input });

export const useSetPassword = () => useMutation({ mutationFn: setPassword });
