/**
 * Saturation vapour pressure of water by the Hyland–Wexler equations as given in ASHRAE Handbook—
 * Fundamentals (2017) ch. 1: eq. 6 over liquid water and eq. 5 over ice; their inverses and the boiling point.
 *
 * Two conventions live here, each where it belongs:
 * - **Over liquid water at every temperature** (the engine's default): relative humidity and dew point as
 *   weather data give them (WMO-No. 8, *Guide to Instruments and Methods of Observation*, part I ch. 4:
 *   humidity is reported with respect to water, also below 0 °C). Below 0 °C this is saturation over
 *   supercooled water: eq. 6 extended below its stated range (0…200 °C). The extension is an
 *   extrapolation, as WMO-No. 8 notes of its own formulas for supercooled water; it stays within
 *   0.5 % of the WMO-No. 8 (Magnus-type) formula over water down to −40 °C (tested).
 * - **ASHRAE's switch** — ice at and below the triple point (0.01 °C), water above, as psychrolib does —
 *   kept for the formulas that need ice: the wet-bulb equation's ice branch (eq. 35 takes Ws* over ice
 *   at t* < 0 °C, wet-bulb.ts) and the frost point.
 */
// @ts-nocheck

import { KELVIN_OFFSET, MAX_TEMPERATURE_C, MIN_TEMPERATURE_C, TRIPLE_POINT_C } from './constants';
import { requireFinite, requireInRange, requirePressurePa, requireTemperatureC } from './validate';

// ASHRAE 2017 ch. 1 eq. 5 (ice), coefficients C1…C7.
const I1 = -5.6745359e3;
const I2 = 6.3925247;
const I3 = -9.677843e-3;
const I4 = 6.2215701e-7;
const I5 = 2.0747825e-9;
const I6 = -9.484024e-13;
const I7 = 4.1635019;
// ASHRAE 2017 ch. 1 eq. 6 (liquid water), coefficients C8…C13.
const W8 = -5.8002206e3;
const W9 = 1.3914993;
const W10 = -4.8640239e-2;
const W11 = 4.1764768e-5;
const W12 = -1.4452093e-8;
const W13 = 6.5459673;

/** ln of saturation pressure over ice (Pa), T in kelvin. No checks: kernel for loops. */
export function lnSaturationOverIce(tK: number): number {
  return I1 / tK + I2 + tK * (I3 + tK * (I4 + tK * (I5 + tK * I6))) + I7 * Math.log(tK);
}

/** ln of saturation pressure over liquid water (Pa), T in kelvin. No checks: kernel for loops. */
export function lnSaturationOverWater(tK: number): number {
  return W8 / tK + W9 + tK * (W10 + tK * (W11 + tK * W12)) + W13 * Math.log(tK);
}

/** d(ln pws)/dT over ice, 1/K, T in kelvin (derivative of eq. 5). */
export function dLnSaturationOverIce(tK: number): number {
  return -I1 / (tK * tK) + I3 + tK * (2 * I4 + tK * (3 * I5 + tK * 4 * I6)) + I7 / tK;
}

/** d(ln pws)/dT over liquid water, 1/K, T in kelvin (derivative of eq. 6). */
export function dLnSaturationOverWater(tK: number): number {
  return -W8 / (tK * tK) + W10 + tK * (2 * W11 + tK * 3 * W12) + W13 / tK;
}

/** d²(ln pws)/dT² over liquid water at tC, 1/K² (second derivative of eq. 6). No checks. */
export function d2LnSaturationPressure(tC: number): number {
  const invT = 1 / (tC + KELVIN_OFFSET);
  return 2 * W8 * invT * invT * invT + 2 * W11 + 6 * W12 * (tC + KELVIN_OFFSET) - W13 * invT * invT;
}

/** ln pws(tC) in Pa over liquid water at every temperature (eq. 6, extrapolated below 0 °C). No checks. */
export function lnSaturationPressure(tC: number): number {
  return lnSaturationOverWater(tC + KELVIN_OFFSET);
}

/** d(ln pws)/dT over liquid water at tC, 1/K. No checks. */
export function dLnSaturationPressure(tC: number): number {
  return dLnSaturationOverWater(tC + KELVIN_OFFSET);
}

