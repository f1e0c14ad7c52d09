/**
 * Humidity given over ice, turned into the engine's convention (over liquid water at every temperature,
 * WMO-No. 8 part I ch. 4). Some files give relative humidity or a "dew point" below 0 °C with respect
 * to ice (a frost point); read them with these, once, at import. Above the triple point (0.01 °C) the two
 * conventions agree and values pass through unchanged.
 */
// @ts-nocheck

import { KELVIN_OFFSET, MIN_TEMPERATURE_C, TRIPLE_POINT_C } from './constants';
import { dewPointAtLnPressure, lnSaturationOverIce, lnSaturationOverWater } from './saturation';
import { requireInRange, requireTemperatureC } from './validate';

/** RH over water, %, from RH over ice at tC: φw = φi · pws,ice(t) / pws,water(t) below 0.01 °C. No checks. */
export function rhOverWaterFromRhOverIceUnchecked(tC: number, rhOverIcePct: number): number {
  if (!(tC <= TRIPLE_POINT_C)) return rhOverIcePct;
  const tK = tC + KELVIN_OFFSET;
  return rhOverIcePct * Math.exp(lnSaturationOverIce(tK) - lnSaturationOverWater(tK));
}

/** Dew point over water, °C, of air whose frost point is frostPointC (unchanged above 0.01 °C). No checks; NaN below −100 °C over water. */
export function dewPointFromFrostPointUnchecked(frostPointC: number): number {
  if (!(frostPointC <= TRIPLE_POINT_C)) return frostPointC;
  return dewPointAtLnPressure(lnSaturationOverIce(frostPointC + KELVIN_OFFSET));
}

/**
 * Relative humidity over liquid water, %, of air at dry-bulb tC whose relative humidity over ice is
 * rhOverIcePct: φw = φi · pws,ice(t) / pws,water(t) below the triple point, φw = φi above.
 * @param tC dry-bulb, °C, −100…200; @param rhOverIcePct %, ≥ 0
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 5 (ice) and eq. 6 (water, extrapolated below 0 °C).
 */
export function rhOverWaterFromRhOverIce(tC: number, rhOverIcePct: number): number {
  requireTemperatureC('tC', tC);
  requireInRange('rhOverIcePct', rhOverIcePct, 0, 1000, '%');
  return rhOverWaterFromRhOverIceUnchecked(tC, rhOverIcePct);
}

/**
 * Dew point over liquid water, °C, of air whose frost point (saturation over ice) is frostPointC: the
 * temperature at which pws over water equals pws over ice at the frost point. Above 0.01 °C a given
 * "dew point" is already over water and passes through.
 * @param frostPointC °C, −100…200
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 5 and eq. 6 (extrapolated below 0 °C), inverted by Newton's method.
 */
export function dewPointFromFrostPoint(frostPointC: number): number {
  requireTemperatureC('frostPointC', frostPointC);
  const t = dewPointFromFrostPointUnchecked(frostPointC);
  if (Number.isNaN(t)) throw new RangeError(`frostPointC = ${frostPointC} °C has no dew point over water above ${MIN_TEMPERATURE_C} °C`);
  return t;
}
