// @ts-nocheck
import type { FileInSet, ImportIssue, ImportReport } from '../../../../shared/climate/types';
import { csvRow } from '../../../../shared/csv';
import { ISSUES_LISTED } from '../../../../shared/climate/issue-log';
import { Notice } from '@/components/ui/notice';
import { humidityReadingWords } from '../../../../shared/report/humidity-reading';
import { wallClockReader, wallClockText } from '../../../../shared/time-zone';
import { formatBytes } from './progress-bar';

const severityStyle: Record<ImportIssue['severity'], string> = {
  error: 'text-signal-bad',
  warning: 'text-signal-warn',
  info: 'text-ink-soft',
};

/** The importer's validation report: outcome, counts, and every listed issue with line, column and value. */
export function ValidationReport({ report }: { report: ImportReport }) {
  const c = report.counts;
  const figures: Array<[string, number]> = [
    ['Hours in series', c.hours],
    ['Measured hours', c.measuredHours],
    ['Filled by interpolation', c.filledHours],
    ['Missing hours', c.missingHours],
    ['Gaps', c.gaps],
    ['Longest gap (h)', c.longestGapHours],
    ['Data rows read', c.rows],
    ['Rows rejected', c.rowsRejected],
    ['Unreadable cells', c.cellsUnreadable],
    ['Impossible values', c.impossibleValues],
    ['Duplicate timestamps', c.duplicateTimestamps],
    ['Rows averaged to hours', c.rowsAveraged],
    ['Non-hourly steps', c.nonHourlySteps],
    ['Daylight-saving jumps', c.daylightSavingJumps],
  ];
  const csvHref = `data:text/csv;charset=utf-8,${encodeURIComponent(
    [
      csvRow(['severity', 'kind', 'file', 'line', 'column', 'value', 'message']),
      ...report.issues.map((i) => csvRow([i.severity, i.kind, i.file ?? '', i.line ?? '', i.column ?? '', i.value ?? '', i.message])),
    ].join('\n'),
  )}`;
  return (
    <div className="space-y-3" data-testid="validation-report">
      <Notice
        tone={report.ok ? (report.counts.missingHours || report.issues.some((i) => i.severity === 'warning') ? 'warn' : 'info') : 'bad'}
        title={
          report.files
            ? report.ok
              ? `The ${report.files.length} files can be stored as one climate file`
              : 'The files cannot be stored as they are'
            : report.ok
              ? 'The file can be stored'
              : 'The file cannot be stored as it is'
        }
      >
        {report.summary}
        {report.timeLayout && <span className="block">Time: {report.timeLayout}.</span>}
        <span className="block" data-testid="report-humidity-reading">
          Relative humidity and dew point read {humidityReadingWords(report.humidityOverIce === true)}.
        </span>
        <span className="block">
          Gaps up to {report.maxGapHours} h are filled by linear interpolation and marked as filled; longer gaps stay missing and count as hours with no data.
        </span>
      </Notice>
      <dl className="grid grid-cols-2 gap-x-6 gap-y-1 text-sm sm:grid-cols-3 xl:grid-cols-5">
        {figures.map(([label, value]) => (
          <div key={label} className="flex justify-between gap-2 border-b border-rule/60 py-0.5">
            <dt className="text-ink-soft">{label}</dt>
            <dd className="num">{value.toLocaleString('en')}</dd>
          </div>
        ))}
      </dl>
      {report.files && <FilesOfSet files={report.files} timeZone={report.timeZone} />}
      {report.issues.length > 0 ? (
        <div className="overflow-x-auto">
          <table className="w-full text-left text-xs">
            <caption className="pb-1 text-left text-sm text-ink-soft" data-testid="issue-count">
              {report.fullIssueList ? (
                <>
                  Listed: the first {Math.min(ISSUES_LISTED, report.issues.length).toLocaleString('en')} of {report.fullIssueList.issues.toLocaleString('en')}{' '}
                  issues
                  {report.issues.length > ISSUES_LISTED && ', and the errors after them'}.{' '}
                  <a className="text-harbour underline" href={report.fullIssueList.path} download>
                    Download all {report.fullIssueList.issues.toLocaleString('en')} as CSV
                  </a>
                </>
              ) : (
                <>
                  {report.issues.length.toLocaleString('en')} {report.issues.length === 1 ? 'issue' : 'issues'} listed
                  {c.issuesNotListed > 0 && `, ${c.issuesNotListed.toLocaleString('en')} more not listed`}.{' '}
                  <a className="text-harbour underline" href={csvHref} download="climate-file-issues.csv">
                    Download as CSV
                  </a>
                </>
              )}
            </caption>
            <thead>
              <tr className="border-b border-rule text-ink-soft">
                <th scope="col" className="py-1 pr-2 font-medium">
                  Severity
                </th>
                {report.files && (
                  <th scope="col" className="pr-2 font-medium">
                    File
                  </th>
                )}
                <th scope="col" className="pr-2 font-medium">
                  Line
                </th>
                <th scope="col" className="pr-2 font-medium">
                  Column
                </th>
                <th scope="col" className="pr-2 font-medium">
                  Value
                </th>
                <th scope="col" className="font-medium">
                  What was found
                </th>
              </tr>
            </thead>
            <tbody>
              {report.issues.map((issue, k) => (
                <tr key={k} className="border-b border-rule/60 align-top">
                  <td className={`py-0.5 pr-2 font-medium ${severityStyle[issue.severity]}`}>{issue.severity}</td>
                  {report.files && <td className="num pr-2 whitespace-nowrap">{issue.file ?? 'the set'}</td>}
                  <td className="num pr-2">{issue.line ?? ''}</td>
                  <td className="pr-2">{issue.column ?? ''}</td>
                  <td className="num max-w-40 truncate pr-2" title={issue.value}>
                    {issue.value ?? ''}
                  </td>
                  <td>{issue.message}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : (
        <p className="text-sm text-ink-soft">No issues found.</p>
      )}
    </div>
  );
}

/** Each file of a set read as one climate file, in time order: what it held and what was found in it. */
function FilesOfSet({ files, timeZone }: { files: FileInSet[]; timeZone: string }) {
  // hours on the clock the files were read in (the site's), as the files themselves write them
  const clock = wallClockReader(timeZone);
  const local = (iso: string | null) => (iso ? wallClockText(clock(Date.parse(iso))) : '–');
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-left text-xs" data-testid="files-of-set">
        <caption className="pb-1 text-left text-sm text-ink-soft">
          {files.length} files read as one climate file, in time order (hours by their start, on the clock the files were read in, {timeZone}; lines as in each
          file).
        </caption>
        <thead>
          <tr className="border-b border-rule text-ink-soft">
            <th scope="col" className="py-1 pr-2 font-medium">
              File
            </th>
            <th scope="col" className="pr-2 font-medium">
              Size
            </th>
            <th scope="col" className="pr-2 font-medium">
              First hour
            </th>
            <th scope="col" className="pr-2 font-medium">
              Last hour
            </th>
            <th scope="col" className="pr-2 text-right font-medium">
              Hours
            </th>
            <th scope="col" className="pr-2 font-medium">
              Lines
            </th>
            <th scope="col" className="font-medium">
              Found
            </th>
          </tr>
        </thead>
        <tbody>
          {files.map((f) => (
            <tr key={f.fileName} className="border-b border-rule/60 align-top">
              <td className="num py-0.5 pr-2 whitespace-nowrap">{f.fileName}</td>
              <td className="num pr-2 whitespace-nowrap">{formatBytes(f.bytes)}</td>
              <td className="num pr-2 whitespace-nowrap">{local(f.firstTimestamp)}</td>
              <td className="num pr-2 whitespace-nowrap">{local(f.lastTimestamp)}</td>
              <td className="num pr-2 text-right">{f.hours.toLocaleString('en')}</td>
              <td className="num pr-2 whitespace-nowrap">{f.firstLine !== null && f.lastLine !== null ? `${f.firstLine}–${f.lastLine}` : '–'}</td>
              <td className={f.ok ? (f.warnings > 0 ? 'text-signal-warn' : 'text-ink-soft') : 'text-signal-bad'}>
                {f.ok ? (f.warnings > 0 ? `${f.warnings} warning${f.warnings === 1 ? '' : 's'}` : 'read as it is') : f.summary}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
