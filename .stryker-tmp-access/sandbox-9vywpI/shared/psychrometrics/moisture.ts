/**
 * Moisture content of moist air: humidity ratio, vapour pressure, relative humidity, dew point, frost
 * point, degree of saturation and specific humidity, at a given barometric pressure.
 * Relative humidity, dew point and saturation are over liquid water at every temperature (WMO-No. 8
 * part I ch. 4; see saturation.ts); the frost point is over ice.
 * Source of every relation: ASHRAE Handbook—Fundamentals (2017) ch. 1 (equations cited per function).
 */
// @ts-nocheck

import { MOLAR_MASS_RATIO } from './constants';
import { dewPointAtLnPressure, frostPointFromVapourPressure, lnSaturationPressure } from './saturation';
import { requireHumidityRatio, requirePressurePa, requireRhPct, requireTemperatureC, SATURATION_SLACK, supersaturatedError } from './validate';

/** W = 0.621945 · pw / (p − pw). No checks: kernel for loops. */
export function humidityRatioFromVapourPressureUnchecked(vapourPressurePa: number, pressurePa: number): number {
  return (MOLAR_MASS_RATIO * vapourPressurePa) / (pressurePa - vapourPressurePa);
}

/** pw = p · W / (0.621945 + W). No checks: kernel for loops. */
export function vapourPressureFromHumidityRatioUnchecked(humidityRatio: number, pressurePa: number): number {
  return (pressurePa * humidityRatio) / (MOLAR_MASS_RATIO + humidityRatio);
}

/**
 * Humidity ratio, kg water / kg dry air, of air holding vapour at partial pressure vapourPressurePa.
 * @param vapourPressurePa partial pressure of water vapour, Pa, 0 ≤ pw < pressurePa
 * @param pressurePa barometric pressure, Pa, 10…120 kPa
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 20.
 */
export function humidityRatioFromVapourPressure(vapourPressurePa: number, pressurePa: number): number {
  requirePressurePa('pressurePa', pressurePa);
  requireHumidityRatio('vapourPressurePa', vapourPressurePa);
  if (vapourPressurePa >= pressurePa) {
    throw new RangeError(`vapourPressurePa must be below pressurePa ${pressurePa} Pa (got ${vapourPressurePa})`);
  }
  return humidityRatioFromVapourPressureUnchecked(vapourPressurePa, pressurePa);
}

/**
 * Partial pressure of water vapour, Pa, in air of humidity ratio humidityRatio (kg/kg) at pressurePa.
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 20 solved for pw.
 */
export function vapourPressureFromHumidityRatio(humidityRatio: number, pressurePa: number): number {
  requireHumidityRatio('humidityRatio', humidityRatio);
  requirePressurePa('pressurePa', pressurePa);
  return vapourPressureFromHumidityRatioUnchecked(humidityRatio, pressurePa);
}

/**
 * Humidity ratio of air saturated over liquid water (supercooled below 0 °C), kg/kg, at tC and pressurePa:
 * the W at which relative humidity is 100 %.
 * @param tC dry-bulb temperature, °C, −100…200 and below the boiling point at pressurePa
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 23 with pws from eq. 6.
 */
export function saturationHumidityRatio(tC: number, pressurePa: number): number {
  requireTemperatureC('tC', tC);
  requirePressurePa('pressurePa', pressurePa);
  const pws = Math.exp(lnSaturationPressure(tC));
  if (pws >= pressurePa) {
    throw new RangeError(`tC = ${tC} °C is at or above the boiling point of water at pressurePa = ${pressurePa} Pa`);
  }
  return humidityRatioFromVapourPressureUnchecked(pws, pressurePa);
}

/**
 * Humidity ratio, kg/kg, from dry-bulb and relative humidity over liquid water: pw = φ · pws(t), then eq. 20.
 * @param tC dry-bulb, °C, −100…200
 * @param rhPct relative humidity, %, 0…100
 * @param pressurePa barometric pressure, Pa, 10…120 kPa
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 22 and 20.
 */
export function humidityRatioFromRh(tC: number, rhPct: number, pressurePa: number): number {
  requireTemperatureC('tC', tC);
  requireRhPct('rhPct', rhPct);
  requirePressurePa('pressurePa', pressurePa);
  const pw = (rhPct / 100) * Math.exp(lnSaturationPressure(tC));
  if (pw >= pressurePa) {
    throw new RangeError(`rhPct = ${rhPct} % at tC = ${tC} °C gives a vapour pressure at or above pressurePa = ${pressurePa} Pa`);
  }
  return humidityRatioFromVapourPressureUnchecked(pw, pressurePa);
}

