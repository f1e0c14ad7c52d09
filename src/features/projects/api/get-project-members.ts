import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { ProjectMembers } from '../../../../shared/schemas/api';
export type { ProjectRole, ProjectMembers } from '../../../../shared/schemas/api';

export const getProjectMembers = (projectId: number) => apiFetch<ProjectMembers>(`/projects/${projectId}/members`);

export const projectMembersQueryOptions = (projectId: number) =>
  queryOptions({ queryKey: ['projects', projectId, 'members'], queryFn: () => getProjectMembers(projectId), retry: false });

export const useProjectMembers = (projectId: number) => useQuery(projectMembersQueryOptions(projectId));
