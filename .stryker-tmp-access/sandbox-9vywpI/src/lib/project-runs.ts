// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ComparableResults } from '../../shared/report/summary-table';
import type { SweepPointValues } from '../../shared/sweep';
import { apiFetch } from './api-client';

export type RunStatus = 'queued' | 'running' | 'done' | 'failed' | 'cancelled';

/** A run as the project's run list gives it: totals only, no per-month tables. */
export interface RunListing {
  id: number;
  scenarioId: number | null;
  climateFileId: number | null;
  status: RunStatus;
  /** 0…1 while running */
  progress: number;
  error: string | null;
  /** Set when the run is one point of a sweep, with that sweep's name and the swept inputs' values here. */
  sweepId: number | null;
  sweepName: string | null;
  sweepPoint: SweepPointValues | null;
  createdAt: string | number;
  finishedAt: string | number | null;
  scenario: { name: string; system: { kind: string } };
  climate: { name: string; hours: number; site: { name: string } };
  /** The engine that made (or will make) the run, e.g. "scenario-engine 2.0.0". */
  engineVersion: string;
  /** Totals only (the figures a comparison reads); hours carry the "of which" counts from scenario-engine 2.0.0 on. */
  results: ComparableResults | null;
}

export const getProjectRuns = (projectId: number) => apiFetch<{ runs: RunListing[] }>(`/projects/${projectId}/runs`);

/**
 * The project's runs, one cache entry for the overview, the compare page and the scenario editor:
 * read afresh on every visit, and followed while any run is still waiting or computing.
 */
export const projectRunsQueryOptions = (projectId: number) =>
  queryOptions({
    queryKey: ['projects', projectId, 'runs'],
    queryFn: () => getProjectRuns(projectId),
    retry: false,
    staleTime: 0,
    refetchInterval: (query) => (query.state.data?.runs.some((r) => r.status === 'queued' || r.status === 'running') ? 2000 : false),
  });

export const useProjectRuns = (projectId: number) => useQuery(projectRunsQueryOptions(projectId));
