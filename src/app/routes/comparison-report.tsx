import { ComparisonReportPage } from '@/features/reports/components/comparison-report-page';

/** /projects/:projectId/compare/report — the print-ready comparison. */
export function ComparisonReportRoute() {
  return <ComparisonReportPage />;
}
