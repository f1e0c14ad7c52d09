// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Derivation } from '../../../../shared/morphing';
import { apiFetch } from '@/lib/api-client';

/** A climate file as lists give it, with what the projection pages need. */
export interface ProjectionFileListing {
  id: number;
  siteId: number;
  siteName: string;
  name: string;
  hours: number;
  missingHours: number;
  years: number[];
  parentId: number | null;
  projection: { method: string; parentName: string } | null;
}

export interface ProjectionDetail {
  climateFile: ProjectionFileListing;
  /** null once the parent file has been deleted. */
  parent: ProjectionFileListing | null;
  derivation: Derivation;
}

export const getProjection = (projectId: number, fileId: number) => apiFetch<ProjectionDetail>(`/projects/${projectId}/projections/${fileId}`);

export const projectionQueryOptions = (projectId: number, fileId: number) =>
  queryOptions({ queryKey: ['projects', projectId, 'projections', fileId], queryFn: () => getProjection(projectId, fileId), retry: false });

export const useProjection = (projectId: number, fileId: number) => useQuery(projectionQueryOptions(projectId, fileId));
