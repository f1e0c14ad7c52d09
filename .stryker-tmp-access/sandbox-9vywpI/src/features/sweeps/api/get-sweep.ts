// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { SweepListing } from '@/lib/project-sweeps';
import type { Scenario } from '../../../../shared/scenario/schema';
import type { SweepPoint } from '../../../../shared/sweep';

/** One sweep with its base scenario and every point's status and results. */
export interface SweepRecord extends SweepListing {
  baseScenario: Scenario;
  points: SweepPoint[];
}

export const getSweep = (projectId: number, sweepId: number) => apiFetch<{ sweep: SweepRecord }>(`/projects/${projectId}/sweeps/${sweepId}`);

/** Polls every second while a point waits or runs, then stops: finished runs never change. */
export const sweepQueryOptions = (projectId: number, sweepId: number) =>
  queryOptions({
    queryKey: ['projects', projectId, 'sweeps', sweepId],
    queryFn: () => getSweep(projectId, sweepId),
    retry: false,
    refetchInterval: (query) => (query.state.data && query.state.data.sweep.progress.finished ? false : 1000),
  });

export const useSweep = (projectId: number, sweepId: number) => useQuery(sweepQueryOptions(projectId, sweepId));
