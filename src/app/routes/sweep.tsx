import { SweepPage } from '@/features/sweeps/components/sweep-page';

/** /projects/:projectId/sweeps/:sweepId */
export function SweepRoute() {
  return <SweepPage />;
}
