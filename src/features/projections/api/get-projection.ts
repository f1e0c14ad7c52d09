import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ChangeFactors, MonthlyClimate } from '../../../../shared/morphing';
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

/** How a projection was made (server/routes/projections.ts Derivation). */
export interface Derivation {
  kind: 'projection';
  method: string;
  citation: string;
  note: string;
  humidityQuantity: 'specific humidity';
  parent: { id: number; name: string; sha256: string; hours: number };
  source: string | null;
  factors: ChangeFactors;
  utcOffsetMinutes: number;
  alphaByMonth: number[];
  clampedHighHours: number;
  clampedLowHours: number;
  lostHours: number;
  comparison: { parent: MonthlyClimate; projection: MonthlyClimate };
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
