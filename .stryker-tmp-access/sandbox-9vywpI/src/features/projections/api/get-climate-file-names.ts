// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { ProjectionFileListing } from './get-projection';

export const getClimateFileNames = (projectId: number) => apiFetch<{ climateFiles: ProjectionFileListing[] }>(`/projects/${projectId}/climate-files`);

/** The project's climate files (the listing the climate-file pages read, under its own key). */
export const climateFileNamesQueryOptions = (projectId: number) =>
  queryOptions({ queryKey: ['projects', projectId, 'projections', 'climate-files'], queryFn: () => getClimateFileNames(projectId), retry: false });

export const useClimateFileNames = (projectId: number) => useQuery(climateFileNamesQueryOptions(projectId));
