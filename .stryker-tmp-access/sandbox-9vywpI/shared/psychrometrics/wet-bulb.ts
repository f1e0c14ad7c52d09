/**
 * Thermodynamic wet-bulb temperature by the psychrometric equation of ASHRAE Handbook—Fundamentals
 * (2017) ch. 1: eq. 33 over liquid water (t* ≥ 0 °C) and eq. 35 over ice (t* < 0 °C), with the
 * saturation humidity ratio at t* from eq. 23 and Hyland–Wexler pws on ASHRAE's switch (ice at and
 * below 0.01 °C, eq. 5; water above, eq. 6): the one place besides the frost point where the engine
 * uses saturation over ice (see saturation.ts).
 */
// @ts-nocheck

import { FREEZING_POINT_C, KELVIN_OFFSET, MIN_TEMPERATURE_C, MOLAR_MASS_RATIO, TRIPLE_POINT_C } from './constants';
import {
  d2LnSaturationIceOrWater,
  dLnSaturationIceOrWater,
  dLnSaturationOverIce,
  dLnSaturationOverWater,
  frostOrDewPointAtLnPressure,
  lnSaturationIceOrWater,
  lnSaturationOverIce,
  lnSaturationOverWater,
  lnSaturationPressure,
} from './saturation';
import { vapourPressureFromHumidityRatioUnchecked } from './moisture';
import { requireHumidityRatio, requirePressurePa, requireTemperatureC, SATURATION_SLACK, supersaturatedError } from './validate';

// Coefficients (a − b·t*)·Ws* − 1.006·(t − t*) over (a + 1.86·t − c·t*), eq. 33 (water) and eq. 35 (ice).
const A_WATER = 2501;
const B_WATER = 2.326;
const C_WATER = 4.186;
const A_ICE = 2830;
const B_ICE = 0.24;
const C_ICE = 2.1;
/** Round-off allowed below W = 0 when a wet-bulb is that of (nearly) dry air, kg/kg. */
export const DRY_AIR_SLACK = 1e-8;
/** Saturation pressure over ice at 0 °C, Pa (eq. 5), where the two psychrometric equations meet. */
const PWS_AT_0C = Math.exp(lnSaturationIceOrWater(FREEZING_POINT_C));

/**
 * W from the psychrometric equation, given Ws* at the wet-bulb. No checks: kernel for loops.
 * May be negative when the wet-bulb is too low for the dry-bulb (no such air).
 */
export function humidityRatioFromWetBulbUnchecked(tC: number, wetBulbC: number, pressurePa: number): number {
  const pws = Math.exp(lnSaturationIceOrWater(wetBulbC));
  const wsStar = (MOLAR_MASS_RATIO * pws) / (pressurePa - pws);
  return wetBulbC >= FREEZING_POINT_C
    ? ((A_WATER - B_WATER * wetBulbC) * wsStar - 1.006 * (tC - wetBulbC)) / (A_WATER + 1.86 * tC - C_WATER * wetBulbC)
    : ((A_ICE - B_ICE * wetBulbC) * wsStar - 1.006 * (tC - wetBulbC)) / (A_ICE + 1.86 * tC - C_ICE * wetBulbC);
}

/** W by eq. 35 (ice, a = 2830) or eq. 33 (water, a = 2501) at t* = 0 °C, where the two forms meet; ice gives the higher W. No checks. */
function humidityRatioAtFreezing(tC: number, pressurePa: number, a: number): number {
  const wsStar0 = (MOLAR_MASS_RATIO * PWS_AT_0C) / (pressurePa - PWS_AT_0C);
  return (a * wsStar0 - 1.006 * tC) / (a + 1.86 * tC);
}

/**
 * Root of the psychrometric equation for t* in [lo, hi], where W(lo) ≤ humidityRatio ≤ W(hi), starting
 * from `guess`. Eq. 33 and 35 multiplied out by their (positive) denominators both read
 *   F(t*) = (a − b·t*)·(Ws* − W) − (1.006 + 1.86·W)·(t − t*) = 0,
 * since c − b = 1.86 in both; Newton's method runs on this exact form (no quotient to differentiate),
 * with the bracket as a guard: a step that leaves it is replaced by halving.
 * Stops within about 1e-5 K of the root.
 */