/**
 * Relative humidity over liquid water, %, of air at dry-bulb tC holding humidityRatio kg/kg at pressurePa.
 * Throws a RangeError saying "supersaturated" when the vapour pressure exceeds saturation.
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 22 and 20.
 */
export function rhPctFromHumidityRatio(tC: number, humidityRatio: number, pressurePa: number): number {
  requireTemperatureC('tC', tC);
  requireHumidityRatio('humidityRatio', humidityRatio);
  requirePressurePa('pressurePa', pressurePa);
  const rh = (100 * vapourPressureFromHumidityRatioUnchecked(humidityRatio, pressurePa)) / Math.exp(lnSaturationPressure(tC));
  if (rh > 100 * (1 + SATURATION_SLACK)) {
    throw supersaturatedError('humidityRatio', humidityRatio, `its vapour pressure exceeds saturation at ${tC} °C (RH ${rh.toFixed(2)} %)`);
  }
  return Math.min(rh, 100);
}

/**
 * Humidity ratio, kg/kg, of air whose dew point over liquid water is dewPointC (also below 0 °C).
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 36 (pw = pws(td), eq. 6) and eq. 20.
 */
export function humidityRatioFromDewPoint(dewPointC: number, pressurePa: number): number {
  requireTemperatureC('dewPointC', dewPointC);
  requirePressurePa('pressurePa', pressurePa);
  const pw = Math.exp(lnSaturationPressure(dewPointC));
  if (pw >= pressurePa) {
    throw new RangeError(`dewPointC = ${dewPointC} °C is at or above the boiling point at pressurePa = ${pressurePa} Pa`);
  }
  return humidityRatioFromVapourPressureUnchecked(pw, pressurePa);
}

/**
 * Dew point over liquid water (also below 0 °C), °C, of air holding humidityRatio kg/kg at pressurePa.
 * @param humidityRatio kg/kg, > 0 (dry air has no dew point)
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 20 and 36, eq. 6 inverted by Newton's method.
 */
export function dewPointFromHumidityRatio(humidityRatio: number, pressurePa: number): number {
  requireHumidityRatio('humidityRatio', humidityRatio);
  requirePressurePa('pressurePa', pressurePa);
  const pw = vapourPressureFromHumidityRatioUnchecked(humidityRatio, pressurePa);
  const t = pw > 0 ? dewPointAtLnPressure(Math.log(pw)) : Number.NaN;
  if (Number.isNaN(t)) {
    throw new RangeError(`humidityRatio = ${humidityRatio} kg/kg has no dew point within −100…200 °C at ${pressurePa} Pa`);
  }
  return t;
}

/**
 * Frost point, °C, of air holding humidityRatio kg/kg at pressurePa: where it saturates over ice. A
 * quantity of its own, not a dew point; NaN when the vapour pressure is at or above the triple point's
 * (611.66 Pa), since such air reaches its dew point, above 0 °C, first.
 * @param humidityRatio kg/kg, > 0
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 20, eq. 5 inverted by Newton's method.
 */
export function frostPointFromHumidityRatio(humidityRatio: number, pressurePa: number): number {
  requireHumidityRatio('humidityRatio', humidityRatio);
  requirePressurePa('pressurePa', pressurePa);
  if (!(humidityRatio > 0)) throw new RangeError(`humidityRatio = ${humidityRatio} kg/kg: dry air has no frost point`);
  return frostPointFromVapourPressure(vapourPressureFromHumidityRatioUnchecked(humidityRatio, pressurePa));
}

/**
 * Degree of saturation μ = W / Ws(t, p), dimensionless.
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 12.
 */
export function degreeOfSaturation(tC: number, humidityRatio: number, pressurePa: number): number {
  requireHumidityRatio('humidityRatio', humidityRatio);
  return humidityRatio / saturationHumidityRatio(tC, pressurePa);
}

/**
 * Specific humidity, kg water / kg moist air, from humidity ratio kg/kg: q = W / (1 + W).
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 9b.
 */
export function specificHumidity(humidityRatio: number): number {
  requireHumidityRatio('humidityRatio', humidityRatio);
  return humidityRatio / (1 + humidityRatio);
}
