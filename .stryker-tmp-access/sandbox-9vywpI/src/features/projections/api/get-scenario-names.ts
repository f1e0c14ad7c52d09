// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

export interface ScenarioName {
  id: number;
  name: string;
}

export const getScenarioNames = (projectId: number) => apiFetch<{ scenarios: ScenarioName[] }>(`/projects/${projectId}/scenarios`);

/** The project's scenarios, by name, to run one on today's file and on the projection. */
export const scenarioNamesQueryOptions = (projectId: number) =>
  queryOptions({ queryKey: ['projects', projectId, 'projections', 'scenario-names'], queryFn: () => getScenarioNames(projectId), retry: false });

export const useScenarioNames = (projectId: number) => useQuery(scenarioNamesQueryOptions(projectId));