function solveWetBulb(tC: number, humidityRatio: number, pressurePa: number, lo: number, hi: number, guess: number): number {
  const cpm = 1.006 + 1.86 * humidityRatio;
  let t = guess > lo && guess < hi ? guess : 0.5 * (lo + hi);
  for (let i = 0; i < 60; i++) {
    // ln pws and its slope on ASHRAE's switch, computed side by side: no shared state, nothing allocated.
    const tK = t + KELVIN_OFFSET;
    const overIce = t <= TRIPLE_POINT_C;
    const pws = Math.exp(overIce ? lnSaturationOverIce(tK) : lnSaturationOverWater(tK));
    const slope = overIce ? dLnSaturationOverIce(tK) : dLnSaturationOverWater(tK);
    const dry = pressurePa - pws;
    if (!(dry > 0)) {
      // Above the boiling point at this pressure: Ws* is unbounded, so the root is lower.
      hi = t;
      t = 0.5 * (lo + hi);
      continue;
    }
    const invDry = 1 / dry;
    const ws = MOLAR_MASS_RATIO * pws * invDry;
    const dWs = ws * slope * pressurePa * invDry;
    const water = t >= FREEZING_POINT_C;
    const b = water ? B_WATER : B_ICE;
    const latent = (water ? A_WATER : A_ICE) - b * t;
    const f = latent * (ws - humidityRatio) - cpm * (tC - t);
    if (f > 0) hi = t;
    else lo = t;
    const step = f / (latent * dWs - b * (ws - humidityRatio) + cpm);
    let next = t - step;
    if (next > lo && next < hi) {
      // Quadratic convergence: after a Newton step of size s the error is about c·s² with
      // c = F''/(2F') < 0.06 /K here, so a step below 0.01 K leaves less than 1e-5 K — provided the
      // step stays on one branch: F has kinks at 0 °C (eq. 33/35) and 0.01 °C (pws over ice/water).
      if (Math.abs(step) < 0.01 && (t - TRIPLE_POINT_C) * (next - TRIPLE_POINT_C) > 0 && t * next > 0) return next;
    } else {
      next = 0.5 * (lo + hi);
      if (hi - lo < 1e-9) return next;
    }
    t = next;
  }
  return t;
}

/**
 * Wet-bulb, °C, of air at dry-bulb tC with humidityRatio at pressurePa, given its saturation temperature
 * on ASHRAE's switch (`saturationC`: the dew point, or the frost point below 0.01 °C; NaN if unknown).
 * The root lies between that temperature and the dry-bulb.
 * - Near 0 °C eq. 33 and eq. 35 overlap: at t* = 0 the ice form gives the higher W, so some W have a root
 *   on each side of freezing. The engine takes the root over liquid water (t* ≥ 0 °C) whenever it exists:
 *   evaporative pads, wicks and tower fill carry liquid water. See {@link wetBulbRootsNearFreezing}.
 * - Below 0 °C air may hold more vapour than saturation over ice allows (relative humidity is over water,
 *   WMO-No. 8): then its frost point is above its dry-bulb and eq. 35's root would lie above the dry-bulb
 *   (an iced bulb gains vapour and warms, by at most about 0.35 K at 100 % RH over water). The engine
 *   returns the dry-bulb: such air has no wet-bulb depression to use.
 * No argument checks; returns NaN for NaN input. Expects W ≤ Ws(tC) over water.
 */
export function wetBulbUnchecked(tC: number, humidityRatio: number, pressurePa: number, saturationC: number): number {
  let lo = saturationC >= MIN_TEMPERATURE_C ? saturationC : MIN_TEMPERATURE_C;
  let hi = tC;
  if (!(hi > lo)) return tC;
  if (lo < FREEZING_POINT_C && hi > FREEZING_POINT_C) {
    if (humidityRatio >= humidityRatioAtFreezing(tC, pressurePa, A_WATER)) lo = FREEZING_POINT_C;
    else hi = FREEZING_POINT_C;
  }
  return solveFromSaturation(tC, humidityRatio, pressurePa, saturationC, lo, hi);
}

/** The wet-bulb in [lo, hi], starting from a guess expanded about the saturation temperature (when known). */
function solveFromSaturation(tC: number, humidityRatio: number, pressurePa: number, saturationC: number, lo: number, hi: number): number {
  let guess = Number.NaN;
  if (saturationC === saturationC) {
    // The psychrometric equation as L(t*)·(Ws* − W) = cpm·(t − t*) (see solveWetBulb), with Ws* about
    // the saturation temperature as W·exp(u), u = k·x + k2·x²/2, x = t* − td, k and k2 the first two
    // derivatives of ln Ws at td. Keeping u ≈ k·x and e^u ≈ 1 + u + u²/2 gives a quadratic in x; one Newton
    // step on the full model (L varying with t*, e^u to fifth order) then lands within 0.01 K of the root
    // for most air, so a single exact Newton step usually finishes the job.
    const pw = vapourPressureFromHumidityRatioUnchecked(humidityRatio, pressurePa);
    const invDry = 1 / (pressurePa - pw);
    const d1 = dLnSaturationIceOrWater(saturationC);
    const k = d1 * pressurePa * invDry;
    const k2 = d2LnSaturationIceOrWater(saturationC) * pressurePa * invDry + d1 * d1 * pressurePa * pw * invDry * invDry;
    const cpm = 1.006 + 1.86 * humidityRatio;
    const water = saturationC >= FREEZING_POINT_C;
    const b = water ? B_WATER : B_ICE;
    const latent0 = (water ? A_WATER : A_ICE) - b * saturationC;
    const latentW = latent0 * humidityRatio;
    const a1 = latentW * k + cpm;
    const depression = tC - saturationC;
    const x0 = (2 * cpm * depression) / (a1 + Math.sqrt(a1 * a1 + 2 * latentW * k * k * cpm * depression));
    const u = x0 * (k + 0.5 * k2 * x0);
    const du = k + k2 * x0;
    const expU1 = u * (1 + u * (0.5 + u * (1 / 6 + u * (1 / 24 + u / 120))));
    const dExpU1 = du * (1 + u * (1 + u * (0.5 + u * (1 / 6 + u / 24))));
    const latent = latent0 - b * x0;
    const model = latent * humidityRatio * expU1 - cpm * (depression - x0);
    const dModel = -b * humidityRatio * expU1 + latent * humidityRatio * dExpU1 + cpm;
    guess = saturationC + x0 - model / dModel;
  }
  return solveWetBulb(tC, humidityRatio, pressurePa, lo, hi, guess);
}

