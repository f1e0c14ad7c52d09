import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

import type { Invite } from '../../../../shared/schemas/api/people';
export type { Invite } from '../../../../shared/schemas/api/people';

export const getInvites = (projectId: number) => apiFetch<{ invites: Invite[] }>(`/projects/${projectId}/invites`);

export const invitesQueryOptions = (projectId: number) =>
  queryOptions({ queryKey: ['projects', projectId, 'invites'], queryFn: () => getInvites(projectId), retry: false });

export const useInvites = (projectId: number, enabled: boolean) => useQuery({ ...invitesQueryOptions(projectId), enabled });
