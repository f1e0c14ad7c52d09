// @ts-nocheck
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Derivation, ProjectionRequest } from '../../../../shared/morphing';
import { apiFetch } from '@/lib/api-client';
import type { ProjectionFileListing } from './get-projection';

/** Stores the projection as a new climate file on the parent's site. */
export const createProjection = (projectId: number, fileId: number, request: ProjectionRequest) =>
  apiFetch<{ climateFile: ProjectionFileListing; derivation: Derivation }>(`/projects/${projectId}/climate-files/${fileId}/projections`, {
    method: 'POST',
    body: JSON.stringify(request),
  });

export function useCreateProjection(projectId: number, fileId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (request: ProjectionRequest) => createProjection(projectId, fileId, request),
    // Every list of the project's climate files (overview, site, pickers) shows the new file.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ['projects', projectId, 'climate-files'] }),
        queryClient.invalidateQueries({ queryKey: ['projects', projectId, 'projections'] }),
      ]),
  });
}
