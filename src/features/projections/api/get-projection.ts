import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { ProjectionRecord as ProjectionDetail } from '../../../../shared/schemas/api';
export type { ClimateFileListing as ProjectionFileListing, ProjectionRecord as ProjectionDetail } from '../../../../shared/schemas/api';

export const getProjection = (projectId: number, fileId: number) => apiFetch<ProjectionDetail>(`/projects/${projectId}/projections/${fileId}`);

export const projectionQueryOptions = (projectId: number, fileId: number) =>
  queryOptions({ queryKey: ['projects', projectId, 'projections', fileId], queryFn: () => getProjection(projectId, fileId), retry: false });

export const useProjection = (projectId: number, fileId: number) => useQuery(projectionQueryOptions(projectId, fileId));
