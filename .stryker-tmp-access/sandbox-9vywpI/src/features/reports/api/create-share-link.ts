// @ts-nocheck
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { shareLinksQueryOptions, type ShareLink } from './list-share-links';

export interface NewShareLink {
  target: 'run' | 'comparison';
  /** The baseline first for a comparison. */
  runIds: number[];
  title: string;
  /** ISO date-time; null keeps the link for signed-in members of the project. */
  publicUntil: string | null;
}

export const createShareLink = (projectId: number, input: NewShareLink) =>
  apiFetch<{ link: ShareLink; token: string; path: string }>(`/projects/${projectId}/share-links`, { method: 'POST', body: JSON.stringify(input) });

export function useCreateShareLink(projectId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: NewShareLink) => createShareLink(projectId, input),
    onSuccess: () => client.invalidateQueries({ queryKey: shareLinksQueryOptions(projectId).queryKey }),
  });
}
