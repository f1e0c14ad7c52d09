// @ts-nocheck
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { ProjectRole } from './get-members';

export const changeMemberRole = (projectId: number, userId: number, role: ProjectRole) =>
  apiFetch<{ userId: number; role: ProjectRole }>(`/projects/${projectId}/members/${userId}`, { method: 'PATCH', body: JSON.stringify({ role }) });

export function useChangeMemberRole(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: number; role: ProjectRole }) => changeMemberRole(projectId, userId, role),
    onSettled: () => queryClient.invalidateQueries({ queryKey: ['projects', projectId, 'members'] }),
  });
}
