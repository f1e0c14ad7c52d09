import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetchBytes } from '@/lib/api-client';
import type { BinTable } from '../../../../shared/report/dry-bulb-bins';
import { decodeHourColumns, hourTimestampsMs, type HourColumnName } from '../../../../shared/report/hour-columns';

/**
 * The columns the run page draws: modes for the carpet; the state, the compressors' share and the humidified flag for
 * the moist-air chart's cells; the bins come made.
 */
const RUN_PAGE_COLUMNS = ['modes', 'dryBulbC', 'humidityRatio', 'mechanicalFraction', 'humidified'] as const satisfies readonly HourColumnName[];
/** Width of the page's dry-bulb bins, K. */
const BIN_WIDTH_K = 2;

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
  if (!message.dryBulbBins) throw new RangeError('the hour columns came without their dry-bulb bins');
  return {
    hours: message.hours,
    timestampsMs: hourTimestampsMs(message),
    sitePressurePa: message.sitePressurePa,
    modes: modes as Uint8Array,
    dryBulbC: dryBulbC as Float32Array,
    humidityRatio: humidityRatio as Float32Array,
    mechanicalFraction: mechanicalFraction as Float32Array,
    humidified: humidified as Uint8Array,
    // JSON has no NaN: a bin without any wet-bulb arrives with null
    bins: { ...message.dryBulbBins, bins: message.dryBulbBins.bins.map((b) => ({ ...b, meanWetBulbC: b.meanWetBulbC ?? Number.NaN })) },
  };
}

export const runHourColumnsQueryOptions = (projectId: number, runId: number) =>
  queryOptions({
    queryKey: ['projects', projectId, 'runs', runId, 'hour-columns'],
    queryFn: () => getRunHourColumns(projectId, runId),
    // a finished run's hours never change
    staleTime: Infinity,
    retry: false,
  });

export const useRunHourColumns = (projectId: number, runId: number, ready: boolean) =>
  useQuery({ ...runHourColumnsQueryOptions(projectId, runId), enabled: ready });
