import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { ShareLink } from '../../../../shared/schemas/api/reports';
export type { ShareState, ShareLink } from '../../../../shared/schemas/api/reports';

export const listShareLinks = (projectId: number) => apiFetch<{ links: ShareLink[] }>(`/projects/${projectId}/share-links`);

export const shareLinksQueryOptions = (projectId: number) =>
  queryOptions({ queryKey: ['projects', projectId, 'share-links'], queryFn: () => listShareLinks(projectId), retry: false });

export const useShareLinks = (projectId: number, enabled: boolean) => useQuery({ ...shareLinksQueryOptions(projectId), enabled });
