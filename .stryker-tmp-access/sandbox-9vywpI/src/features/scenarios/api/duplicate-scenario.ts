// @ts-nocheck
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { StoredScenario } from './get-scenario';

export const duplicateScenario = (projectId: number, scenarioId: number) =>
  apiFetch<{ scenario: StoredScenario }>(`/projects/${projectId}/scenarios/${scenarioId}/duplicate`, {
    method: 'POST',
  });

export function useDuplicateScenario(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (scenarioId: number) => duplicateScenario(projectId, scenarioId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['projects', projectId, 'scenarios'], exact: true }),
  });
}
