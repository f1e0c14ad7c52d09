import { SharedReportPage } from '@/features/reports/components/shared-report-page';

/** /shared/:token — a report opened through a share link. */
export function SharedReportRoute() {
  return <SharedReportPage />;
}
