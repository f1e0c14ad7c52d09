// @ts-nocheck
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

/** Stops the sweep's points still waiting or running; finished points and their results stay. */
export const cancelSweep = (projectId: number, sweepId: number) =>
  apiFetch<{ cancelled: number }>(`/projects/${projectId}/sweeps/${sweepId}/cancel`, { method: 'POST' });

export function useCancelSweep(projectId: number, sweepId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => cancelSweep(projectId, sweepId),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ['projects', projectId, 'sweeps'] }),
        queryClient.invalidateQueries({ queryKey: ['projects', projectId, 'runs'] }),
      ]),
  });
}
