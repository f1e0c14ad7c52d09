import { AcceptInvitePage } from '@/features/members/components/accept-invite-page';

/** /invites/accept — open signed out too: the page names the project and the inviter, then offers sign-in. */
export function AcceptInviteRoute() {
  return <AcceptInvitePage />;
}
