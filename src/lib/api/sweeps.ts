/** Sweeps of a project: the list every page shares and one sweep with its points. Types from shared/schemas/api. */
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { z } from 'zod';
import type { sweepListResponse, sweepResponse } from '../../../shared/schemas/api/sweeps';
import { apiFetch } from '../api-client';

export type { SweepListing, SweepRecord } from '../../../shared/schemas/api/sweeps';

export const sweepsQueryKey = (projectId: number) => ['projects', projectId, 'sweeps'] as const;

export const getProjectSweeps = (projectId: number) => apiFetch<z.infer<typeof sweepListResponse>>(`/projects/${projectId}/sweeps`);

/** The project's sweeps for the overview and the sweeps pages, followed while any point still waits or runs. */
export const projectSweepsQueryOptions = (projectId: number) =>
  queryOptions({
    queryKey: sweepsQueryKey(projectId),
    queryFn: () => getProjectSweeps(projectId),
    retry: false,
    staleTime: 0,
    refetchInterval: (query) => (query.state.data?.sweeps.some((s) => !s.progress.finished) ? 2000 : false),
  });

export const useProjectSweeps = (projectId: number) => useQuery(projectSweepsQueryOptions(projectId));

export const getSweep = (projectId: number, sweepId: number) => apiFetch<z.infer<typeof sweepResponse>>(`/projects/${projectId}/sweeps/${sweepId}`);

/** Polls every second while a point waits or runs, then stops: finished runs never change. */
export const sweepQueryOptions = (projectId: number, sweepId: number) =>
  queryOptions({
    queryKey: [...sweepsQueryKey(projectId), sweepId],
    queryFn: () => getSweep(projectId, sweepId),
    retry: false,
    refetchInterval: (query) => (query.state.data && query.state.data.sweep.progress.finished ? false : 1000),
  });

export const useSweep = (projectId: number, sweepId: number) => useQuery(sweepQueryOptions(projectId, sweepId));
