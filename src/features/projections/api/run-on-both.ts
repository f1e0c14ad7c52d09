import { useMutation, useQueryClient } from '@tanstack/react-query';
import { createRuns, runsQueryKey } from '@/lib/api/runs';

/**
 * One scenario on today's file and on the projection: two runs, queued together. A run of the same inputs on either
 * file that already exists is reused, not run again.
 */
export function useRunOnBoth(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (v: { scenarioId: number; parentFileId: number; projectionFileId: number }) =>
      createRuns(projectId, { scenarioIds: [v.scenarioId], climateFileIds: [v.parentFileId, v.projectionFileId], reuse: true }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: runsQueryKey(projectId) }),
  });
}
