/**
 * The stored hours as the charts need them: typed arrays (JSON nulls back to NaN) and the humidity
 * ratio of every hour at the file's pressure, or at the site's standard-atmosphere pressure where the
 * file has none (hourlyPressurePa, as a run does).
 */
import { bulkStates, hourlyPressurePa } from '../../../../shared/psychrometrics';
import type { ClimateFileHours } from '../api/get-climate-file-hours';

export interface ChartSeries {
  timestampsMs: Float64Array;
  dryBulbC: Float64Array;
  /** kg/kg dry air */
  humidityRatio: Float64Array;
  dewPointC: Float64Array;
}

export function toFloat64(values: ArrayLike<number | null>): Float64Array {
  const out = new Float64Array(values.length);
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    out[i] = v === null ? Number.NaN : v;
  }
  return out;
}

export function chartSeries(hours: ClimateFileHours, elevationM: number): ChartSeries {
  const dryBulbC = toFloat64(hours.dryBulbC);
  const humidity = { kind: hours.humidityKind, values: toFloat64(hours.humidity) };
  const { pressurePa } = hourlyPressurePa({ dryBulbC, humidity, pressurePa: hours.pressurePa ? toFloat64(hours.pressurePa) : null }, elevationM);
  const state = bulkStates({ dryBulbC, humidity, pressurePa });
  return { timestampsMs: Float64Array.from(hours.timestampsMs), dryBulbC, humidityRatio: state.humidityRatio, dewPointC: state.dewPointC };
}
