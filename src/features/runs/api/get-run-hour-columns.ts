import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetchBytes } from '@/lib/api-client';
import { runQueryKey } from '@/lib/api/runs';
import { DRY_BULB_BIN_GRIDS, type BinTable } from '../../../../shared/report/dry-bulb-bins';
import { decodeHourColumns, hourTimestampsMs, type HourColumns, type HourColumnName } from '../../../../shared/report/hour-columns';

/**
 * The columns the run page draws: modes for the carpet; the state, the compressors' share and the humidified flag for
 * the moist-air chart's cells; the bins come made.
 */
const RUN_PAGE_COLUMNS = ['modes', 'dryBulbC', 'humidityRatio', 'mechanicalFraction', 'humidified'] as const satisfies readonly HourColumnName[];
/** Width of the page's dry-bulb bins (SI), K. */
const BIN_WIDTH_K = DRY_BULB_BIN_GRIDS.SI.widthK;

/** A finished run's hours for its page, column by column, SI; NaN where an hour has no data. */
export interface RunHourColumns {
  hours: number;
  timestampsMs: Float64Array;
  /** One pressure for the chart, Pa (the mean station pressure, else the standard atmosphere at the run's elevation). */
  sitePressurePa: number;
  /** 0 free cooling, 1 adiabatic assist, 2 mechanical, 3 no data */
  modes: Uint8Array;
  dryBulbC: Float32Array;
  /** kg/kg dry air */
  humidityRatio: Float32Array;
  /** 0…1: the share of the hour's load the compressors carry */
  mechanicalFraction: Float32Array;
  /** 1 for a free-cooling hour in which the evaporative stage only added moisture */
  humidified: Uint8Array;
  /** Hours per mode and mean coincident wet-bulb in 2 K dry-bulb bins. */
  bins: BinTable;
}

export async function getRunHourColumns(projectId: number, runId: number): Promise<RunHourColumns> {
  const bytes = await apiFetchBytes(`/projects/${projectId}/runs/${runId}/hour-columns?columns=${RUN_PAGE_COLUMNS.join(',')}&bins=${BIN_WIDTH_K}`);
  const message = decodeHourColumns(bytes);
  const { modes, dryBulbC, humidityRatio, mechanicalFraction, humidified } = message.columns;
  return {
    hours: message.hours,
    timestampsMs: hourTimestampsMs(message),
    sitePressurePa: message.sitePressurePa,
    modes: modes as Uint8Array,
    dryBulbC: dryBulbC as Float32Array,
    humidityRatio: humidityRatio as Float32Array,
    mechanicalFraction: mechanicalFraction as Float32Array,
    humidified: humidified as Uint8Array,
    bins: binTableOf(message),
  };
}

/** The bins in a message's header; JSON has no NaN, so a bin without any wet-bulb arrives with null. */
function binTableOf(message: HourColumns): BinTable {
  if (!message.dryBulbBins) throw new RangeError('the hour columns came without their dry-bulb bins');
  return { ...message.dryBulbBins, bins: message.dryBulbBins.bins.map((b) => ({ ...b, meanWetBulbC: b.meanWetBulbC ?? Number.NaN })) };
}

/**
 * A finished run's dry-bulb bins on another grid than the page's 2 K (in IP: 5 °F from 0 °F), made on the server from
 * the full-precision states; the message carries only the smallest column (modes) beside them.
 */
export async function getRunDryBulbBins(projectId: number, runId: number, grid: { widthK: number; originC: number }): Promise<BinTable> {
  const bytes = await apiFetchBytes(`/projects/${projectId}/runs/${runId}/hour-columns?columns=modes&bins=${grid.widthK}&binOrigin=${grid.originC}`);
  return binTableOf(decodeHourColumns(bytes));
}

export const useRunDryBulbBins = (projectId: number, runId: number, grid: { widthK: number; originC: number }, enabled: boolean) =>
  useQuery({
    queryKey: [...runQueryKey(projectId, runId), 'dry-bulb-bins', grid.widthK, grid.originC],
    queryFn: () => getRunDryBulbBins(projectId, runId, grid),
    staleTime: Infinity,
    retry: false,
    enabled,
  });

export const runHourColumnsQueryOptions = (projectId: number, runId: number) =>
  queryOptions({
    queryKey: [...runQueryKey(projectId, runId), 'hour-columns'],
    queryFn: () => getRunHourColumns(projectId, runId),
    // a finished run's hours never change
    staleTime: Infinity,
    retry: false,
  });

export const useRunHourColumns = (projectId: number, runId: number, ready: boolean) =>
  useQuery({ ...runHourColumnsQueryOptions(projectId, runId), enabled: ready });
