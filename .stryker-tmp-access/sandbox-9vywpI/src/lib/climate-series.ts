/**
 * The stored hours as the charts need them: typed arrays (JSON nulls back to NaN) and the humidity
 * ratio of every hour at the file's pressure, or at the site's standard-atmosphere pressure where the
 * file has none (hourlyPressurePa, as a run does).
 */
// @ts-nocheck

import { bulkStates, hourlyPressurePa, type HumidityKind } from '../../shared/psychrometrics';

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
  /** The chart's one pressure, Pa: the mean of the hours' pressures (station where given, else the standard atmosphere at the site). */
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
  const dryBulbC = toFloat64(hours.dryBulbC);
  const humidity = { kind: hours.humidityKind, values: toFloat64(hours.humidity) };
  const { pressurePa, sitePressurePa } = hourlyPressurePa(
    { dryBulbC, humidity, pressurePa: hours.pressurePa ? toFloat64(hours.pressurePa) : null },
    elevationM,
  );
  const state = bulkStates({ dryBulbC, humidity, pressurePa });
  let chartPressurePa = sitePressurePa;
  if (typeof pressurePa !== 'number' && pressurePa.length) {
    let sum = 0;
    for (let i = 0; i < pressurePa.length; i++) sum += pressurePa[i];
    chartPressurePa = sum / pressurePa.length;
  }
  return {
    timestampsMs: Float64Array.from(hours.timestampsMs),
    dryBulbC,
    humidityRatio: state.humidityRatio,
    dewPointC: state.dewPointC,
    wetBulbC: state.wetBulbC,
    pressurePa,
    flags: hours.flags ? Uint8Array.from(hours.flags) : null,
    chartPressurePa,
  };
}
