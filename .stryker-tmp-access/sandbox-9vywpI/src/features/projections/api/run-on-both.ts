// @ts-nocheck
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

/** One scenario on today's file and on the projection: two runs, queued together. */
export const runOnBoth = (projectId: number, scenarioId: number, parentFileId: number, projectionFileId: number) =>
  apiFetch<{ runs: { id: number; climateFileId: number; reused: boolean }[] }>(`/projects/${projectId}/runs`, {
    method: 'POST',
    // A run of the same inputs on either file that already exists is reused, not run again.
    body: JSON.stringify({ scenarioIds: [scenarioId], climateFileIds: [parentFileId, projectionFileId], reuse: true }),
  });

export function useRunOnBoth(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (v: { scenarioId: number; parentFileId: number; projectionFileId: number }) =>
      runOnBoth(projectId, v.scenarioId, v.parentFileId, v.projectionFileId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['projects', projectId, 'runs'] }),
  });
}
