// @ts-nocheck
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

export interface QueuedRun {
  id: number;
  scenarioId: number;
  climateFileId: number;
  status: string;
  scenario: { name: string };
  climate: { name: string };
}

/** Every scenario on every climate file: one run, or a sweep of several. */
export const createRuns = (projectId: number, scenarioIds: number[], climateFileIds: number[]) =>
  apiFetch<{ runs: QueuedRun[] }>(`/projects/${projectId}/runs`, {
    method: 'POST',
    body: JSON.stringify({ scenarioIds, climateFileIds }),
  });

export function useCreateRuns(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ scenarioIds, climateFileIds }: { scenarioIds: number[]; climateFileIds: number[] }) => createRuns(projectId, scenarioIds, climateFileIds),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['projects', projectId, 'runs'] }),
  });
}
