import { useEffect, useMemo, useState, type ReactNode } from 'react';
import { hallAirSystem } from '../../../../shared/scenario/hybrid';
import { CarpetPlot } from '@/components/charts/carpet-plot';
import { MoistAirChart } from '@/components/charts/moist-air-chart';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { ApiError } from '@/lib/api-client';
import { formatQuantity } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';
import type { RunRecord } from '@/lib/api/runs';
import { useRunHourColumns } from '../api/get-run-hour-columns';
import { designAtSite } from '../../../../shared/scenario/run';
import { BinTablePanel } from './bin-table-panel';

/** The hourly views in the order they come in; each waits for the one before to be drawn. */
const VIEWS = ['carpet', 'moist-air', 'bins'] as const;

/**
 * Reveals `count` views one after another once `ready`: each in a task of its own after the one before has been
 * committed, so the page paints (and answers) between them instead of building every chart in one long task.
 */
function useOneAfterAnother(ready: boolean, count: number): number {
  const [shown, setShown] = useState(0);
  useEffect(() => {
    if (!ready || shown >= count) return;
    const timer = setTimeout(() => setShown((n) => n + 1), 0);
    return () => clearTimeout(timer);
  }, [ready, shown, count]);
  return ready ? shown : 0;
}

/** A panel's body, or its loading placeholder until the view's turn comes. */
function HourView({
  title,
  what,
  shown,
  heightPx,
  children,
}: {
  title: string;
  what: 'chart' | 'table';
  shown: boolean;
  heightPx: number;
  children: () => ReactNode;
}) {
  return (
    <Panel title={title}>
      {shown ? (
        children()
      ) : (
        <div role="progressbar" className="animate-pulse rounded-md bg-mist" style={{ height: heightPx }} aria-label={`Loading ${what}: ${title}`} />
      )}
    </Panel>
  );
}

/**
 * The views that need every hour: the carpet of modes, the hours on the moist-air chart and the bin table, from the
 * run's hour columns (the engine's own outdoor states and the stored modes, made on the server). The summary above
 * never waits for them; each view shows its own loading state and comes in when drawn.
 */
export function RunHourViews({ run }: { run: RunRecord }) {
  const columns = useRunHourColumns(run.projectId, run.id, run.status === 'done' && run.climateFileId !== null);
  const results = run.results!;
  const data = columns.data;
  const shown = useOneAfterAnother(!!data, VIEWS.length);
  const chartHours = useMemo(
    () =>
      data
        ? {
            dryBulbC: data.dryBulbC,
            humidityRatio: data.humidityRatio,
            modes: data.modes,
            mechanicalFraction: data.mechanicalFraction,
            humidified: data.humidified,
          }
        : null,
    [data],
  );
  // The design as run: its limits derated as the run derated them, its fan heat as the run derived it.
  const design = useMemo(() => {
    const atSite = designAtSite(run.scenario, results.site.elevationM);
    return { ...atSite, limits: { ...atSite.limits, dryBulbMaxC: results.envelope.dryBulbMaxC }, plant: { fanHeatK: results.fanHeatK } };
  }, [run.scenario, results.site.elevationM, results.envelope.dryBulbMaxC, results.fanHeatK]);
  const { unitSystem } = useUnitSystem();
  const envelopes = useMemo(
    () => [
      {
        label:
          results.envelope.dryBulbMaxC < run.scenario.envelope.dryBulbMaxC
            ? `Envelope as run (max dry-bulb ${formatQuantity('temperature', unitSystem, results.envelope.dryBulbMaxC)} after altitude derating)`
            : 'Envelope as run',
        limits: { ...run.scenario.envelope, dryBulbMaxC: results.envelope.dryBulbMaxC },
      },
    ],
    [run.scenario.envelope, results.envelope.dryBulbMaxC, unitSystem],
  );
  const markers = useMemo(
    () => [
      {
        label: 'Supply setpoint at the upper moisture limit',
        dryBulbC: hallAirSystem(run.scenario.system).supplyAirC,
        humidityRatio: results.envelope.highHumidityRatioGPerKg / 1000,
      },
      {
        label: 'Supply setpoint at the lower moisture limit',
        dryBulbC: hallAirSystem(run.scenario.system).supplyAirC,
        humidityRatio: results.envelope.lowHumidityRatioGPerKg / 1000,
      },
    ],
    [run.scenario.system, results.envelope.highHumidityRatioGPerKg, results.envelope.lowHumidityRatioGPerKg],
  );

  if (run.climateFileId === null || (columns.error instanceof ApiError && columns.error.code === 'climate_file_deleted')) {
    return (
      <Notice title="The climate file of this run was deleted">
        The carpet, the moist-air chart and the bin table need its hours. The totals above are as computed and stay.
      </Notice>
    );
  }
  if (columns.error instanceof ApiError && columns.error.code === 'series_changed') {
    return (
      <Notice tone="warn" title="The climate file no longer matches this run">
        {columns.error.message} The totals above are as computed.
      </Notice>
    );
  }
  if (columns.isError) {
    return (
      <Notice tone="bad" title="The hourly views could not be loaded">
        {columns.error.message} The totals above are complete; reload to try the hourly views again.
      </Notice>
    );
  }
  const stem = `run-${run.id}`;
  const turn = (view: (typeof VIEWS)[number]) => shown > VIEWS.indexOf(view);
  return (
    <div className="space-y-4">
      <HourView title="Modes by day and hour" what="chart" shown={turn('carpet')} heightPx={320}>
        {() => <CarpetPlot timestampsMs={data!.timestampsMs} values={data!.modes} kind="mode" utcOffsetMinutes={run.climate.utcOffsetMinutes} />}
      </HourView>
      <HourView title="The design on the moist-air chart" what="chart" shown={turn('moist-air')} heightPx={560}>
        {() => (
          <>
            <p className="mb-2 text-xs text-ink-soft">
              Where the scenario as run cools freely, with adiabatic assist or with compressors, at the site's pressure; the site's hours shaded over it; the
              envelope as run and the supply setpoint between its moisture limits.
            </p>
            <MoistAirChart pressurePa={data!.sitePressurePa} hours={chartHours!} design={design} envelopes={envelopes} markers={markers} />
          </>
        )}
      </HourView>
      <HourView title="Dry-bulb bins" what="table" shown={turn('bins')} heightPx={420}>
        {() => <BinTablePanel siTable={data!.bins} projectId={run.projectId} runId={run.id} fileStem={stem} />}
      </HourView>
    </div>
  );
}
