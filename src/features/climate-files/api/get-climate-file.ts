import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { climateFilesQueryKey } from '@/lib/api/climate-files';
import type { ClimateFileDetail } from '../../../../shared/schemas/api';
export type { Site as ClimateFileSite, ClimateFileDetail } from '../../../../shared/schemas/api';

export const getClimateFile = (projectId: number, fileId: number) => apiFetch<ClimateFileDetail>(`/projects/${projectId}/climate-files/${fileId}`);

export const climateFileQueryOptions = (projectId: number, fileId: number) =>
  queryOptions({
    queryKey: [...climateFilesQueryKey(projectId), fileId],
    queryFn: () => getClimateFile(projectId, fileId),
    retry: false,
  });

export const useClimateFile = (projectId: number, fileId: number) => useQuery(climateFileQueryOptions(projectId, fileId));
