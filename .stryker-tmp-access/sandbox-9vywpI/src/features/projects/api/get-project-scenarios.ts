// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

/** The listing fields the overview shows; the scenario editor reads the whole record. */
export interface ScenarioListing {
  id: number;
  name: string;
  updatedAt: string | number;
  scenario: { name: string; system?: { kind?: string } };
}

export const getProjectScenarios = (projectId: number) => apiFetch<{ scenarios: ScenarioListing[] }>(`/projects/${projectId}/scenarios`);

export const projectScenariosQueryOptions = (projectId: number) =>
  queryOptions({ queryKey: ['projects', projectId, 'scenarios'], queryFn: () => getProjectScenarios(projectId), retry: false });

export const useProjectScenarios = (projectId: number) => useQuery(projectScenariosQueryOptions(projectId));
