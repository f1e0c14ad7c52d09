// @ts-nocheck
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

export const revokeInvite = (projectId: number, inviteId: number) => apiFetch<void>(`/projects/${projectId}/invites/${inviteId}`, { method: 'DELETE' });

export function useRevokeInvite(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (inviteId: number) => revokeInvite(projectId, inviteId),
    onSettled: () => queryClient.invalidateQueries({ queryKey: ['projects', projectId, 'invites'] }),
  });
}
