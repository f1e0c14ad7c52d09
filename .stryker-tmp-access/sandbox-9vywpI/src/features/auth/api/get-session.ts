// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

export interface SessionUser {
  id: number;
  email: string;
  name: string;
  isAdmin: boolean;
}

export type Session = { signedIn: false; signInAvailable: boolean } | { signedIn: true; signInAvailable: boolean; user: SessionUser; mailbox: boolean };

export const getSession = () => apiFetch<Session>('/auth/session');

export const sessionQueryOptions = () => queryOptions({ queryKey: ['session'], queryFn: getSession, staleTime: 60_000 });

export const useSession = () => useQuery(sessionQueryOptions());

export { signInHref } from '@/lib/sign-in';
