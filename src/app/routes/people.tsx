import { PeoplePage } from '@/features/members/components/people-page';

/** /admin/people */
export function PeopleRoute() {
  return <PeoplePage />;
}
