// @ts-nocheck
import { useMemo } from 'react';
import { CarpetPlot } from '@/components/charts/carpet-plot';
import { MoistAirChart } from '@/components/charts/moist-air-chart';
import { Notice } from '@/components/ui/notice';
import { standardPressurePa } from '../../../../shared/psychrometrics';
import type { ReportRun } from '../../../../shared/report/report-data';
import { designAtSite } from '../../../../shared/scenario/run';
import { useReportHours } from '../api/get-report-hours';
import { SubHeading } from './report-layout';

/**
 * The report's hourly charts: the design on the moist-air chart with the site's hours over it and the table of
 * regions, and the modes by day and hour. `downloadBase` is the report's download address (a member's or a share link's).
 */
export function ReportHourCharts({ run, downloadBase }: { run: ReportRun; downloadBase: string }) {
  const hours = useReportHours(downloadBase, run.id);
  const r = run.results;
  const design = useMemo(() => {
    const atSite = designAtSite(run.scenario, r.site.elevationM);
    return { ...atSite, limits: { ...atSite.limits, dryBulbMaxC: r.envelope.dryBulbMaxC }, plant: { fanHeatK: r.fanHeatK } };
  }, [run.scenario, r.site.elevationM, r.envelope.dryBulbMaxC, r.fanHeatK]);
  const envelopes = useMemo(() => [{ label: 'Envelope as run', limits: design.limits }], [design]);
  const markers = useMemo(
    () => [
      { label: 'Supply, upper moisture limit', dryBulbC: design.system.supplyAirC, humidityRatio: r.envelope.highHumidityRatioGPerKg / 1000 },
      { label: 'Supply, lower moisture limit', dryBulbC: design.system.supplyAirC, humidityRatio: r.envelope.lowHumidityRatioGPerKg / 1000 },
    ],
    [design.system.supplyAirC, r.envelope.highHumidityRatioGPerKg, r.envelope.lowHumidityRatioGPerKg],
  );
  const chartHours = useMemo(
    () =>
      hours.data
        ? {
            dryBulbC: hours.data.dryBulbC,
            humidityRatio: hours.data.humidityRatio,
            modes: hours.data.modes,
            mechanicalFraction: hours.data.mechanicalFraction,
            humidified: hours.data.humidified ?? undefined,
          }
        : null,
    [hours.data],
  );

  if (hours.isError) {
    return (
      <Notice tone="warn" title="The hourly charts could not be drawn">
        {hours.error.message} The tables above hold every figure.
      </Notice>
    );
  }
  if (!chartHours || !hours.data)
    return <div role="progressbar" className="h-72 animate-pulse rounded bg-mist print:hidden" aria-label="Loading the hourly charts" />;
  return (
    <div className="space-y-6" data-testid="report-hour-charts">
      <div className="keep-together space-y-2">
        <SubHeading>The design on the moist-air chart</SubHeading>
        <p className="text-xs text-ink-soft">
          Shaded: the outdoor states in which the design as run cools freely, with adiabatic assist or with compressors, from the engine's own rules at the
          site's standard pressure. Ink: how many of the site's hours fall in each cell.
        </p>
        <div className="max-w-[45rem]">
          <MoistAirChart
            pressurePa={standardPressurePa(r.site.elevationM)}
            hours={chartHours}
            design={design}
            envelopes={envelopes}
            markers={markers}
            projection="dry-bulb-humidity-ratio"
            compact
          />
        </div>
      </div>
      <div className="keep-together space-y-2">
        <SubHeading>Modes by day and hour</SubHeading>
        <div className="max-w-[45rem]">
          <CarpetPlot timestampsMs={hours.data.timestampsMs} values={hours.data.modes} kind="mode" utcOffsetMinutes={run.site.utcOffsetMinutes} />
        </div>
      </div>
    </div>
  );
}
