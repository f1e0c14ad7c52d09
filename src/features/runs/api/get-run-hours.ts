import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

export interface RunHours {
  modeNames: string[];
  /** One mode code per hour of the climate file: 0 free, 1 adiabatic, 2 mechanical, 3 no data. */
  modes: number[];
  mechanicalFraction: number[];
  /** 1 for a humidified free-cooling hour; null for runs made before engine 2.0.0. */
  humidified: number[] | null;
}

export const getRunHours = (projectId: number, runId: number) => apiFetch<RunHours>(`/projects/${projectId}/runs/${runId}/hours`);

export const runHoursQueryOptions = (projectId: number, runId: number) =>
  queryOptions({ queryKey: ['projects', projectId, 'runs', runId, 'hours'], queryFn: () => getRunHours(projectId, runId), staleTime: Infinity });

export const useRunHours = (projectId: number, runId: number, ready: boolean) => useQuery({ ...runHoursQueryOptions(projectId, runId), enabled: ready });
