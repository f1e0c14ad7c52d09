/**
 * The stored hours as the charts need them: typed arrays (JSON nulls back to NaN) and every hour's state by the
 * engine's outdoorStates (the file's pressure, or the site's standard atmosphere where the file has none), as a run
 * computes them.
 */
import { meanSitePressurePa, outdoorStates, type HumidityKind } from '../../shared/psychrometrics';

/** The stored hourly series as the API sends it, SI; humidity in the unit of its kind; a missing value is null. */
export interface ClimateHoursJson {
  humidityKind: HumidityKind;
  timestampsMs: number[];
  dryBulbC: Array<number | null>;
  humidity: Array<number | null>;
  pressurePa: Array<number | null> | null;
  /** 0 measured, 1 filled, 2 missing */
  flags?: number[];
}

export interface ChartSeries {
  timestampsMs: Float64Array;
  dryBulbC: Float64Array;
  /** kg/kg dry air */
  humidityRatio: Float64Array;
  dewPointC: Float64Array;
  wetBulbC: Float64Array;
  /** Each hour's pressure, Pa (one number when the file has no station pressure), as a run takes it. */
  pressurePa: Float64Array | number;
  flags: Uint8Array | null;
  /** The chart's one pressure, Pa: the mean station reading where the file has any, else the standard atmosphere at the site (meanSitePressurePa). */
  chartPressurePa: number;
}

export function toFloat64(values: ArrayLike<number | null>): Float64Array {
  const out = new Float64Array(values.length);
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    out[i] = v === null ? Number.NaN : v;
  }
  return out;
}

export function chartSeries(hours: ClimateHoursJson, elevationM: number): ChartSeries {
  const series = {
    dryBulbC: toFloat64(hours.dryBulbC),
    humidity: { kind: hours.humidityKind, values: toFloat64(hours.humidity) },
    pressurePa: hours.pressurePa ? toFloat64(hours.pressurePa) : null,
  };
  const { states, pressurePa } = outdoorStates(series, elevationM);
  return {
    timestampsMs: Float64Array.from(hours.timestampsMs),
    dryBulbC: series.dryBulbC,
    humidityRatio: states.humidityRatio,
    dewPointC: states.dewPointC,
    wetBulbC: states.wetBulbC,
    pressurePa,
    flags: hours.flags ? Uint8Array.from(hours.flags) : null,
    chartPressurePa: meanSitePressurePa(series, elevationM),
  };
}
