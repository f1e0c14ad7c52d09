import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { HumidityKind } from '../../../../shared/psychrometrics';

/** The cleaned hourly series of a climate file, SI; a missing value arrives as null. */
export interface ClimateHours {
  humidityKind: HumidityKind;
  timestampsMs: number[];
  dryBulbC: (number | null)[];
  humidity: (number | null)[];
  pressurePa: (number | null)[] | null;
  flags: number[];
}

export const getClimateHours = (projectId: number, fileId: number) => apiFetch<ClimateHours>(`/projects/${projectId}/climate-files/${fileId}/hours`);

export const climateHoursQueryOptions = (projectId: number, fileId: number) =>
  queryOptions({
    queryKey: ['projects', projectId, 'climate-files', fileId, 'hours'],
    queryFn: () => getClimateHours(projectId, fileId),
    staleTime: Infinity,
  });

export const useClimateHours = (projectId: number, fileId: number | null, ready: boolean) =>
  useQuery({ ...climateHoursQueryOptions(projectId, fileId ?? 0), enabled: ready && fileId !== null });
