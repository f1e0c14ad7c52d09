// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SweepAxis, SweepProgress, SweepValue } from '../../shared/sweep';
import { apiFetch } from './api-client';

/** A sweep as the project's sweep list gives it: what was swept and how far it has got, no results. */
export interface SweepListing {
  id: number;
  projectId: number;
  name: string;
  baseScenarioId: number | null;
  climateFileId: number | null;
  createdBy: number | null;
  createdAt: string | number;
  axes: (SweepAxis & { values: SweepValue[] })[];
  climate: { name: string; siteName: string };
  progress: SweepProgress;
}

export const getProjectSweeps = (projectId: number) => apiFetch<{ sweeps: SweepListing[] }>(`/projects/${projectId}/sweeps`);

/** The project's sweeps for the overview and the sweeps pages, followed while any point still waits or runs. */
export const projectSweepsQueryOptions = (projectId: number) =>
  queryOptions({
    queryKey: ['projects', projectId, 'sweeps'],
    queryFn: () => getProjectSweeps(projectId),
    retry: false,
    staleTime: 0,
    refetchInterval: (query) => (query.state.data?.sweeps.some((s) => !s.progress.finished) ? 2000 : false),
  });

export const useProjectSweeps = (projectId: number) => useQuery(projectSweepsQueryOptions(projectId));
