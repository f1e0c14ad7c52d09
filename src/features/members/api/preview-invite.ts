import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';

import type { InvitePreview } from '../../../../shared/schemas/api/people';
export type { InvitePreview } from '../../../../shared/schemas/api/people';

// A POST so the token stays out of server logs of query strings; it changes nothing.
export const previewInvite = (token: string) => apiFetch<InvitePreview>('/invites/preview', { method: 'POST', body: JSON.stringify({ token }) });

export const useInvitePreview = (token: string, enabled: boolean) =>
  useQuery({ queryKey: ['invite-preview', token], queryFn: () => previewInvite(token), enabled, retry: false });
