/** Dry-bulb of saturated air from its enthalpy: where the saturation curve meets a line of constant h. */
// @ts-nocheck

import { CP_DRY_AIR, CP_VAPOUR, LATENT_HEAT_0C, MAX_TEMPERATURE_C, MIN_TEMPERATURE_C, MOLAR_MASS_RATIO } from './constants';
import { dLnSaturationPressure, lnSaturationPressure } from './saturation';

/**
 * Temperature, °C, of saturated air with enthalpy enthalpyKJPerKg at pressurePa: solves
 * 1.006·t + Ws(t)·(2501 + 1.86·t) = h by Newton's method from the dry-air temperature h/1.006,
 * which lies above the root (hs is convex and increasing), so the steps descend monotonically.
 * No checks; NaN when the root is outside −100 °C … the boiling point.
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 32 with Ws from eq. 23.
 */
export function saturationTemperatureFromEnthalpy(enthalpyKJPerKg: number, pressurePa: number): number {
  let lo = MIN_TEMPERATURE_C;
  let hi = Math.min(enthalpyKJPerKg / CP_DRY_AIR, MAX_TEMPERATURE_C);
  let t = hi;
  for (let i = 0; i < 80; i++) {
    const pws = Math.exp(lnSaturationPressure(t));
    const dry = pressurePa - pws;
    if (!(dry > 0)) {
      hi = t;
      t = 0.5 * (lo + hi);
      continue;
    }
    const ws = (MOLAR_MASS_RATIO * pws) / dry;
    const dWs = (MOLAR_MASS_RATIO * pressurePa * pws * dLnSaturationPressure(t)) / (dry * dry);
    const f = CP_DRY_AIR * t + ws * (LATENT_HEAT_0C + CP_VAPOUR * t) - enthalpyKJPerKg;
    if (f > 0) hi = t;
    else lo = t;
    const df = CP_DRY_AIR + dWs * (LATENT_HEAT_0C + CP_VAPOUR * t) + ws * CP_VAPOUR;
    let next = t - f / df;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (Math.abs(next - t) < 1e-10) return next;
    t = next;
  }
  return hi - lo < 1e-6 ? t : Number.NaN;
}
