/**
 * Saturation vapour pressure of water by the Hyland–Wexler equations as given in ASHRAE Handbook—
 * Fundamentals (2017) ch. 1 eq. 5 (over ice) and eq. 6 (over liquid water), valid −100…200 °C;
 * its inverse (dew point above the triple point, frost point below) and the boiling point.
 * Ice is used at and below the triple point (0.01 °C), as psychrolib does.
 */
import { KELVIN_OFFSET, MAX_TEMPERATURE_C, MIN_TEMPERATURE_C, TRIPLE_POINT_C } from './constants';
import { requirePressurePa, requireTemperatureC, requireFinite } from './validate';

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

/** d²(ln pws)/dT² at tC, 1/K², on the same branch as {@link lnSaturationPressure} (second derivative of eq. 5/6). No checks. */
export function d2LnSaturationPressure(tC: number): number {
  const tK = tC + KELVIN_OFFSET;
  const invT = 1 / tK;
  return tC <= TRIPLE_POINT_C
    ? 2 * I1 * invT * invT * invT + 2 * I4 + tK * (6 * I5 + tK * 12 * I6) - I7 * invT * invT
    : 2 * W8 * invT * invT * invT + 2 * W11 + 6 * W12 * tK - W13 * invT * invT;
}

/** ln pws(tC) in Pa, ice at and below the triple point. No checks. */
export function lnSaturationPressure(tC: number): number {
  const tK = tC + KELVIN_OFFSET;
  return tC <= TRIPLE_POINT_C ? lnSaturationOverIce(tK) : lnSaturationOverWater(tK);
}

/** d(ln pws)/dT at tC, 1/K, on the same branch as {@link lnSaturationPressure}. No checks. */
export function dLnSaturationPressure(tC: number): number {
  const tK = tC + KELVIN_OFFSET;
  return tC <= TRIPLE_POINT_C ? dLnSaturationOverIce(tK) : dLnSaturationOverWater(tK);
}

// The Newton loops need ln pws and its slope at the same point: one division and one logarithm serve
// both. The slope goes into this one-slot register rather than an object, so the loops allocate nothing
// (each worker has its own module instance, and JavaScript runs one call at a time within it).
const slopeRegister = new Float64Array(1);

/** ln pws over ice (eq. 5), T in kelvin; its slope d ln pws/dT is left for {@link lastSaturationSlope}. */
export function lnSaturationOverIceWithSlope(tK: number): number {
  const invT = 1 / tK;
  slopeRegister[0] = -I1 * invT * invT + I3 + tK * (2 * I4 + tK * (3 * I5 + tK * 4 * I6)) + I7 * invT;
  return I1 * invT + I2 + tK * (I3 + tK * (I4 + tK * (I5 + tK * I6))) + I7 * Math.log(tK);
}

/** ln pws over liquid water (eq. 6), T in kelvin; its slope is left for {@link lastSaturationSlope}. */
export function lnSaturationOverWaterWithSlope(tK: number): number {
  const invT = 1 / tK;
  slopeRegister[0] = -W8 * invT * invT + W10 + tK * (2 * W11 + tK * 3 * W12) + W13 * invT;
  return W8 * invT + W9 + tK * (W10 + tK * (W11 + tK * W12)) + W13 * Math.log(tK);
}

/** ln pws(tC), ice at and below the triple point; its slope is left for {@link lastSaturationSlope}. */
export function lnSaturationWithSlope(tC: number): number {
  const tK = tC + KELVIN_OFFSET;
  return tC <= TRIPLE_POINT_C ? lnSaturationOverIceWithSlope(tK) : lnSaturationOverWaterWithSlope(tK);
}

/** d ln pws/dT, 1/K, at the point of the last *WithSlope call. */
export function lastSaturationSlope(): number {
  return slopeRegister[0];
}

/**
 * Saturation vapour pressure of water, Pa, over ice at and below 0.01 °C and over liquid water above.
 * @param tC temperature, °C, −100…200
 * Source: Hyland–Wexler, ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 5 and 6.
 */
