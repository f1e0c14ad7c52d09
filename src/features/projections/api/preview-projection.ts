import { useMutation } from '@tanstack/react-query';
import type { ProjectionRequest } from '../../../../shared/morphing';
import { apiFetch } from '@/lib/api-client';
import type { ProjectionPreview } from '../../../../shared/schemas/api/studies';
export type { ProjectionPreview } from '../../../../shared/schemas/api/studies';

/** The monthly statistics a projection would have, computed on the server, nothing stored. */
export const previewProjection = (projectId: number, fileId: number, request: ProjectionRequest) =>
  apiFetch<ProjectionPreview>(`/projects/${projectId}/climate-files/${fileId}/projections/preview`, { method: 'POST', body: JSON.stringify(request) });

export const usePreviewProjection = (projectId: number, fileId: number) =>
  useMutation({ mutationFn: (request: ProjectionRequest) => previewProjection(projectId, fileId, request) });
