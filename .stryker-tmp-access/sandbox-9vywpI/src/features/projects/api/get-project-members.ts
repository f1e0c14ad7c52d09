// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

export type ProjectRole = 'owner' | 'engineer' | 'viewer';

export interface ProjectMembers {
  project: { id: number; name: string };
  yourRole: ProjectRole;
  canManage: boolean;
  members: Array<{ userId: number; name: string | null; email: string; role: ProjectRole }>;
}

export const getProjectMembers = (projectId: number) => apiFetch<ProjectMembers>(`/projects/${projectId}/members`);

export const projectMembersQueryOptions = (projectId: number) =>
  queryOptions({ queryKey: ['projects', projectId, 'members'], queryFn: () => getProjectMembers(projectId), retry: false });

export const useProjectMembers = (projectId: number) => useQuery(projectMembersQueryOptions(projectId));
