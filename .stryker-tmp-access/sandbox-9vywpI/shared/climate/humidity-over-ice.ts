/**
 * The import option `humidityOverIce`: a file whose relative humidity (or "dew point") below 0 °C is given
 * with respect to ice is turned, once, into the engine's convention — over liquid water at every temperature
 * (WMO-No. 8 part I ch. 4) — so the stored series, every run and every download read it the same way.
 */
// @ts-nocheck

import { dewPointFromFrostPointUnchecked, rhOverWaterFromRhOverIceUnchecked } from '../psychrometrics/over-ice';
import type { IssueLog } from './issue-log';
import type { ClimateSeries } from './types';

/** Triple point of water, °C: at and below it the two conventions differ (ASHRAE Handbook—Fundamentals 2017 ch. 1). */
const TRIPLE_POINT_C = 0.01;

/**
 * Converts, in place, the sub-zero humidity of an imported series read over ice: RH φw = φi·pws,ice(t)/pws,water(t)
 * at dry-bulbs at or below 0.01 °C; a dew point at or below 0.01 °C is a frost point, replaced by the dew point over
 * water of the same vapour pressure. Wet-bulb and humidity-ratio columns have no such reading and are left alone.
 * Says what it did in the report (an info line with the number of hours).
 */
export function readHumidityOverIce(series: ClimateSeries, log: IssueLog): void {
  const { kind, values } = series.humidity;
  if (kind === 'wet-bulb-c' || kind === 'humidity-ratio-kgkg') {
    log.info(
      'humidity-over-ice',
      `"Humidity over ice below 0 °C" was chosen, but the file's humidity is a ${kind === 'wet-bulb-c' ? 'wet-bulb' : 'humidity ratio'}, which does not depend on it: nothing was converted.`,
    );
    return;
  }
  const dryBulbC = series.dryBulbC;
  let converted = 0;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (kind === 'relative-humidity-pct') {
      const t = dryBulbC[i];
      if (t <= TRIPLE_POINT_C && v === v) {
        values[i] = rhOverWaterFromRhOverIceUnchecked(t, v);
        converted++;
      }
    } else if (v <= TRIPLE_POINT_C) {
      values[i] = dewPointFromFrostPointUnchecked(v);
      converted++;
    }
  }
  const what = kind === 'relative-humidity-pct' ? 'relative humidity converted to over liquid water' : 'frost points converted to dew points over liquid water';
  log.info(
    'humidity-over-ice',
    `Humidity read over ice below 0 °C, as chosen: ${what} in ${converted.toLocaleString('en')} hours at or below 0 °C. Tramontane computes and reports over liquid water at every temperature (WMO-No. 8).`,
    { value: String(converted) },
  );
}
