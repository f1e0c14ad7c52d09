import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { ProjectRole, ProjectMembers as MembersAnswer } from '../../../../shared/schemas/api';
export type { ProjectRole, ProjectMembers as MembersAnswer } from '../../../../shared/schemas/api';

export const projectRoles: ProjectRole[] = ['owner', 'engineer', 'viewer'];

/** One member of the project as the members list gives them. */
export type Member = MembersAnswer['members'][number];

export const getMembers = (projectId: number) => apiFetch<MembersAnswer>(`/projects/${projectId}/members`);

export const membersQueryOptions = (projectId: number) =>
  queryOptions({ queryKey: ['projects', projectId, 'members'], queryFn: () => getMembers(projectId), retry: false });

export const useMembers = (projectId: number) => useQuery(membersQueryOptions(projectId));
