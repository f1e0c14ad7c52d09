import { useMemo, useState } from 'react';
import { useParams, useSearchParams } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { useProjectRole } from '@/lib/api/projects';
import { LocalUnitSystem, useUnitSystem } from '@/lib/unit-system';
import { comparisonSearch, useComparisonReport } from '../api/get-comparison-report';
import { ComparisonReportDocument } from './comparison-report-document';
import { comparisonDownloadLinks } from '../lib/report-downloads';
import { ReportError, ReportLoading } from './report-states';
import { ReportToolbar } from './report-toolbar';
import { ShareLinksPanel } from './share-links-panel';

const idList = (text: string | null) =>
  text
    ? text
        .split(',')
        .map(Number)
        .filter((n) => Number.isInteger(n) && n > 0)
    : [];

/** /projects/:projectId/compare/report?runs=1,2&baseline=1 — the printable comparison. */
export function ComparisonReportPage() {
  // The report's unit switch sets the report's units only, not the person's setting (issue 17).
  return (
    <LocalUnitSystem>
      <ComparisonReportPageBody />
    </LocalUnitSystem>
  );
}

function ComparisonReportPageBody() {
  const projectId = Number(useParams().projectId);
  const [search] = useSearchParams();
  const runsParam = search.get('runs');
  const runIds = useMemo(() => [...new Set(idList(runsParam))], [runsParam]);
  const baselineParam = Number(search.get('baseline'));
  const baselineId = runIds.includes(baselineParam) ? baselineParam : (runIds[0] ?? 0);
  const enough = runIds.length >= 2;
  const query = useComparisonReport(projectId, runIds, baselineId);
  const { role } = useProjectRole(projectId);
  const [sharing, setSharing] = useState(false);
  const { unitSystem } = useUnitSystem();
  if (!enough) {
    return (
      <div className="mx-auto max-w-[62rem]">
        <Notice title="Pick two or more runs">Open Compare, tick the runs and choose a baseline, then press Report.</Notice>
      </div>
    );
  }
  if (query.isPending) return <ReportLoading />;
  if (query.isError) return <ReportError error={query.error} what="This comparison" />;
  const { report } = query.data;
  const ordered = report.runs.map((r) => r.id);
  const q = `?${comparisonSearch(runIds, baselineId)}`;
  return (
    <div>
      <ReportToolbar
        back={{ to: `/projects/${projectId}/compare${q}`, label: 'Back to compare' }}
        downloads={comparisonDownloadLinks(
          `/api/projects/${projectId}/compare/downloads`,
          q,
          ordered.map((runId) => ({ runId, href: `/api/projects/${projectId}/runs/${runId}/downloads/hourly.csv` })),
          unitSystem,
        )}
        share={role === 'owner' ? { open: sharing, toggle: () => setSharing((open) => !open) } : undefined}
      />
      {sharing && <ShareLinksPanel projectId={projectId} target="comparison" runIds={ordered} defaultTitle={`Comparison of runs ${ordered.join(', ')}`} />}
      <ComparisonReportDocument report={report} />
    </div>
  );
}
