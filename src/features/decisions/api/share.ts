import { useMutation } from '@tanstack/react-query';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';

export const shareReport = ({ scenarioId, email, runId }: { scenarioId: number; email: string; runId?: number }) =>
  apiFetch<{ sent: boolean }>(api.share(scenarioId), { method: 'POST', body: runId ? { email, runId } : { email } });

export const useShareReport = () => useMutation({ mutationFn: shareReport });
