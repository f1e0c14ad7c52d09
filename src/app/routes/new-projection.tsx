import { NewProjectionPage } from '@/features/projections/components/new-projection-page';

/** /projects/:projectId/projections/new — a future-climate file from a stored one. */
export function NewProjectionRoute() {
  return <NewProjectionPage />;
}
