import { bulkStates, hourlyPressurePa, type BulkState, type HumidityKind } from '../../../../shared/psychrometrics';
import { toFloat64 } from '@/lib/climate-series';

export interface ClimateColumns {
  humidityKind: HumidityKind;
  dryBulbC: ArrayLike<number | null>;
  humidity: ArrayLike<number | null>;
  pressurePa: ArrayLike<number | null> | null;
}

export interface HourStates extends BulkState {
  dryBulbC: Float64Array;
  /** Pressure for the chart, Pa: the mean station pressure when the file has one, else the standard atmosphere at the site's elevation. */
  sitePressurePa: number;
}

/**
 * Each hour's full moist-air state from the climate file's columns, by the same engine the run used:
 * station pressure where the file has it, else the standard atmosphere at the site's elevation
 * (hourlyPressurePa, as a run does). Missing hours give NaN.
 */
export function climateStates(columns: ClimateColumns, elevationM: number): HourStates {
  const dryBulbC = toFloat64(columns.dryBulbC);
  const humidity = { kind: columns.humidityKind, values: toFloat64(columns.humidity) };
  const station = columns.pressurePa ? toFloat64(columns.pressurePa) : null;
  const pressure = hourlyPressurePa({ dryBulbC, humidity, pressurePa: station }, elevationM);
  let sitePressurePa = pressure.sitePressurePa;
  if (station) {
    let sum = 0;
    let count = 0;
    for (let i = 0; i < station.length; i++) if (station[i] === station[i]) (sum += station[i]), count++;
    if (count > 0) sitePressurePa = sum / count;
  }
  const states = bulkStates({ dryBulbC, humidity, pressurePa: pressure.pressurePa });
  return { ...states, dryBulbC, sitePressurePa };
}
