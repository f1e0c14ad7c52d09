import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { Person } from '../../../../shared/schemas/api/people';
export type { Person } from '../../../../shared/schemas/api/people';

export const getPeople = () => apiFetch<{ people: Person[] }>('/admin/people');

export const peopleQueryOptions = () => queryOptions({ queryKey: ['admin', 'people'], queryFn: getPeople, retry: false });

export const usePeople = () => useQuery(peopleQueryOptions());
