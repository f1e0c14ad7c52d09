// @ts-nocheck
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { StoredScenario } from './get-scenario';

/** Marks the notice of the start-up migration as read (engineers and owners; the server checks the role and audits it). */
export const dismissMigrationNotice = (projectId: number, scenarioId: number) =>
  apiFetch<{ scenario: StoredScenario }>(`/projects/${projectId}/scenarios/${scenarioId}/migration-notice/dismiss`, { method: 'POST' });

export function useDismissMigrationNotice(projectId: number, scenarioId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => dismissMigrationNotice(projectId, scenarioId),
    onSuccess: ({ scenario }) => queryClient.setQueryData(['projects', projectId, 'scenarios', scenario.id], { scenario }),
  });
}