/**
 * Both wet-bulbs, °C, when the psychrometric equation has one on each side of 0 °C for this air
 * (eq. 35 over ice below, eq. 33 over water above, overlapping near freezing); null when there is one.
 * The engine's wet-bulb is `waterC` (pads and wicks carry liquid water).
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 33 and 35.
 */
export function wetBulbRootsNearFreezing(tC: number, humidityRatio: number, pressurePa: number): { iceC: number; waterC: number } | null {
  requireTemperatureC('tC', tC);
  requireHumidityRatio('humidityRatio', humidityRatio);
  requirePressurePa('pressurePa', pressurePa);
  if (!(tC > FREEZING_POINT_C)) return null;
  const ice0 = humidityRatioAtFreezing(tC, pressurePa, A_ICE);
  const water0 = humidityRatioAtFreezing(tC, pressurePa, A_WATER);
  if (!(humidityRatio > water0 && humidityRatio <= ice0)) return null;
  const pw = vapourPressureFromHumidityRatioUnchecked(humidityRatio, pressurePa);
  const frostC = pw > 0 ? frostOrDewPointAtLnPressure(Math.log(pw)) : Number.NaN;
  const lo = frostC >= MIN_TEMPERATURE_C ? frostC : MIN_TEMPERATURE_C;
  return {
    // The first guess from the frost point matters: a bare solve from it failed for nearly dry air, whose
    // frost point lies far below the root.
    iceC: solveFromSaturation(tC, humidityRatio, pressurePa, frostC, lo, FREEZING_POINT_C),
    waterC: wetBulbUnchecked(tC, humidityRatio, pressurePa, frostC),
  };
}

/**
 * Humidity ratio, kg/kg, of air at dry-bulb tC whose thermodynamic wet-bulb is wetBulbC.
 * @param tC dry-bulb, °C; @param wetBulbC thermodynamic wet-bulb, °C, ≤ tC
 * @param pressurePa barometric pressure, Pa, 10…120 kPa
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 33 (t* ≥ 0 °C) and eq. 35 (t* < 0 °C).
 */
export function humidityRatioFromWetBulb(tC: number, wetBulbC: number, pressurePa: number): number {
  requireTemperatureC('tC', tC);
  requireTemperatureC('wetBulbC', wetBulbC);
  requirePressurePa('pressurePa', pressurePa);
  if (wetBulbC > tC) throw supersaturatedError('wetBulbC', wetBulbC, `a wet-bulb above the dry-bulb ${tC} °C is not moist air`);
  if (Math.exp(lnSaturationIceOrWater(wetBulbC)) >= pressurePa) {
    throw new RangeError(`wetBulbC = ${wetBulbC} °C is at or above the boiling point at pressurePa = ${pressurePa} Pa`);
  }
  const w = humidityRatioFromWetBulbUnchecked(tC, wetBulbC, pressurePa);
  // A wet-bulb solved for dry air lies within 1e-5 K of the root, where W is within ±1e-8 of zero.
  if (w < 0 && w > -DRY_AIR_SLACK) return 0;
  if (w < 0) throw new RangeError(`wetBulbC = ${wetBulbC} °C is too low for dry-bulb ${tC} °C: even dry air has a higher wet-bulb`);
  return w;
}

/**
 * Thermodynamic wet-bulb, °C, of air at dry-bulb tC holding humidityRatio kg/kg at pressurePa.
 * Solved by Newton's method on the psychrometric equation (see {@link wetBulbUnchecked}: the root over
 * liquid water where two exist, the dry-bulb for air supersaturated over ice).
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 33 and 35.
 */
export function wetBulbFromHumidityRatio(tC: number, humidityRatio: number, pressurePa: number): number {
  requireTemperatureC('tC', tC);
  requireHumidityRatio('humidityRatio', humidityRatio);
  requirePressurePa('pressurePa', pressurePa);
  const pws = Math.exp(lnSaturationPressure(tC));
  const pw = vapourPressureFromHumidityRatioUnchecked(humidityRatio, pressurePa);
  if (pws < pressurePa && pw > pws * (1 + SATURATION_SLACK)) {
    throw supersaturatedError('humidityRatio', humidityRatio, `its vapour pressure exceeds saturation at ${tC} °C`);
  }
  const saturationC = pw > 0 ? frostOrDewPointAtLnPressure(Math.log(pw)) : Number.NaN;
  return wetBulbUnchecked(tC, humidityRatio, pressurePa, saturationC);
}
