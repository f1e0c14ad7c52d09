import { ExcursionsPage } from '@/features/excursions/components/excursions-page';

/** /projects/:projectId/runs/:runId/excursions — inlet excursions of a run. */
export function ExcursionsRoute() {
  return <ExcursionsPage />;
}
