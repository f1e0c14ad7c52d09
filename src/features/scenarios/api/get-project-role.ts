import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

type Role = 'owner' | 'engineer' | 'viewer';

const getMyProjects = () => apiFetch<{ projects: { id: number; name: string; role: Role }[] }>('/projects');

/** The signed-in person's role in a project, read from their project list (the same cache entry as the projects page). */
export const projectRoleQueryOptions = () => queryOptions({ queryKey: ['projects'], queryFn: getMyProjects, retry: false });

export function useProjectRole(projectId: number): { role: Role | undefined; canEdit: boolean; projectName: string | undefined } {
  const query = useQuery(projectRoleQueryOptions());
  const project = query.data?.projects.find((p) => p.id === projectId);
  return { role: project?.role, canEdit: project?.role === 'owner' || project?.role === 'engineer', projectName: project?.name };
}
