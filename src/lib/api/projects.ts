/** Projects: the person's list with their role, creating one, and a project's storage. Types from shared/schemas/api. */
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { projectCreatedResponse, projectListResponse, projectStorageResponse } from '../../../shared/schemas/api/projects';
import type { ProjectRole } from '../../../shared/schemas/api/common';
import { apiFetch } from '../api-client';

export type { ProjectRole } from '../../../shared/schemas/api/common';
export type { ProjectStorage, ProjectSummary } from '../../../shared/schemas/api/projects';

export const projectsQueryKey = ['projects'] as const;

export const getProjects = () => apiFetch<z.infer<typeof projectListResponse>>('/projects');

/** The signed-in person's projects with their role in each; one cache entry for every screen. */
export const projectsQueryOptions = () => queryOptions({ queryKey: projectsQueryKey, queryFn: getProjects, retry: false });

export const useProjects = () => useQuery(projectsQueryOptions());

/**
 * The signed-in person's role in a project, read from their project list. The server checks every
 * change itself; this only decides which actions a screen offers and why others are disabled.
 */
export function useProjectRole(projectId: number): { role: ProjectRole | undefined; canEdit: boolean; projectName: string | undefined } {
  const query = useQuery(projectsQueryOptions());
  const project = query.data?.projects.find((p) => p.id === projectId);
  return { role: project?.role, canEdit: project?.role === 'owner' || project?.role === 'engineer', projectName: project?.name };
}

export interface NewProject {
  name: string;
  description: string;
}

export const createProject = (input: NewProject) =>
  apiFetch<z.infer<typeof projectCreatedResponse>>('/projects', { method: 'POST', body: JSON.stringify(input) });

export function useCreateProject() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createProject,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: projectsQueryKey }),
  });
}

export const getProjectStorage = (projectId: number) => apiFetch<z.infer<typeof projectStorageResponse>>(`/projects/${projectId}/storage`);

export const projectStorageQueryOptions = (projectId: number) =>
  queryOptions({ queryKey: ['projects', projectId, 'storage'], queryFn: () => getProjectStorage(projectId), retry: false });

export const useProjectStorage = (projectId: number) => useQuery(projectStorageQueryOptions(projectId));
