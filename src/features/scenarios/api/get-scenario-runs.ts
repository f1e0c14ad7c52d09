import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

export interface ScenarioRunListing {
  id: number;
  scenarioId: number | null;
  status: 'queued' | 'running' | 'done' | 'failed' | 'cancelled';
  createdAt: string;
  climate: { name: string; site: { name: string } };
  results: { hours: { free: number; adiabatic: number; mechanical: number; total: number }; energy: { partialPue: number | null } } | null;
}

export const getProjectRuns = (projectId: number) => apiFetch<{ runs: ScenarioRunListing[] }>(`/projects/${projectId}/runs`);

/** The project's runs (the same cache entry the compare page reads); the editor keeps those of its scenario. */
export const projectRunsQueryOptions = (projectId: number) =>
  queryOptions({
    queryKey: ['projects', projectId, 'runs'],
    queryFn: () => getProjectRuns(projectId),
    // The list is shared by the overview, the compare page and the editor: read it afresh on every visit,
    // and follow runs still waiting or computing until they finish.
    staleTime: 0,
    refetchInterval: (query) => (query.state.data?.runs.some((r) => r.status === 'queued' || r.status === 'running') ? 2000 : false),
  });

export function useScenarioRuns(projectId: number, scenarioId: number | null) {
  const query = useQuery({ ...projectRunsQueryOptions(projectId), enabled: scenarioId !== null });
  return { ...query, runs: (query.data?.runs ?? []).filter((r) => r.scenarioId === scenarioId) };
}
