import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Person } from '../../../../shared/schemas/auth';
import { api } from '../../../config/paths';
import { apiFetch } from '../../../lib/api-client';

export type PeoplePage = { items: Person[]; total: number; page: number; pageSize: number };

export const getPeople = () => apiFetch<PeoplePage>(`${api.people}?pageSize=200&sort=name`);

export const peopleQueryOptions = () => queryOptions({ queryKey: ['people'], queryFn: getPeople });

export const usePeople = ({ enabled = true }: { enabled?: boolean } = {}) => useQuery({ ...peopleQueryOptions(), enabled });
