import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { StoredScenario } from '../../../../shared/schemas/api/scenarios';
export type { ScenarioChange, StoredScenario } from '../../../../shared/schemas/api/scenarios';

export const getScenario = (projectId: number, scenarioId: number) => apiFetch<{ scenario: StoredScenario }>(`/projects/${projectId}/scenarios/${scenarioId}`);

export const scenarioQueryOptions = (projectId: number, scenarioId: number) =>
  queryOptions({ queryKey: ['projects', projectId, 'scenarios', scenarioId], queryFn: () => getScenario(projectId, scenarioId) });

export const useScenario = (projectId: number, scenarioId: number | null) =>
  useQuery({ ...scenarioQueryOptions(projectId, scenarioId ?? 0), enabled: scenarioId !== null });
