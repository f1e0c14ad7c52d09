// @ts-nocheck
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { shareLinksQueryOptions, type ShareLink } from './list-share-links';

export const revokeShareLink = (projectId: number, linkId: number) =>
  apiFetch<{ link: ShareLink }>(`/projects/${projectId}/share-links/${linkId}/revoke`, { method: 'POST' });

export function useRevokeShareLink(projectId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (linkId: number) => revokeShareLink(projectId, linkId),
    onSuccess: () => client.invalidateQueries({ queryKey: shareLinksQueryOptions(projectId).queryKey }),
  });
}
