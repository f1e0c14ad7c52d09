import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

/** One scenario on today's file and on the projection: two runs, queued together. */
export const runOnBoth = (projectId: number, scenarioId: number, parentFileId: number, projectionFileId: number) =>
  apiFetch<{ runs: { id: number; climateFileId: number }[] }>(`/projects/${projectId}/runs`, {
    method: 'POST',
    body: JSON.stringify({ scenarioIds: [scenarioId], climateFileIds: [parentFileId, projectionFileId] }),
  });

export function useRunOnBoth(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (v: { scenarioId: number; parentFileId: number; projectionFileId: number }) =>
      runOnBoth(projectId, v.scenarioId, v.parentFileId, v.projectionFileId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['projects', projectId, 'runs'] }),
  });
}
