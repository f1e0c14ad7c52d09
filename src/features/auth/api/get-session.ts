import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { Session } from '../../../../shared/schemas/api/people';
export type { Session, SessionUser } from '../../../../shared/schemas/api/people';

export const getSession = () => apiFetch<Session>('/auth/session');

export const sessionQueryOptions = () => queryOptions({ queryKey: ['session'], queryFn: getSession, staleTime: 60_000 });

export const useSession = () => useQuery(sessionQueryOptions());

export { signInHref } from '@/lib/sign-in';
