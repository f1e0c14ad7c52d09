/** Climate files of a project: the one listing every page reads, under one key. Types from shared/schemas/api. */
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { z } from 'zod';
import type { climateFileListResponse } from '../../../shared/schemas/api/climate-files';
import { apiFetch } from '../api-client';

export type { ClimateFileListing, ListedClimateFile } from '../../../shared/schemas/api/climate-files';

export const climateFilesQueryKey = (projectId: number) => ['projects', projectId, 'climate-files'] as const;

export const getClimateFiles = (projectId: number) => apiFetch<z.infer<typeof climateFileListResponse>>(`/projects/${projectId}/climate-files`);

export const climateFilesQueryOptions = (projectId: number) =>
  queryOptions({ queryKey: climateFilesQueryKey(projectId), queryFn: () => getClimateFiles(projectId), retry: false });

export const useClimateFiles = (projectId: number) => useQuery(climateFilesQueryOptions(projectId));
