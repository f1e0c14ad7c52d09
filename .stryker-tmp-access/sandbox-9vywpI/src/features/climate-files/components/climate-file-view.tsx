// @ts-nocheck
import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import { standardOffsetMinutes, utcOffsetLabel } from '../../../../shared/time-zone';
import { CarpetPlot } from '@/components/charts/carpet-plot';
import { MoistAirChart } from '@/components/charts/moist-air-chart';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { ApiError } from '@/lib/api-client';
import { formatQuantity } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';
import { useClimateFile, type ClimateFileDetail } from '../api/get-climate-file';
import { useClimateFileHours } from '../api/get-climate-file-hours';
import { chartSeries } from '@/lib/climate-series';
import { formatBytes } from './progress-bar';
import { DeleteClimateFile } from './delete-climate-file';
import { DesignValues } from './design-values';
import { FileFormatNote, FileOrigin } from './file-origin';
import { MonthlyTable } from './monthly-table';
import { ValidationReport } from './validation-report';
import { Fact } from '@/components/ui/fact';

/** What a stored climate file holds: coverage, monthly statistics, design values, carpet, chart and downloads. */
export function ClimateFileView({
  projectId,
  fileId,
  canEdit = false,
  onDeleted = () => undefined,
}: {
  projectId: number;
  fileId: number;
  /** Engineers and owners may delete the file. */
  canEdit?: boolean;
  onDeleted?: () => void;
}) {
  const detail = useClimateFile(projectId, fileId);
  if (detail.isPending) return <div role="progressbar" className="h-64 animate-pulse rounded bg-mist" aria-label="Loading the climate file" />;
  if (detail.isError) {
    const notFound = detail.error instanceof ApiError && detail.error.status === 404;
    return (
      <Notice tone="bad" title={notFound ? 'This climate file does not exist' : 'The climate file could not be loaded'}>
        {notFound ? 'It may have been deleted. Go back to the project to see the files it holds.' : detail.error.message}
      </Notice>
    );
  }
  return <Loaded projectId={projectId} fileId={fileId} detail={detail.data} canEdit={canEdit} onDeleted={onDeleted} />;
}

