import { queryOptions, useQuery } from '@tanstack/react-query';
import type { DetectedMapping, ImportReport } from '../../../../shared/climate/types';
import type { ClimateSummary } from '../../../../shared/climate-summary';
import { apiFetch } from '@/lib/api-client';
import { climateFilesQueryKey, type ClimateFileListing } from '@/lib/api/climate-files';

export interface ClimateFileSite {
  id: number;
  name: string;
  latitude: number | null;
  longitude: number | null;
  elevationM: number;
  timeZone: string;
}

export interface ClimateFileDetail {
  climateFile: ClimateFileListing;
  site: ClimateFileSite;
  mapping: DetectedMapping;
  report: ImportReport;
  summary: ClimateSummary;
}

export const getClimateFile = (projectId: number, fileId: number) => apiFetch<ClimateFileDetail>(`/projects/${projectId}/climate-files/${fileId}`);

export const climateFileQueryOptions = (projectId: number, fileId: number) =>
  queryOptions({
    queryKey: [...climateFilesQueryKey(projectId), fileId],
    queryFn: () => getClimateFile(projectId, fileId),
    retry: false,
  });

export const useClimateFile = (projectId: number, fileId: number) => useQuery(climateFileQueryOptions(projectId, fileId));
