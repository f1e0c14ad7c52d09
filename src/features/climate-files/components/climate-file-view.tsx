import { useMemo } from 'react';
import { standardOffsetMinutes } from '../../../../shared/climate/local-time';
import { CarpetPlot } from '@/components/charts/carpet-plot';
import { MoistAirChart } from '@/components/charts/moist-air-chart';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { ApiError } from '@/lib/api-client';
import { formatQuantity, unitOf } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';
import { useClimateFile, type ClimateFileDetail } from '../api/get-climate-file';
import { useClimateFileHours } from '../api/get-climate-file-hours';
import { chartSeries } from '../lib/hours-series';
import { formatBytes } from './progress-bar';
import { DeleteClimateFile } from './delete-climate-file';
import { ValidationReport } from './validation-report';

const months = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

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
  if (detail.isPending) return <div className="h-64 animate-pulse rounded bg-mist" aria-label="Loading the climate file" />;
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
  const { climateFile: file, site, summary, report } = detail;
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
  const t = (v: number) => formatQuantity('temperature', unitSystem, v, false);

  return (
    <div className="space-y-5">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <p className="text-sm text-ink-soft">Climate file · {site.name}</p>
          <h1 className="text-xl font-semibold">{file.name}</h1>
        </div>
        <div className="flex flex-wrap gap-2 text-sm">
          <a className="rounded border border-rule bg-panel px-3 py-1.5 hover:bg-mist" href={`${base}/original`} download>
            Original file ({file.originalFileName}, {formatBytes(file.byteSize)})
          </a>
          <a className="rounded border border-rule bg-panel px-3 py-1.5 hover:bg-mist" href={`${base}/hourly.csv`} download>
            Cleaned hourly CSV
          </a>
          {canEdit && <DeleteClimateFile projectId={projectId} fileId={fileId} name={file.name} onDeleted={onDeleted} />}
        </div>
      </div>

      <dl className="grid gap-3 sm:grid-cols-2 lg:grid-cols-5" data-testid="climate-file-facts">
        <Fact label="Years covered" value={firstYear === lastYear ? String(firstYear) : `${firstYear}–${lastYear}`} note={`${day(localFirst)} to ${day(localLast)}, site standard time`} />
        <Fact label="Hours" value={file.hours.toLocaleString('en')} note={`${file.measuredHours.toLocaleString('en')} measured · ${file.filledHours.toLocaleString('en')} filled · ${file.missingHours.toLocaleString('en')} missing`} />
        <Fact label="Completeness" value={`${summary.completenessPct.toFixed(1)} %`} note="hours with a usable state" />
        <Fact label="Mean pressure" value={formatQuantity('pressure', unitSystem, summary.meanPressurePa)} note={file.hasPressure ? 'from the file' : `standard atmosphere at ${formatQuantity('elevation', unitSystem, site.elevationM)}`} />
        <Fact label="Site time" value={site.timeZone} note={`charts in local standard time (UTC${offsetMinutes >= 0 ? '+' : '−'}${Math.abs(offsetMinutes / 60)})`} />
      </dl>

      <div className="grid gap-5 xl:grid-cols-2">
        <Panel title={`Monthly dry-bulb and dew point (${unitOf('temperature', unitSystem)})`}>
          <div className="overflow-x-auto">
            <table className="num w-full text-right text-xs" data-testid="monthly-table">
              <caption className="pb-1 text-left font-sans text-ink-soft">Minimum, mean and maximum over every year in the file</caption>
              <thead>
                <tr className="font-sans text-ink-soft">
                  <th rowSpan={2} scope="col" className="text-left font-medium">Month</th>
                  <th colSpan={3} scope="colgroup" className="border-b border-rule px-2 font-medium">Dry-bulb</th>
                  <th colSpan={3} scope="colgroup" className="border-b border-rule px-2 font-medium">Dew point</th>
                  <th rowSpan={2} scope="col" className="px-2 font-medium">Hours</th>
                </tr>
                <tr className="border-b border-rule font-sans text-ink-faint">
                  {['min', 'mean', 'max', 'min', 'mean', 'max'].map((h, k) => (
                    <th key={k} scope="col" className="px-2 font-normal">{h}</th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {summary.monthly.dryBulbC.map((db, k) => {
                  const dp = summary.monthly.dewPointC[k];
                  return (
                    <tr key={db.month} className="border-b border-rule/60">
                      <th scope="row" className="py-0.5 text-left font-sans font-normal">{months[db.month - 1]}</th>
                      <td className="px-2">{t(db.min)}</td>
                      <td className="px-2 font-semibold">{t(db.mean)}</td>
                      <td className="px-2">{t(db.max)}</td>
                      <td className="px-2">{t(dp.min)}</td>
                      <td className="px-2 font-semibold">{t(dp.mean)}</td>
                      <td className="px-2">{t(dp.max)}</td>
                      <td className="px-2 text-ink-soft">{db.hours.toLocaleString('en')}</td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
          </div>
        </Panel>
        <DesignValues detail={detail} />
      </div>

      <Panel title="Dry-bulb through the year">
        {series ? (
          <CarpetPlot timestampsMs={series.timestampsMs} values={series.dryBulbC} kind="temperature" utcOffsetMinutes={offsetMinutes} />
        ) : hours.isError ? (
          <Notice tone="bad" title="The hours could not be loaded">{hours.error.message} Reload the page to try again.</Notice>
        ) : (
          <div className="h-64 animate-pulse rounded bg-mist" aria-label="Loading the hours" />
        )}
      </Panel>

      <Panel title="The hours on the moist-air chart">
        {chartHours ? (
          <MoistAirChart pressurePa={summary.meanPressurePa} hours={chartHours} display="density" />
        ) : (
          <div className="h-96 animate-pulse rounded bg-mist" aria-label="Loading the chart" />
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

function Fact({ label, value, note }: { label: string; value: string; note?: string }) {
  return (
    <div className="rounded-md border border-rule bg-panel px-4 py-3">
      <dt className="text-xs text-ink-soft">{label}</dt>
      <dd className="num mt-0.5 text-lg font-semibold">{value}</dd>
      {note && <dd className="text-xs text-ink-soft">{note}</dd>}
    </div>
  );
}

function DesignValues({ detail }: { detail: ClimateFileDetail }) {
  const { unitSystem } = useUnitSystem();
  const design = detail.summary.design;
  const t = (v: number) => formatQuantity('temperature', unitSystem, v, false);
  const cell = 'px-2 py-0.5';
  return (
    <Panel title={`Design values (${unitOf('temperature', unitSystem)})`}>
      <p className="mb-2 rounded border border-signal-warn/40 bg-[#fbf3e4] px-3 py-1.5 text-xs" data-testid="design-label">
        Computed from this file, not published station values. Cumulative-frequency method (ASHRAE Handbook—Fundamentals ch. 14) over the{' '}
        <span className="num">{design.hoursUsed.toLocaleString('en')}</span> hours with data; coincident means over hours within ±{design.coincidenceBandK} K.
      </p>
      <table className="num w-full text-right text-xs">
        <thead>
          <tr className="border-b border-rule font-sans text-ink-soft">
            <th scope="col" className="text-left font-medium">Exceeded</th>
            <th scope="col" className={cell}>Dry-bulb</th>
            <th scope="col" className={cell}>mean coinc. wet-bulb</th>
            <th scope="col" className={cell}>Wet-bulb</th>
            <th scope="col" className={cell}>mean coinc. dry-bulb</th>
          </tr>
        </thead>
        <tbody>
          {design.dryBulb.map((db, k) => {
            const wb = design.wetBulb[k];
            return (
              <tr key={db.exceedPct} className="border-b border-rule/60">
                <th scope="row" className="py-0.5 text-left font-sans font-normal">{db.exceedPct} % of hours</th>
                <td className={`${cell} font-semibold`}>{t(db.valueC)}</td>
                <td className={cell}>{t(db.meanCoincidentC)}</td>
                <td className={`${cell} font-semibold`}>{wb ? t(wb.valueC) : '–'}</td>
                <td className={cell}>{wb ? t(wb.meanCoincidentC) : '–'}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
      {design.dewPoint && (
        <p className="mt-3 text-sm">
          Dew point exceeded {design.dewPoint.exceedPct} % of hours:{' '}
          <span className="num font-semibold">{formatQuantity('temperature', unitSystem, design.dewPoint.valueC)}</span>, humidity ratio{' '}
          <span className="num font-semibold">{formatQuantity('humidityRatio', unitSystem, design.dewPoint.humidityRatioKgPerKg)}</span>, mean coincident dry-bulb{' '}
          <span className="num">{formatQuantity('temperature', unitSystem, design.dewPoint.meanCoincidentDryBulbC)}</span>.
        </p>
      )}
    </Panel>
  );
}
