import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { SweepSpecInput } from '../../../../shared/sweep';
import type { SweepRecord } from '@/lib/api/sweeps';

/** Queues every point of the sweep as a run; the server checks every point first and stores all or nothing. */
export const createSweep = (projectId: number, spec: SweepSpecInput) =>
  apiFetch<{ sweep: SweepRecord }>(`/projects/${projectId}/sweeps`, { method: 'POST', body: JSON.stringify(spec) });

export function useCreateSweep(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (spec: SweepSpecInput) => createSweep(projectId, spec),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ['projects', projectId, 'sweeps'] }),
        queryClient.invalidateQueries({ queryKey: ['projects', projectId, 'runs'] }),
      ]),
  });
}
