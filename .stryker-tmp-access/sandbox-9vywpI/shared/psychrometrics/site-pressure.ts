/**
 * The barometric pressure of every hour of a weather series: the one rule for filling missing station
 * pressure, used by runs, hourly downloads, climate summaries, charts, excursions and projections alike.
 */
// @ts-nocheck

import { standardPressurePa } from './atmosphere';

/** The columns the rule reads: a series with dry-bulb, one humidity measure and (optionally) station pressure. */
export interface PressureSeries {
  dryBulbC: Float64Array;
  humidity: { values: Float64Array };
  /** Station pressure, Pa, NaN where missing; null when the file has none. */
  pressurePa: Float64Array | null;
}

export interface HourlyPressure {
  /** One pressure per hour (Pa), or one number for every hour when the series has no station pressure. */
  pressurePa: Float64Array | number;
  /** The standard atmosphere at the site's elevation, Pa: what fills the holes. */
  sitePressurePa: number;
  /**
   * Hours with data (dry-bulb and humidity present) whose station pressure was missing and filled. Hours
   * without data are not counted: they have no state to compute. 0 when the series has no station pressure
   * at all (then every hour is on the standard atmosphere, and the source says so).
   */
  filledHours: number;
}

/**
 * Station pressure where the series has it; the standard atmosphere at elevationM (ASHRAE Handbook—
 * Fundamentals 2017 ch. 1 eq. 3) where it has none or a hole. The station column is not changed; a copy
 * is made only when a hole needs filling.
 * @param elevationM site elevation, m, −500…11 000
 */
export function hourlyPressurePa(series: PressureSeries, elevationM: number): HourlyPressure {
  const sitePressurePa = standardPressurePa(elevationM);
  const station = series.pressurePa;
  if (!station) return { pressurePa: sitePressurePa, sitePressurePa, filledHours: 0 };
  const dryBulbC = series.dryBulbC;
  const humidity = series.humidity.values;
  let filled: Float64Array | null = null;
  let filledHours = 0;
  for (let i = 0; i < station.length; i++) {
    if (station[i] === station[i]) continue;
    if (filled === null) filled = Float64Array.from(station);
    filled[i] = sitePressurePa;
    if (dryBulbC[i] === dryBulbC[i] && humidity[i] === humidity[i]) filledHours++;
  }
  return { pressurePa: filled ?? station, sitePressurePa, filledHours };
}
