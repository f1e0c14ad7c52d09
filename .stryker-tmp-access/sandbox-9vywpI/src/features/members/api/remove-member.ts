// @ts-nocheck
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

export const removeMember = (projectId: number, userId: number) => apiFetch<void>(`/projects/${projectId}/members/${userId}`, { method: 'DELETE' });

export function useRemoveMember(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (userId: number) => removeMember(projectId, userId),
    onSettled: () => queryClient.invalidateQueries({ queryKey: ['projects', projectId, 'members'] }),
  });
}