function Loaded({
  projectId,
  fileId,
  detail,
  canEdit,
  onDeleted,
}: {
  projectId: number;
  fileId: number;
  detail: ClimateFileDetail;
  canEdit: boolean;
  onDeleted: () => void;
}) {
  const { unitSystem } = useUnitSystem();
  const { climateFile: file, site, summary, report, mapping } = detail;
  const hours = useClimateFileHours(projectId, fileId);
  const series = useMemo(() => (hours.data ? chartSeries(hours.data, site.elevationM) : null), [hours.data, site.elevationM]);
  const chartHours = useMemo(() => (series ? { dryBulbC: series.dryBulbC, humidityRatio: series.humidityRatio } : null), [series]);
  const offsetMinutes = useMemo(() => standardOffsetMinutes(site.timeZone), [site.timeZone]);
  // Years in the site's standard time, so a file written in local time does not reach into the previous UTC year.
  const localFirst = new Date(file.firstHourMs + offsetMinutes * 60_000);
  const localLast = new Date(file.lastHourMs + offsetMinutes * 60_000);
  const firstYear = localFirst.getUTCFullYear();
  const lastYear = localLast.getUTCFullYear();
  const day = (d: Date) => d.toISOString().slice(0, 10);
  const base = `/api/projects/${projectId}/climate-files/${fileId}`;

  return (
    <div className="space-y-5">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <p className="text-sm text-ink-soft">
            {file.projection && (
              <span className="mr-2 rounded-sm border border-harbour/40 bg-mist px-1.5 py-0.5 text-xs font-semibold uppercase tracking-wide text-harbour">
                Projection
              </span>
            )}
            Climate file · {site.name}
          </p>
          <h1 className="text-xl font-semibold">{file.name}</h1>
          {file.projection && (
            <p className="text-sm text-ink-soft">
              A future-climate projection of {file.projection.parentName}, not measured weather.{' '}
              <Link to={`/projects/${projectId}/projections/${fileId}`} className="text-harbour underline-offset-2 underline hover:decoration-2">
                Today and the projection side by side
              </Link>
            </p>
          )}
        </div>
        <div className="flex flex-wrap gap-2 text-sm">
          <a className="rounded border border-rule bg-panel px-3 py-1.5 hover:bg-mist" href={`${base}/original`} download>
            Original file ({file.originalFileName}, {formatBytes(file.byteSize)})
          </a>
          <a className="rounded border border-rule bg-panel px-3 py-1.5 hover:bg-mist" href={`${base}/hourly.csv`} download>
            Cleaned hourly CSV
          </a>
          {canEdit && !file.projection && (
            <Link to={`/projects/${projectId}/projections/new?from=${fileId}`} className="rounded border border-rule bg-panel px-3 py-1.5 hover:bg-mist">
              Make a future-climate projection
            </Link>
          )}
          {canEdit && <DeleteClimateFile projectId={projectId} fileId={fileId} name={file.name} onDeleted={onDeleted} />}
        </div>
      </div>

      <dl className="grid gap-3 sm:grid-cols-2 lg:grid-cols-5" data-testid="climate-file-facts">
        <Fact
          label="Years covered"
          value={firstYear === lastYear ? String(firstYear) : `${firstYear}–${lastYear}`}
          note={`${day(localFirst)} to ${day(localLast)}, site standard time`}
        />
        <Fact
          label="Hours"
          value={file.hours.toLocaleString('en')}
          note={`${file.measuredHours.toLocaleString('en')} measured · ${file.filledHours.toLocaleString('en')} filled · ${file.missingHours.toLocaleString('en')} missing`}
        />
        <Fact label="Completeness" value={`${summary.completenessPct.toFixed(1)} %`} note="hours with a usable state" />
        <Fact
          label="Mean pressure"
          value={formatQuantity('pressure', unitSystem, summary.meanPressurePa)}
          note={file.hasPressure ? 'from the file' : `standard atmosphere at ${formatQuantity('elevation', unitSystem, site.elevationM)}`}
        />
        <Fact label="Site time" value={site.timeZone} note={`charts in the site's standard time (${utcOffsetLabel(offsetMinutes)})`} />
      </dl>

      {(mapping.format || report.fileHeader || report.typicalYear) && (
        <Panel title="Where the file comes from">
          <div className="space-y-3">
            <FileFormatNote mapping={mapping} />
            <FileOrigin report={report} site={site} />
          </div>
        </Panel>
      )}

      <div className="grid gap-5 xl:grid-cols-2">
        <MonthlyTable summary={summary} />
        <DesignValues design={summary.design} />
      </div>

      <Panel title="Dry-bulb through the year">
        {series ? (
          <CarpetPlot timestampsMs={series.timestampsMs} values={series.dryBulbC} kind="temperature" utcOffsetMinutes={offsetMinutes} />
        ) : hours.isError ? (
          <Notice tone="bad" title="The hours could not be loaded">
            {hours.error.message} Reload the page to try again.
          </Notice>
        ) : (
          <div role="progressbar" className="h-64 animate-pulse rounded bg-mist" aria-label="Loading the hours" />
        )}
      </Panel>

      <Panel title="The hours on the moist-air chart">
        {chartHours ? (
          <MoistAirChart pressurePa={summary.meanPressurePa} hours={chartHours} />
        ) : (
          <div role="progressbar" className="h-96 animate-pulse rounded bg-mist" aria-label="Loading the chart" />
        )}
      </Panel>

      <Panel title="Validation report from the upload">
        <details>
          <summary className="cursor-pointer text-sm text-ink-soft">{report.summary}</summary>
          <div className="mt-3">
            <ValidationReport report={report} />
          </div>
        </details>
      </Panel>
    </div>
  );
}
