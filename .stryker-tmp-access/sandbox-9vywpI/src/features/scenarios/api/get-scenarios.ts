// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { StoredScenario } from './get-scenario';

export const getScenarios = (projectId: number) => apiFetch<{ scenarios: StoredScenario[] }>(`/projects/${projectId}/scenarios`);

export const scenariosQueryOptions = (projectId: number) =>
  queryOptions({ queryKey: ['projects', projectId, 'scenarios'], queryFn: () => getScenarios(projectId) });

export const useScenarios = (projectId: number) => useQuery(scenariosQueryOptions(projectId));
