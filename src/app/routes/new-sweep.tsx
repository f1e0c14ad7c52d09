import { NewSweepPage } from '@/features/sweeps/components/new-sweep-page';

/** /projects/:projectId/sweeps/new */
export function NewSweepRoute() {
  return <NewSweepPage />;
}
