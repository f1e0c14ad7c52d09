import { RunReportPage } from '@/features/reports/components/run-report-page';

/** /projects/:projectId/runs/:runId/report — the print-ready report of a run. */
export function RunReportRoute() {
  return <RunReportPage />;
}
