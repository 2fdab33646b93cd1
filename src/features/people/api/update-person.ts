import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Person, UpdatePersonInput } from '../../../../shared/schemas/auth';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';
import { peopleQueryOptions } from './get-people';

export const updatePerson = ({ id, patch }: { id: number; patch: UpdatePersonInput }) =>
  apiFetch<Person>(api.person(id), { method: 'PATCH', body: patch });

export function useUpdatePerson() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: updatePerson, onSuccess: () => qc.invalidateQueries({ queryKey: peopleQueryOptions().queryKey }) });
}
