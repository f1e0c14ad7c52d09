import { useMemo } from 'react';
import { hallAirSystem } from '../../../../shared/scenario/hybrid';
import { CarpetPlot } from '@/components/charts/carpet-plot';
import { MoistAirChart } from '@/components/charts/moist-air-chart';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { formatQuantity } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';
import { useClimateHours } from '../api/get-climate-hours';
import type { RunRecord } from '../api/get-run';
import { useRunHours } from '../api/get-run-hours';
import { climateStates } from '../utils/climate-states';
import { BinTablePanel } from './bin-table-panel';

/**
 * The views that need every hour: the carpet of modes, the hours on the moist-air chart and the bin
 * table. Modes come from the run; dry-bulb and moisture from the climate file, through the same engine.
 */
export function RunHourViews({ run }: { run: RunRecord }) {
  const hours = useRunHours(run.projectId, run.id, run.status === 'done');
  const climate = useClimateHours(run.projectId, run.climateFileId, run.status === 'done');
  const results = run.results!;

  const states = useMemo(() => (climate.data ? climateStates(climate.data, run.climate.elevationM) : null), [climate.data, run.climate.elevationM]);
  const modes = useMemo(() => (hours.data ? Uint8Array.from(hours.data.modes) : null), [hours.data]);
  const matched = states && modes && modes.length === states.dryBulbC.length;
  const chartHours = useMemo(
    () => (matched ? { dryBulbC: states.dryBulbC, humidityRatio: states.humidityRatio, modes } : null),
    [matched, states, modes],
  );
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
      { label: 'Supply setpoint at the upper moisture limit', dryBulbC: hallAirSystem(run.scenario.system).supplyAirC, humidityRatio: results.envelope.highHumidityRatioGPerKg / 1000 },
      { label: 'Supply setpoint at the lower moisture limit', dryBulbC: hallAirSystem(run.scenario.system).supplyAirC, humidityRatio: results.envelope.lowHumidityRatioGPerKg / 1000 },
    ],
    [run.scenario.system, results.envelope.highHumidityRatioGPerKg, results.envelope.lowHumidityRatioGPerKg],
  );

  if (run.climateFileId === null) {
    return (
      <Notice title="The climate file of this run was deleted">
        The carpet, the moist-air chart and the bin table need its hours. The totals above are as computed and stay.
      </Notice>
    );
  }
  if (hours.isError || climate.isError) {
    return (
      <Notice tone="bad" title="The hourly views could not be loaded">
        {(hours.error ?? climate.error)?.message} The totals above are complete; reload to try the hourly views again.
      </Notice>
    );
  }
  if (climate.data && hours.data && !matched) {
    return (
      <Notice tone="warn" title="The climate file no longer matches this run">
        The run has {hours.data.modes.length.toLocaleString('en')} hours and the file now has {climate.data.timestampsMs.length.toLocaleString('en')}. The totals above
        are as computed.
      </Notice>
    );
  }
  if (!chartHours || !states || !modes || !climate.data) {
    return <div className="h-96 animate-pulse rounded-md bg-mist" aria-label="Loading hourly views" />;
  }
  const stem = `run-${run.id}`;
  return (
    <div className="space-y-4">
      <Panel title="Modes by day and hour">
        <CarpetPlot timestampsMs={climate.data.timestampsMs} values={modes} kind="mode" utcOffsetMinutes={run.climate.utcOffsetMinutes} />
      </Panel>
      <Panel title="Hours on the moist-air chart">
        <p className="mb-2 text-xs text-ink-soft">
          Each outdoor hour coloured by its mode, at the site's pressure; the envelope as run and the supply setpoint between its moisture limits.
        </p>
        <MoistAirChart pressurePa={states.sitePressurePa} hours={chartHours} display="points" envelopes={envelopes} markers={markers} />
      </Panel>
      <Panel title="Dry-bulb bins">
        <BinTablePanel modes={modes} dryBulbC={states.dryBulbC} wetBulbC={states.wetBulbC} fileStem={stem} />
      </Panel>
    </div>
  );
}
