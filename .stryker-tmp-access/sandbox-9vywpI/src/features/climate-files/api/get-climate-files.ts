// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

/** The listing row of a climate file (without mapping and report). */
export interface ClimateFileListing {
  id: number;
  projectId: number;
  siteId: number;
  siteName: string;
  name: string;
  originalFileName: string;
  byteSize: number;
  sha256: string;
  humidityKind: string;
  hasPressure: boolean;
  hours: number;
  measuredHours: number;
  filledHours: number;
  missingHours: number;
  firstHourMs: number;
  lastHourMs: number;
  /** Calendar years the file covers, counted on the file's own clock (an hour ending at midnight belongs to the day before). */
  years: number[];
  /** For a future-climate projection: the file it was made from (null once that file is deleted). */
  parentId: number | null;
  /** For a future-climate projection: its method and the parent's name; null for an upload. */
  projection: { method: string; parentName: string } | null;
  createdAt: string | number;
}

export const climateFilesQueryKey = (projectId: number) => ['projects', projectId, 'climate-files'] as const;

export const getClimateFiles = (projectId: number) => apiFetch<{ climateFiles: ClimateFileListing[] }>(`/projects/${projectId}/climate-files`);

export const climateFilesQueryOptions = (projectId: number) =>
  queryOptions({ queryKey: climateFilesQueryKey(projectId), queryFn: () => getClimateFiles(projectId), retry: false });

export const useClimateFiles = (projectId: number) => useQuery(climateFilesQueryOptions(projectId));
