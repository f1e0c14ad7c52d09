// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

export interface ClimateFileListing {
  id: number;
  siteId: number;
  siteName: string;
  /** The site's elevation, m: the one a run on this file uses. */
  siteElevationM: number;
  name: string;
  hours: number;
  firstHourMs: number;
  lastHourMs: number;
}

export const getClimateFiles = (projectId: number) => apiFetch<{ climateFiles: ClimateFileListing[] }>(`/projects/${projectId}/climate-files`);

export const climateFilesQueryOptions = (projectId: number) =>
  queryOptions({ queryKey: ['projects', projectId, 'climate-files'], queryFn: () => getClimateFiles(projectId) });

export const useClimateFiles = (projectId: number) => useQuery(climateFilesQueryOptions(projectId));
