import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { InviteInput, Person } from '../../../../shared/schemas/auth';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';
import { peopleQueryOptions } from './get-people';

export const invitePerson = (input: InviteInput) => apiFetch<Person>(api.people, { method: 'POST', body: input });

export function useInvitePerson() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: invitePerson, onSuccess: () => qc.invalidateQueries({ queryKey: peopleQueryOptions().queryKey }) });
}
