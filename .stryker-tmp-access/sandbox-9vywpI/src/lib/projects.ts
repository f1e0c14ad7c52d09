// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from './api-client';

export type ProjectRole = 'owner' | 'engineer' | 'viewer';

export interface ProjectSummary {
  id: number;
  name: string;
  description: string;
  role: ProjectRole;
}

export const getProjects = () => apiFetch<{ projects: ProjectSummary[] }>('/projects');

/** The signed-in person's projects with their role in each; one cache entry for every screen. */
export const projectsQueryOptions = () => queryOptions({ queryKey: ['projects'], queryFn: getProjects, retry: false });

/**
 * The signed-in person's role in a project, read from their project list. The server checks every
 * change itself; this only decides which actions a screen offers and why others are disabled.
 */
export function useProjectRole(projectId: number): { role: ProjectRole | undefined; canEdit: boolean; projectName: string | undefined } {
  const query = useQuery(projectsQueryOptions());
  const project = query.data?.projects.find((p) => p.id === projectId);
  return { role: project?.role, canEdit: project?.role === 'owner' || project?.role === 'engineer', projectName: project?.name };
}
