// @ts-nocheck
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { ProjectRole } from './get-members';

export const sendInvite = (projectId: number, email: string, role: ProjectRole) =>
  apiFetch<{ invite: { id: number; email: string } }>(`/projects/${projectId}/invites`, { method: 'POST', body: JSON.stringify({ email, role }) });

export function useSendInvite(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ email, role }: { email: string; role: ProjectRole }) => sendInvite(projectId, email, role),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['projects', projectId, 'invites'] }),
  });
}