/**
 * ln pws(tC) in Pa on ASHRAE's switch: over ice at and below the triple point, over liquid water above.
 * For the wet-bulb equation (eq. 33/35) and the frost point only. No checks.
 */
export function lnSaturationIceOrWater(tC: number): number {
  const tK = tC + KELVIN_OFFSET;
  return tC <= TRIPLE_POINT_C ? lnSaturationOverIce(tK) : lnSaturationOverWater(tK);
}

/** d(ln pws)/dT at tC, 1/K, on the same branch as {@link lnSaturationIceOrWater}. No checks. */
export function dLnSaturationIceOrWater(tC: number): number {
  const tK = tC + KELVIN_OFFSET;
  return tC <= TRIPLE_POINT_C ? dLnSaturationOverIce(tK) : dLnSaturationOverWater(tK);
}

/** d²(ln pws)/dT² at tC, 1/K², on the same branch as {@link lnSaturationIceOrWater} (second derivative of eq. 5/6). No checks. */
export function d2LnSaturationIceOrWater(tC: number): number {
  if (tC > TRIPLE_POINT_C) return d2LnSaturationPressure(tC);
  const tK = tC + KELVIN_OFFSET;
  const invT = 1 / tK;
  return 2 * I1 * invT * invT * invT + 2 * I4 + tK * (6 * I5 + tK * 12 * I6) - I7 * invT * invT;
}

/**
 * Saturation vapour pressure over liquid water, Pa, at every temperature: over supercooled water below
 * 0 °C. This is the pressure relative humidity and dew point refer to (WMO-No. 8 part I ch. 4).
 * @param tC temperature, °C, −100…200 (below 0 °C eq. 6 is extrapolated beyond its stated range)
 * Source: Hyland–Wexler, ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 6.
 */
export function saturationPressurePa(tC: number): number {
  requireTemperatureC('tC', tC);
  return Math.exp(lnSaturationPressure(tC));
}

/**
 * Saturation vapour pressure over ice, Pa: what frost forms against.
 * @param tC temperature, °C, −100…0.01 (ice does not exist in equilibrium above the triple point)
 * Source: Hyland–Wexler, ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 5.
 */
export function saturationPressureOverIcePa(tC: number): number {
  requireInRange('tC', tC, MIN_TEMPERATURE_C, TRIPLE_POINT_C, '°C');
  return Math.exp(lnSaturationOverIce(tC + KELVIN_OFFSET));
}

const LN_611_2 = Math.log(611.2);
/**
 * Newton converges quadratically on ln pws: after a step s the error is about c·s² with
 * c = |f''/(2f')| < 0.01 /K over −100…200 °C, so stopping after a step below 0.03 K leaves < 1e-5 K
 * (a hundredth of psychrolib's own 0.001 K tolerance, five hundred times inside the 0.005 K goal).
 */
const STOP_STEP_K = 0.03;
const LN_PWS_ICE_MIN = lnSaturationOverIce(MIN_TEMPERATURE_C + KELVIN_OFFSET);
const LN_PWS_WATER_MIN = lnSaturationOverWater(MIN_TEMPERATURE_C + KELVIN_OFFSET);
const LN_PWS_MAX = lnSaturationOverWater(MAX_TEMPERATURE_C + KELVIN_OFFSET);
/** ln pws at the triple point on the water branch: below it, a frost point exists. */
export const LN_TRIPLE_POINT_PRESSURE = lnSaturationOverWater(TRIPLE_POINT_C + KELVIN_OFFSET);

/** Newton on ln pws over water from the Magnus-type guess (WMO-No. 8 coefficients over water, 17.62 and 243.12 °C; recalled). */
function solveOverWater(lnPw: number): number {
  const a = lnPw - LN_611_2;
  let tK = (243.12 * a) / (17.62 - a) + KELVIN_OFFSET;
  for (let i = 0; i < 12; i++) {
    const step = (lnSaturationOverWater(tK) - lnPw) / dLnSaturationOverWater(tK);
    tK -= step;
    if (Math.abs(step) < STOP_STEP_K) break;
  }
  return tK - KELVIN_OFFSET;
}

