/** Saved scenarios of a project: the one listing every page reads, under one key. Types from shared/schemas/api. */
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { z } from 'zod';
import type { scenarioListResponse } from '../../../shared/schemas/api/scenarios';
import { apiFetch } from '../api-client';

export type { ScenarioChange, StoredScenario } from '../../../shared/schemas/api/scenarios';

export const scenariosQueryKey = (projectId: number) => ['projects', projectId, 'scenarios'] as const;

export const getScenarios = (projectId: number) => apiFetch<z.infer<typeof scenarioListResponse>>(`/projects/${projectId}/scenarios`);

export const scenariosQueryOptions = (projectId: number) =>
  queryOptions({ queryKey: scenariosQueryKey(projectId), queryFn: () => getScenarios(projectId), retry: false });

export const useScenarios = (projectId: number) => useQuery(scenariosQueryOptions(projectId));
