// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

export type ShareState = 'members' | 'public' | 'public-ended' | 'revoked';

export interface ShareLink {
  id: number;
  target: 'run' | 'comparison';
  runIds: number[];
  title: string;
  publicUntil: string | null;
  createdAt: string;
  createdByName: string | null;
  revokedAt: string | null;
  state: ShareState;
}

export const listShareLinks = (projectId: number) => apiFetch<{ links: ShareLink[] }>(`/projects/${projectId}/share-links`);

export const shareLinksQueryOptions = (projectId: number) =>
  queryOptions({ queryKey: ['projects', projectId, 'share-links'], queryFn: () => listShareLinks(projectId), retry: false });

export const useShareLinks = (projectId: number, enabled: boolean) => useQuery({ ...shareLinksQueryOptions(projectId), enabled });
