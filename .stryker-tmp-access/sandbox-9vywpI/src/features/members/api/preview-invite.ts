// @ts-nocheck
import { useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import type { ProjectRole } from './get-members';

export interface InvitePreview {
  projectId: number;
  projectName: string;
  role: ProjectRole;
  email: string;
  invitedBy: string | null;
  expiresAt: string;
  /** Whether the person opening the link is signed in; signed out, `forYou` is false and the page offers sign-in. */
  signedIn: boolean;
  forYou: boolean;
}

// A POST so the token stays out of server logs of query strings; it changes nothing.
export const previewInvite = (token: string) => apiFetch<InvitePreview>('/invites/preview', { method: 'POST', body: JSON.stringify({ token }) });

export const useInvitePreview = (token: string, enabled: boolean) =>
  useQuery({ queryKey: ['invite-preview', token], queryFn: () => previewInvite(token), enabled, retry: false });
