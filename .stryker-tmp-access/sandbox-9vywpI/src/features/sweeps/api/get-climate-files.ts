// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

export interface SweepClimateFile {
  id: number;
  siteName: string;
  name: string;
  hours: number;
  /** The site's elevation, m: the envelope's maximum dry-bulb is derated for it. */
  siteElevationM: number;
}

export const getClimateFiles = (projectId: number) => apiFetch<{ climateFiles: SweepClimateFile[] }>(`/projects/${projectId}/climate-files`);

export const climateFilesQueryOptions = (projectId: number) =>
  queryOptions({ queryKey: ['projects', projectId, 'climate-files'], queryFn: () => getClimateFiles(projectId) });

export const useClimateFiles = (projectId: number) => useQuery(climateFilesQueryOptions(projectId));
