/**
 * The one way an hour's outdoor state is computed from a stored weather series: the hour's pressure by the one
 * rule for missing station pressure (site-pressure.ts), then the full state by the bulk kernel (bulk.ts). Runs,
 * hourly downloads, hour columns, climate summaries, projections, excursions and the climate file's chart call it.
 */
import { bulkStates, type BulkState, type HumidityKind } from './bulk';
import { hourlyPressurePa } from './site-pressure';

/** The columns a state needs: dry-bulb, one humidity measure and (optionally) station pressure. */
export interface OutdoorSeries {
  dryBulbC: Float64Array;
  humidity: { kind: HumidityKind; values: Float64Array };
  /** Station pressure, Pa, NaN where missing; null when the file has none. */
  pressurePa: Float64Array | null;
}

export interface OutdoorStates {
  /** W, dew point, wet-bulb, RH and enthalpy of every hour; NaN where the hour has no valid state. */
  states: BulkState;
  /** The pressure each hour's state was computed at, Pa (one number when the series has no station pressure). */
  pressurePa: Float64Array | number;
  /** Hours with data whose missing station pressure was filled (hourlyPressurePa). */
  filledHours: number;
}

/**
 * Every hour's outdoor moist-air state at its pressure: the station's where the series has it, the standard
 * atmosphere at the site's elevation where it has none or a hole (ASHRAE Handbook—Fundamentals 2017 ch. 1 eq. 3,
 * through hourlyPressurePa); states by eq. 5, 6, 20, 22, 32, 33, 35, 36 (bulkStates).
 * @param elevationM site elevation, m, −500…11 000
 */
export function outdoorStates(series: OutdoorSeries, elevationM: number): OutdoorStates {
  const { pressurePa, filledHours } = hourlyPressurePa(series, elevationM);
  return { states: bulkStates({ dryBulbC: series.dryBulbC, humidity: series.humidity, pressurePa }), pressurePa, filledHours };
}
