// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { ProjectRole } from './get-members';

export interface Invite {
  id: number;
  email: string;
  role: ProjectRole;
  invitedBy: string | null;
  createdAt: string;
  expiresAt: string;
  status: 'pending' | 'accepted' | 'revoked' | 'expired';
}

export const getInvites = (projectId: number) => apiFetch<{ invites: Invite[] }>(`/projects/${projectId}/invites`);

export const invitesQueryOptions = (projectId: number) =>
  queryOptions({ queryKey: ['projects', projectId, 'invites'], queryFn: () => getInvites(projectId), retry: false });

export const useInvites = (projectId: number, enabled: boolean) => useQuery({ ...invitesQueryOptions(projectId), enabled });
