import { MembersPage } from '@/features/members/components/members-page';

/** /projects/:projectId/members */
export function MembersRoute() {
  return <MembersPage />;
}
