/**
 * A finished run's hour columns (shared/report/hour-columns.ts lays them out): the outdoor states exactly as the run
 * computed them, and the stored per-hour outcome as it was. Runs on a pool thread (workers/hour-columns.ts).
 */
// @ts-nocheck

import { standardPressurePa } from '../psychrometrics';
import { MODE_NAMES } from '../scenario/classify';
import { outdoorStates, type ScenarioSeries } from '../scenario/run';
import { dryBulbBins } from './dry-bulb-bins';
import { encodeHourColumns, evenStepMs, type HourColumnName, type HourColumns } from './hour-columns';

export interface RunHourInput {
  series: ScenarioSeries;
  /** The elevation the run used (its site's, as snapshotted), m. */
  elevationM: number;
  modes: Uint8Array;
  mechanicalFraction: Float64Array;
  humidified: Uint8Array | null;
}

/**
 * Decimals each float column keeps: those of the hourly downloads (shared/scenario/hourly-csv.ts; humidity ratio
 * there in g/kg with 3), so the page shows what a download says, and the columns compress to half their size.
 */
const DECIMALS: Record<Exclude<HourColumnName, 'modes' | 'humidified' | 'flags'>, number> = {
  dryBulbC: 2,
  humidityRatio: 6,
  wetBulbC: 2,
  dewPointC: 2,
  rhPct: 2,
  enthalpyKJPerKg: 2,
  pressurePa: 0,
  mechanicalFraction: 3,
};

/** Values rounded to `decimals` (half away from zero, as the hourly writers round) as float32; NaN stays NaN. */
function rounded(values: ArrayLike<number>, decimals: number): Float32Array {
  const factor = 10 ** decimals;
  const out = new Float32Array(values.length);
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    out[i] = v < 0 ? -Math.round(-v * factor) / factor : Math.round(v * factor) / factor;
  }
  return out;
}

/**
 * The columns named, for one finished run: the outdoor states exactly as the run computed them (outdoorStates:
 * station pressure where the series has it, the standard atmosphere at the run's elevation elsewhere), rounded as
 * the hourly downloads write them, and the stored per-hour outcome as it was.
 */
export function runHourColumns(input: RunHourInput, names: readonly HourColumnName[], options: { binWidthK?: number; binOriginC?: number } = {}): Uint8Array {
  const { series, elevationM, modes } = input;
  const n = series.timestampsMs.length;
  if (modes.length !== n) throw new RangeError(`modes has ${modes.length} hours but the series has ${n}`);
  const { binWidthK, binOriginC = 0 } = options;
  const needsStates =
    binWidthK !== undefined || names.some((name) => ['humidityRatio', 'wetBulbC', 'dewPointC', 'rhPct', 'enthalpyKJPerKg', 'pressurePa'].includes(name));
  const outdoor = needsStates ? outdoorStates(series, elevationM) : null;
  const columns: HourColumns['columns'] = {};
  for (const name of names) {
    if (name === 'modes') columns.modes = modes;
    else if (name === 'humidified') columns.humidified = input.humidified ?? new Uint8Array(n);
    else if (name === 'flags') columns.flags = series.flags ?? new Uint8Array(n);
    else if (name === 'dryBulbC') columns.dryBulbC = rounded(series.dryBulbC, DECIMALS.dryBulbC);
    else if (name === 'mechanicalFraction') columns.mechanicalFraction = rounded(input.mechanicalFraction, DECIMALS.mechanicalFraction);
    else if (name === 'pressurePa') {
      const p = outdoor!.pressurePa;
      columns.pressurePa = typeof p === 'number' ? new Float32Array(n).fill(Math.round(p)) : rounded(p, DECIMALS.pressurePa);
    } else columns[name] = rounded(outdoor!.states[name], DECIMALS[name]);
  }
  const stepMs = evenStepMs(series.timestampsMs);
  return encodeHourColumns(
    {
      hours: n,
      startMs: n ? series.timestampsMs[0] : null,
      stepMs,
      sitePressurePa: chartPressurePa(series, elevationM),
      modeNames: MODE_NAMES,
      ...(binWidthK === undefined
        ? {}
        : { dryBulbBins: { widthK: binWidthK, originC: binOriginC, ...dryBulbBins(modes, series.dryBulbC, outdoor!.states.wetBulbC, binWidthK, binOriginC) } }),
    },
    // timestamps first: float64 wants the 8-byte alignment every column starts at anyway
    stepMs === null ? { timestampsMs: series.timestampsMs, ...columns } : columns,
  );
}

/** The mean station pressure where the series has any, else the standard atmosphere at the elevation, Pa. */
function chartPressurePa(series: ScenarioSeries, elevationM: number): number {
  const station = series.pressurePa;
  if (station) {
    let sum = 0;
    let count = 0;
    for (let i = 0; i < station.length; i++) {
      if (station[i] !== station[i]) continue; // NaN: no reading this hour
      sum += station[i];
      count++;
    }
    if (count > 0) return sum / count;
  }
  return standardPressurePa(elevationM);
}
