import { useParams } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { runDownloadLinks } from '@/components/ui/download-menu';
import { ApiError } from '@/lib/api-client';
import { LocalUnitSystem, useUnitSystem } from '@/lib/unit-system';
import { useSharedReport } from '../api/get-shared-report';
import { comparisonDownloadLinks } from '../lib/report-downloads';
import { ComparisonReportDocument } from './comparison-report-document';
import { ReportLoading } from './report-states';
import { ReportToolbar } from './report-toolbar';
import { RunReportDocument } from './run-report-document';

function Refused({ error, token }: { error: Error; token: string }) {
  const status = error instanceof ApiError ? error.status : 0;
  const signIn = `/sign-in?returnTo=${encodeURIComponent(`/shared/${token}`)}`;
  const title =
    status === 410
      ? 'This link was revoked'
      : status === 401
        ? 'Sign in to see this report'
        : status === 403
          ? 'This report is for the project’s members'
          : status === 404
            ? 'This link is not known'
            : 'The report could not be opened';
  return (
    <div className="mx-auto max-w-xl py-8" data-testid="shared-refused">
      <Notice tone={status === 401 ? 'info' : 'bad'} title={title}>
        <p>{error.message}</p>
        {status === 401 && (
          <p className="mt-2">
            <a href={signIn} className="inline-block rounded bg-harbour px-3 py-1.5 text-paper hover:bg-harbour-soft">
              Sign in
            </a>
          </p>
        )}
      </Notice>
    </div>
  );
}

/** /shared/:token — a report someone shared read-only: public until a date, or for the project's members. */
export function SharedReportPage() {
  // The report's unit switch sets the report's units only, not the person's setting (issue 17).
  return (
    <LocalUnitSystem>
      <SharedReportPageBody />
    </LocalUnitSystem>
  );
}

function SharedReportPageBody() {
  const token = useParams().token ?? '';
  const query = useSharedReport(token);
  const { unitSystem } = useUnitSystem();
  if (query.isPending) return <ReportLoading />;
  if (query.isError) return <Refused error={query.error} token={token} />;
  const { link, report } = query.data;
  const base = `/api/shared/${encodeURIComponent(token)}/downloads`;
  const downloads =
    report.kind === 'run'
      ? runDownloadLinks(base, unitSystem)
      : comparisonDownloadLinks(
          base,
          '',
          report.runs.map((r) => ({ runId: r.id, href: `${base}/hourly.csv?run=${r.id}` })),
          unitSystem,
        );
  return (
    <div>
      <ReportToolbar downloads={downloads} />
      <p className="mx-auto mb-3 max-w-[62rem] text-xs text-ink-soft print:hidden" data-testid="shared-note">
        A read-only report shared from Tramontane
        {link.publicUntil ? `, open to anyone with the link until ${link.publicUntil.slice(0, 10)}` : ' with the members of its project'}.
      </p>
      {report.kind === 'run' ? (
        <RunReportDocument report={report} linkTitle={link.title} downloadBase={base} />
      ) : (
        <ComparisonReportDocument report={report} linkTitle={link.title} />
      )}
    </div>
  );
}
