// @ts-nocheck
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { Scenario } from '../../../../shared/scenario/schema';
import type { StoredScenario } from './get-scenario';

/** Creates the scenario when it has no id yet, otherwise replaces it. */
export const saveScenario = (projectId: number, scenarioId: number | null, scenario: Scenario) =>
  apiFetch<{ scenario: StoredScenario }>(`/projects/${projectId}/scenarios${scenarioId === null ? '' : `/${scenarioId}`}`, {
    method: scenarioId === null ? 'POST' : 'PUT',
    body: JSON.stringify({ scenario }),
  });

export function useSaveScenario(projectId: number, scenarioId: number | null) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (scenario: Scenario) => saveScenario(projectId, scenarioId, scenario),
    onSuccess: ({ scenario }) => {
      queryClient.setQueryData(['projects', projectId, 'scenarios', scenario.id], { scenario });
      void queryClient.invalidateQueries({ queryKey: ['projects', projectId, 'scenarios'], exact: true });
    },
  });
}
