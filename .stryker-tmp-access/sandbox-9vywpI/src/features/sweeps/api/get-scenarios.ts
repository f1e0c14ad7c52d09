// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { Scenario } from '../../../../shared/scenario/schema';

/** A saved scenario, as the sweep form needs it: its system decides which inputs can be swept. */
export interface SweepBaseScenario {
  id: number;
  name: string;
  scenario: Scenario;
}

export const getScenarios = (projectId: number) => apiFetch<{ scenarios: SweepBaseScenario[] }>(`/projects/${projectId}/scenarios`);

export const scenariosQueryOptions = (projectId: number) =>
  queryOptions({ queryKey: ['projects', projectId, 'scenarios'], queryFn: () => getScenarios(projectId) });

export const useScenarios = (projectId: number) => useQuery(scenariosQueryOptions(projectId));
