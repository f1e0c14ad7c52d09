/** Runs of a project: the run list every page shares, one run, and queueing runs. Types from shared/schemas/api. */
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { RunStatus } from '../../../shared/schemas/api/common';
import type { runListResponse, runResponse, runsCreatedResponse } from '../../../shared/schemas/api/runs';
import { apiFetch } from '../api-client';

export type { RunStatus } from '../../../shared/schemas/api/common';
export type { QueuedRun, RunClimate, RunListing, RunRecord } from '../../../shared/schemas/api/runs';

/** Done, failed or cancelled: a run that will not change any more. */
export const isFinished = (status: RunStatus | undefined) => status === 'done' || status === 'failed' || status === 'cancelled';

export const runsQueryKey = (projectId: number) => ['projects', projectId, 'runs'] as const;
export const runQueryKey = (projectId: number, runId: number) => [...runsQueryKey(projectId), runId] as const;
/** A run's monthly and yearly tables alone (the compare page): kept apart from the run's own entry, whose shape differs. */
export const runTablesQueryKey = (projectId: number, runId: number) => [...runQueryKey(projectId, runId), 'tables'] as const;

export const getProjectRuns = (projectId: number) => apiFetch<z.infer<typeof runListResponse>>(`/projects/${projectId}/runs`);

/**
 * The project's runs, one cache entry for the overview, the compare page and the scenario editor:
 * read afresh on every visit, and followed while any run is still waiting or computing.
 */
export const projectRunsQueryOptions = (projectId: number) =>
  queryOptions({
    queryKey: runsQueryKey(projectId),
    queryFn: () => getProjectRuns(projectId),
    retry: false,
    staleTime: 0,
    refetchInterval: (query) => (query.state.data?.runs.some((r) => !isFinished(r.status)) ? 2000 : false),
  });

export const useProjectRuns = (projectId: number) => useQuery(projectRunsQueryOptions(projectId));

export const getRun = (projectId: number, runId: number) => apiFetch<z.infer<typeof runResponse>>(`/projects/${projectId}/runs/${runId}`);

/** Polls once a second while the run is queued or running, then stops: a finished run never changes. */
export const runQueryOptions = (projectId: number, runId: number) =>
  queryOptions({
    queryKey: runQueryKey(projectId, runId),
    queryFn: () => getRun(projectId, runId),
    refetchInterval: (query) => (isFinished(query.state.data?.run.status) ? false : 1000),
  });

export const useRun = (projectId: number, runId: number) => useQuery(runQueryOptions(projectId, runId));

/**
 * Every scenario on every climate file: one run, or several. With `reuse`, an earlier identical run (same inputs,
 * file and engine, queued, running or done) is given back instead of a new one.
 */
export const createRuns = (projectId: number, input: { scenarioIds: number[]; climateFileIds: number[]; reuse?: boolean }) =>
  apiFetch<z.infer<typeof runsCreatedResponse>>(`/projects/${projectId}/runs`, { method: 'POST', body: JSON.stringify(input) });

export function useCreateRuns(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { scenarioIds: number[]; climateFileIds: number[]; reuse?: boolean }) => createRuns(projectId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: runsQueryKey(projectId) }),
  });
}
