import { bulkStates, standardPressurePa, type BulkState, type HumidityKind } from '../../../../shared/psychrometrics';

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

function column(values: ArrayLike<number | null>): Float64Array {
  const out = new Float64Array(values.length);
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    out[i] = v === null ? Number.NaN : v;
  }
  return out;
}

/**
 * Each hour's full moist-air state from the climate file's columns, by the same engine the run used:
 * station pressure where the file has it, else the standard atmosphere at the site's elevation
 * (ASHRAE Handbook—Fundamentals 2017 ch. 1 eq. 3). Missing hours give NaN.
 */
export function climateStates(columns: ClimateColumns, elevationM: number): HourStates {
  const standardPa = standardPressurePa(elevationM);
  const dryBulbC = column(columns.dryBulbC);
  let pressure: Float64Array | number = standardPa;
  let sitePressurePa = standardPa;
  if (columns.pressurePa) {
    const p = column(columns.pressurePa);
    let sum = 0;
    let count = 0;
    for (let i = 0; i < p.length; i++) {
      if (p[i] !== p[i]) p[i] = standardPa;
      else (sum += p[i]), count++;
    }
    pressure = p;
    if (count > 0) sitePressurePa = sum / count;
  }
  const states = bulkStates({ dryBulbC, humidity: { kind: columns.humidityKind, values: column(columns.humidity) }, pressurePa: pressure });
  return { ...states, dryBulbC, sitePressurePa };
}
