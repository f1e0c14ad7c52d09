/**
 * Humidity morphed through specific humidity q (kg water per kg moist air), as the climate models'
 * near-surface humidity fields are reported and their changes published; then back to relative humidity
 * at the morphed dry-bulb and the hour's pressure. Same equations as shared/psychrometrics.
 */
// @ts-nocheck

import { bulkStates, type BulkStateInput } from '../psychrometrics';
import { MOLAR_MASS_RATIO } from '../psychrometrics/constants';
import { lnSaturationPressure } from '../psychrometrics/saturation';
import { isPressureOk, isTemperatureOk } from '../psychrometrics/validate';

/**
 * Specific humidity, kg/kg of moist air, of each hour: the humidity ratio W of the hour's state
 * (bulkStates), then q = W / (1 + W). NaN where the state has no valid humidity.
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 9b (q = W/(1+W)); W by eq. 20, 22, 33, 35, 36.
 */
export function specificHumidityOfHours(input: BulkStateInput): Float64Array {
  const w = bulkStates(input).humidityRatio;
  for (let i = 0; i < w.length; i++) w[i] = w[i] / (1 + w[i]);
  return w;
}

export interface RhClampCounts {
  /** Hours whose morphed moisture exceeded saturation at the morphed dry-bulb: RH set to 100 %. */
  clampedHigh: number;
  /** Hours whose morphed specific humidity fell below zero: RH set to 0 %. */
  clampedLow: number;
}

/**
 * Relative humidity, %, of air at dryBulbC holding specific humidity q at pressurePa, bounded to 0–100 %:
 * W = q / (1 − q), pw = p·W / (0.621945 + W), RH = 100 · pw / pws(t). Hours that had to be bounded are
 * counted. NaN in, or a temperature or pressure out of the engine's range, gives NaN for that hour.
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 9b, 20 (solved for pw), 22, and pws by eq. 5/6.
 * @param specificHumidity kg/kg of moist air
 * @param pressurePa per hour, or one value for the whole series, Pa
 */
export function rhPctFromSpecificHumidity(
  dryBulbC: Float64Array,
  specificHumidity: Float64Array,
  pressurePa: Float64Array | number,
  out: Float64Array,
): RhClampCounts {
  const n = dryBulbC.length;
  if (specificHumidity.length !== n) throw new RangeError(`specificHumidity has ${specificHumidity.length} hours but dryBulbC has ${n}`);
  if (out.length !== n) throw new RangeError(`out has ${out.length} hours but dryBulbC has ${n}`);
  const series = typeof pressurePa === 'number' ? null : pressurePa;
  if (series && series.length !== n) throw new RangeError(`pressurePa has ${series.length} hours but dryBulbC has ${n}`);
  let clampedHigh = 0;
  let clampedLow = 0;
  for (let i = 0; i < n; i++) {
    const t = dryBulbC[i];
    const q = specificHumidity[i];
    const p = series ? series[i] : (pressurePa as number);
    if (!(q === q && isTemperatureOk(t) && isPressureOk(p) && q < 1)) {
      out[i] = Number.NaN;
      continue;
    }
    if (q < 0) {
      out[i] = 0;
      clampedLow++;
      continue;
    }
    const w = q / (1 - q);
    const rh = (100 * ((p * w) / (MOLAR_MASS_RATIO + w))) / Math.exp(lnSaturationPressure(t));
    if (rh > 100) {
      out[i] = 100;
      clampedHigh++;
    } else {
      out[i] = rh;
    }
  }
  return { clampedHigh, clampedLow };
}
