import { ComparePage } from '@/features/compare/components/compare-page';

/** /projects/:projectId/compare — runs side by side. */
export function CompareRoute() {
  return <ComparePage />;
}
