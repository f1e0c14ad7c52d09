// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

export type ProjectRole = 'owner' | 'engineer' | 'viewer';
export const projectRoles: ProjectRole[] = ['owner', 'engineer', 'viewer'];

export interface Member {
  userId: number;
  name: string;
  email: string;
  role: ProjectRole;
}

export interface MembersAnswer {
  project: { id: number; name: string };
  yourRole: ProjectRole;
  canManage: boolean;
  members: Member[];
}

export const getMembers = (projectId: number) => apiFetch<MembersAnswer>(`/projects/${projectId}/members`);

export const membersQueryOptions = (projectId: number) =>
  queryOptions({ queryKey: ['projects', projectId, 'members'], queryFn: () => getMembers(projectId), retry: false });

export const useMembers = (projectId: number) => useQuery(membersQueryOptions(projectId));
