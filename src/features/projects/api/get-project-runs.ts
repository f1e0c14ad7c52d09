import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

export type RunStatus = 'queued' | 'running' | 'done' | 'failed' | 'cancelled';

export interface RunListing {
  id: number;
  scenarioId: number | null;
  climateFileId: number | null;
  status: RunStatus;
  /** 0…1 while running */
  progress: number;
  error: string | null;
  createdAt: string | number;
  finishedAt: string | number | null;
  scenario: { name: string };
  climate: { name: string; site: { name: string } };
  results: { hours: { free: number; adiabatic: number; mechanical: number; noData: number; total: number } } | null;
}

export const getProjectRuns = (projectId: number) => apiFetch<{ runs: RunListing[] }>(`/projects/${projectId}/runs`);

export const projectRunsQueryOptions = (projectId: number) =>
  queryOptions({
    queryKey: ['projects', projectId, 'runs'],
    queryFn: () => getProjectRuns(projectId),
    retry: false,
    // Read afresh on every visit (the list is shared with the compare page and the editor), and follow
    // runs that are still waiting or computing.
    staleTime: 0,
    refetchInterval: (query) => (query.state.data?.runs.some((r) => r.status === 'queued' || r.status === 'running') ? 2000 : false),
  });

export const useProjectRuns = (projectId: number) => useQuery(projectRunsQueryOptions(projectId));
