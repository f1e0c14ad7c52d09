import { RunPage } from '@/features/runs/components/run-page';

/** /projects/:projectId/runs/:runId — one run. */
export function RunRoute() {
  return <RunPage />;
}
