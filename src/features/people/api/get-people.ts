import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Person } from '../../../../shared/schemas/auth';
import type { Page } from '../../../../shared/schemas/workspace-views';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';

export const getPeople = () => apiFetch<Page<Person>>(`${api.people}?pageSize=200&sort=name`);

export const peopleQueryOptions = () => queryOptions({ queryKey: ['people'], queryFn: getPeople });

export const usePeople = ({ enabled = true }: { enabled?: boolean } = {}) => useQuery({ ...peopleQueryOptions(), enabled });
