// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

export interface Person {
  id: number;
  name: string;
  email: string;
  isAdmin: boolean;
  lastSignInAt: string | null;
}

export const getPeople = () => apiFetch<{ people: Person[] }>('/admin/people');

export const peopleQueryOptions = () => queryOptions({ queryKey: ['admin', 'people'], queryFn: getPeople, retry: false });

export const usePeople = () => useQuery(peopleQueryOptions());
