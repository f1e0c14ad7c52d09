// @ts-nocheck
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { ProjectRole } from './get-members';

export const acceptInvite = (token: string) =>
  apiFetch<{ projectId: number; role: ProjectRole }>('/invites/accept', { method: 'POST', body: JSON.stringify({ token }) });

export function useAcceptInvite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptInvite,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['projects'] }),
  });
}
