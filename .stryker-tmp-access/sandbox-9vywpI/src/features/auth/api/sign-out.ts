// @ts-nocheck
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

export const signOut = () => apiFetch<void>('/auth/sign-out', { method: 'POST' });
export const signOutEverywhere = () => apiFetch<{ ended: number }>('/auth/sign-out-everywhere', { method: 'POST' });

/** Signing out drops every cached answer: the next person at this browser must not see them. */
export function useSignOut(everywhere = false) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => (everywhere ? signOutEverywhere().then(() => undefined) : signOut()),
    onSuccess: () => {
      queryClient.clear();
      window.location.assign('/');
    },
  });
}
