import { useMutation } from '@tanstack/react-query';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';

export const sendPasswordLink = (id: number) => apiFetch<{ sent: boolean }>(api.passwordLink(id), { method: 'POST', body: {} });

export const useSendPasswordLink = () => useMutation({ mutationFn: sendPasswordLink });
