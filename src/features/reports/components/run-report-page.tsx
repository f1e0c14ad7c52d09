import { useState } from 'react';
import { useParams } from 'react-router-dom';
import { runDownloadLinks } from '@/components/ui/download-menu';
import { useProjectRole } from '@/lib/api/projects';
import { LocalUnitSystem, useUnitSystem } from '@/lib/unit-system';
import { useRunReport } from '../api/get-run-report';
import { ReportError, ReportLoading } from './report-states';
import { ReportToolbar } from './report-toolbar';
import { RunReportDocument } from './run-report-document';
import { ShareLinksPanel } from './share-links-panel';

/** /projects/:projectId/runs/:runId/report — the printable report of one run. */
export function RunReportPage() {
  // The report's unit switch sets the report's units only, not the person's setting (issue 17).
  return (
    <LocalUnitSystem>
      <RunReportPageBody />
    </LocalUnitSystem>
  );
}

function RunReportPageBody() {
  const params = useParams();
  const projectId = Number(params.projectId);
  const runId = Number(params.runId);
  const query = useRunReport(projectId, runId);
  const { role } = useProjectRole(projectId);
  const [sharing, setSharing] = useState(false);
  const { unitSystem } = useUnitSystem();
  if (query.isPending) return <ReportLoading />;
  if (query.isError) return <ReportError error={query.error} what="This report" />;
  const { report } = query.data;
  return (
    <div>
      <ReportToolbar
        back={{ to: `/projects/${projectId}/runs/${runId}`, label: 'Back to the run' }}
        downloads={runDownloadLinks(`/api/projects/${projectId}/runs/${runId}/downloads`, unitSystem)}
        share={role === 'owner' ? { open: sharing, toggle: () => setSharing((open) => !open) } : undefined}
      />
      {sharing && <ShareLinksPanel projectId={projectId} target="run" runIds={[runId]} defaultTitle={`${report.run.scenario.name}: run ${runId}`} />}
      <RunReportDocument report={report} downloadBase={`/api/projects/${projectId}/runs/${runId}/downloads`} />
    </div>
  );
}
