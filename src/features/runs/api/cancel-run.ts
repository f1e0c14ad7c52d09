import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { runQueryKey, type RunRecord } from '@/lib/api/runs';

export const cancelRun = (projectId: number, runId: number) => apiFetch<{ run: RunRecord }>(`/projects/${projectId}/runs/${runId}/cancel`, { method: 'POST' });

export function useCancelRun(projectId: number, runId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => cancelRun(projectId, runId),
    onSuccess: (data) => queryClient.setQueryData(runQueryKey(projectId, runId), data),
  });
}