/** Newton on ln pws over ice from the Magnus-type guess (WMO-No. 8 coefficients over ice, 22.46 and 272.62 °C; recalled). */
function solveOverIce(lnPw: number): number {
  const a = lnPw - LN_611_2;
  let tK = (272.62 * a) / (22.46 - a) + KELVIN_OFFSET;
  for (let i = 0; i < 12; i++) {
    const step = (lnSaturationOverIce(tK) - lnPw) / dLnSaturationOverIce(tK);
    tK -= step;
    if (Math.abs(step) < STOP_STEP_K) break;
  }
  return tK - KELVIN_OFFSET;
}

/**
 * Dew point over liquid water, °C: the temperature at which pws over water (eq. 6, extrapolated below
 * 0 °C) equals exp(lnPw). First guess from a Magnus-type formula (the WMO-No. 8 coefficients over water),
 * then Newton steps on the exact equation. No range checks; NaN when lnPw is NaN or outside −100…200 °C.
 */
export function dewPointAtLnPressure(lnPw: number): number {
  if (!(lnPw >= LN_PWS_WATER_MIN && lnPw <= LN_PWS_MAX)) return Number.NaN;
  return solveOverWater(lnPw);
}

/**
 * Temperature (°C) at which saturation pressure on ASHRAE's switch equals exp(lnPw): the dew point above
 * the triple point, the frost point below. What the wet-bulb solver starts from. The branch is chosen once
 * from the pressure, so Newton never hops between the ice and water equations. No range checks; NaN when
 * lnPw is NaN or outside the −100…200 °C saturation range.
 */
export function frostOrDewPointAtLnPressure(lnPw: number): number {
  if (!(lnPw >= LN_PWS_ICE_MIN && lnPw <= LN_PWS_MAX)) return Number.NaN;
  return lnPw > LN_TRIPLE_POINT_PRESSURE ? solveOverWater(lnPw) : solveOverIce(lnPw);
}

/**
 * Dew point over liquid water, °C, at which water vapour of partial pressure vapourPressurePa would
 * saturate (over supercooled water below 0 °C): the inverse of {@link saturationPressurePa}.
 * @param vapourPressurePa partial pressure of water vapour, Pa, between pws(−100 °C) and pws(200 °C) over water
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 6 inverted by Newton's method.
 */
export function dewPointFromVapourPressure(vapourPressurePa: number): number {
  requireFinite('vapourPressurePa', vapourPressurePa);
  const t = vapourPressurePa > 0 ? dewPointAtLnPressure(Math.log(vapourPressurePa)) : Number.NaN;
  if (Number.isNaN(t)) {
    throw new RangeError(
      `vapourPressurePa must lie between the saturation pressures over water at ${MIN_TEMPERATURE_C} °C and ${MAX_TEMPERATURE_C} °C (got ${vapourPressurePa})`,
    );
  }
  return t;
}

/**
 * Frost point, °C: the temperature at which vapour of partial pressure vapourPressurePa saturates over
 * ice. A separate quantity from the dew point; it exists only below the triple point (pw < 611.66 Pa):
 * above it, cooled air reaches its dew point, over water, first. NaN there.
 * @param vapourPressurePa Pa, ≥ pws over ice at −100 °C
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 5 inverted by Newton's method.
 */
export function frostPointFromVapourPressure(vapourPressurePa: number): number {
  requireFinite('vapourPressurePa', vapourPressurePa);
  const lnPw = vapourPressurePa > 0 ? Math.log(vapourPressurePa) : Number.NaN;
  if (!(lnPw >= LN_PWS_ICE_MIN)) {
    throw new RangeError(`vapourPressurePa must be at least the saturation pressure over ice at ${MIN_TEMPERATURE_C} °C (got ${vapourPressurePa})`);
  }
  return lnPw < LN_TRIPLE_POINT_PRESSURE ? solveOverIce(lnPw) : Number.NaN;
}

/**
 * Boiling point of water, °C, at total pressure pressurePa: where pws over liquid water equals it.
 * @param pressurePa barometric pressure, Pa, 10…120 kPa
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 6 inverted by Newton's method.
 */
export function boilingPointC(pressurePa: number): number {
  requirePressurePa('pressurePa', pressurePa);
  return dewPointAtLnPressure(Math.log(pressurePa));
}