export function saturationPressurePa(tC: number): number {
  requireTemperatureC('tC', tC);
  return Math.exp(lnSaturationPressure(tC));
}

/** ln pws at the triple point on the water branch: the boundary that picks the branch of the inverse. */
const LN_TRIPLE_POINT_WATER = lnSaturationOverWater(TRIPLE_POINT_C + KELVIN_OFFSET);
const LN_611_2 = Math.log(611.2);
/**
 * Newton converges quadratically on ln pws: after a step s the error is about c·s² with
 * c = |f''/(2f')| < 0.01 /K over −100…200 °C, so stopping after a step below 0.03 K leaves < 1e-5 K
 * (a hundredth of psychrolib's own 0.001 K tolerance, five hundred times inside the 0.005 K goal).
 */
const STOP_STEP_K = 0.03;
const LN_PWS_MIN = lnSaturationOverIce(MIN_TEMPERATURE_C + KELVIN_OFFSET);
const LN_PWS_MAX = lnSaturationOverWater(MAX_TEMPERATURE_C + KELVIN_OFFSET);

/**
 * Temperature (°C) at which saturation pressure equals exp(lnPw): the dew point above the triple
 * point, the frost point below. First guess from a Magnus-type formula (Alduchov & Eskridge 1996
 * coefficients), then Newton steps on the exact Hyland–Wexler ln pws. The branch is chosen once from
 * the pressure, so Newton never hops between the ice and water equations. No range checks; returns
 * NaN when lnPw is NaN or outside the −100…200 °C saturation range.
 */
export function temperatureAtLnSaturation(lnPw: number): number {
  if (!(lnPw >= LN_PWS_MIN && lnPw <= LN_PWS_MAX)) return Number.NaN;
  const a = lnPw - LN_611_2;
  if (lnPw > LN_TRIPLE_POINT_WATER) {
    let tK = (243.12 * a) / (17.62 - a) + KELVIN_OFFSET;
    for (let i = 0; i < 12; i++) {
      const step = (lnSaturationOverWaterWithSlope(tK) - lnPw) / slopeRegister[0];
      tK -= step;
      if (Math.abs(step) < STOP_STEP_K) break;
    }
    return tK - KELVIN_OFFSET;
  }
  let tK = (272.62 * a) / (22.46 - a) + KELVIN_OFFSET;
  for (let i = 0; i < 12; i++) {
    const step = (lnSaturationOverIceWithSlope(tK) - lnPw) / slopeRegister[0];
    tK -= step;
    if (Math.abs(step) < STOP_STEP_K) break;
  }
  return tK - KELVIN_OFFSET;
}

/**
 * Dew point (frost point below 0.01 °C), °C, at which water vapour of partial pressure
 * vapourPressurePa would saturate: the inverse of {@link saturationPressurePa}.
 * @param vapourPressurePa partial pressure of water vapour, Pa, between pws(−100 °C) and pws(200 °C)
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 5 and 6 inverted by Newton's method.
 */
export function dewPointFromVapourPressure(vapourPressurePa: number): number {
  requireFinite('vapourPressurePa', vapourPressurePa);
  const t = vapourPressurePa > 0 ? temperatureAtLnSaturation(Math.log(vapourPressurePa)) : Number.NaN;
  if (Number.isNaN(t)) {
    throw new RangeError(
      `vapourPressurePa must lie between the saturation pressures at ${MIN_TEMPERATURE_C} °C and ${MAX_TEMPERATURE_C} °C (got ${vapourPressurePa})`,
    );
  }
  return t;
}

/**
 * Boiling point of water, °C, at total pressure pressurePa: where pws over liquid water equals it.
 * @param pressurePa barometric pressure, Pa, 10…120 kPa
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 6 inverted by Newton's method.
 */
export function boilingPointC(pressurePa: number): number {
  requirePressurePa('pressurePa', pressurePa);
  return temperatureAtLnSaturation(Math.log(pressurePa));
}
