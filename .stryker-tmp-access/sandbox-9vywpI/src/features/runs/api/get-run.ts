// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { Scenario } from '../../../../shared/scenario/schema';
import type { ScenarioResults } from '../../../../shared/scenario/run';
import type { SweepPointValues } from '../../../../shared/sweep';

export type RunStatus = 'queued' | 'running' | 'done' | 'failed' | 'cancelled';

/** The climate file as it was when the run was made. */
export interface RunClimate {
  id: number;
  name: string;
  sha256: string;
  hours: number;
  firstHourMs: number;
  lastHourMs: number;
  site: { id: number; name: string; elevationM: number; timeZone: string };
  elevationM: number;
  utcOffsetMinutes: number;
  /** The file was read with humidity over ice below 0 °C (import option); absent for runs made before the option. */
  humidityOverIce?: boolean;
}

export interface RunRecord {
  id: number;
  projectId: number;
  scenarioId: number | null;
  climateFileId: number | null;
  status: RunStatus;
  progress: number;
  error: string | null;
  engineVersion: string;
  /** Set when the run is one point of a sweep, with that sweep's name and the swept inputs' values here. */
  sweepId: number | null;
  sweepName: string | null;
  sweepPoint: SweepPointValues | null;
  createdAt: string;
  startedAt: string | null;
  finishedAt: string | null;
  scenario: Scenario;
  climate: RunClimate;
  results: ScenarioResults | null;
}

export const isFinished = (status: RunStatus | undefined) => status === 'done' || status === 'failed' || status === 'cancelled';

export const getRun = (projectId: number, runId: number) => apiFetch<{ run: RunRecord }>(`/projects/${projectId}/runs/${runId}`);

/** Polls once a second while the run is queued or running, then stops: a finished run never changes. */
export const runQueryOptions = (projectId: number, runId: number) =>
  queryOptions({
    queryKey: ['projects', projectId, 'runs', runId],
    queryFn: () => getRun(projectId, runId),
    refetchInterval: (query) => (isFinished(query.state.data?.run.status) ? false : 1000),
  });

export const useRun = (projectId: number, runId: number) => useQuery(runQueryOptions(projectId, runId));
