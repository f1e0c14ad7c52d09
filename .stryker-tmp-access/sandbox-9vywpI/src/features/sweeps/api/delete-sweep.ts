// @ts-nocheck
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

/** Deletes the sweep and its runs; points still waiting or running are cancelled first. */
export const deleteSweep = (projectId: number, sweepId: number) => apiFetch<void>(`/projects/${projectId}/sweeps/${sweepId}`, { method: 'DELETE' });

export function useDeleteSweep(projectId: number, sweepId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => deleteSweep(projectId, sweepId),
    onSuccess: () => {
      queryClient.removeQueries({ queryKey: ['projects', projectId, 'sweeps', sweepId] });
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: ['projects', projectId, 'sweeps'] }),
        queryClient.invalidateQueries({ queryKey: ['projects', projectId, 'runs'] }),
      ]);
    },
  });
}
