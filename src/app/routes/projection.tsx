import { ProjectionPage } from '@/features/projections/components/projection-page';

/** /projects/:projectId/projections/:fileId */
export function ProjectionRoute() {
  return <ProjectionPage />;
}
