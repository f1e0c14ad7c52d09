import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { ClimateHoursJson } from '@/lib/climate-series';
import { climateFilesQueryKey } from '@/lib/api/climate-files';

/** The stored hourly series, SI; humidity in the unit of its kind (%, °C or kg/kg). */
export interface ClimateFileHours extends ClimateHoursJson {
  /** 0 measured, 1 filled, 2 missing */
  flags: number[];
}

export const getClimateFileHours = (projectId: number, fileId: number) => apiFetch<ClimateFileHours>(`/projects/${projectId}/climate-files/${fileId}/hours`);

export const climateFileHoursQueryOptions = (projectId: number, fileId: number) =>
  queryOptions({
    queryKey: [...climateFilesQueryKey(projectId), fileId, 'hours'],
    queryFn: () => getClimateFileHours(projectId, fileId),
    retry: false,
    staleTime: Infinity,
  });

export const useClimateFileHours = (projectId: number, fileId: number) => useQuery(climateFileHoursQueryOptions(projectId, fileId));
