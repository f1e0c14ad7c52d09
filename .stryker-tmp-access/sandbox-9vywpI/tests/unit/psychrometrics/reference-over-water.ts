/**
 * Saturation over liquid water below 0 °C, evaluated here apart from the engine, for tests and the
 * benchmark. psychrolib cannot give it: its GetSatVapPres switches to ice at 0.01 °C (as ASHRAE's tables
 * do), so it is no reference over water below freezing. Two outside forms:
 * - Hyland–Wexler eq. 6 of ASHRAE Handbook—Fundamentals (2017) ch. 1 written out term by term from the
 *   Handbook's coefficients C8…C13 and extended below 0 °C (an extrapolation of the equation's stated
 *   0…200 °C range, as the engine does);
 * - the Magnus-type formula over water of WMO-No. 8 (2018) Annex 4.B, ew(t) = 6.112 hPa ·
 *   exp(17.62·t / (243.12 + t)), stated for −45…60 °C (formula and range recalled from memory).
 * The dew point over water is found by bisection, not Newton, so it shares no solver with the engine.
 */
// @ts-nocheck


/** pws over liquid water, Pa: ASHRAE 2017 ch. 1 eq. 6, ln pws = C8/T + C9 + C10·T + C11·T² + C12·T³ + C13·ln T. */
export function hylandWexlerWaterPa(tC: number): number {
  const T = tC + 273.15;
  const C8 = -5.8002206e3;
  const C9 = 1.3914993;
  const C10 = -4.8640239e-2;
  const C11 = 4.1764768e-5;
  const C12 = -1.4452093e-8;
  const C13 = 6.5459673;
  return Math.exp(C8 / T + C9 + C10 * T + C11 * T ** 2 + C12 * T ** 3 + C13 * Math.log(T));
}

/** pws over ice, Pa: ASHRAE 2017 ch. 1 eq. 5 written out from its coefficients C1…C7. */
export function hylandWexlerIcePa(tC: number): number {
  const T = tC + 273.15;
  return Math.exp(
    -5.6745359e3 / T + 6.3925247 - 9.677843e-3 * T + 6.2215701e-7 * T ** 2 + 2.0747825e-9 * T ** 3 - 9.484024e-13 * T ** 4 + 4.1635019 * Math.log(T),
  );
}

/** pws over liquid water, Pa, by the WMO-No. 8 Annex 4.B formula (recalled; stated for −45…60 °C). */
export function wmoWaterPa(tC: number): number {
  return 611.2 * Math.exp((17.62 * tC) / (243.12 + tC));
}

/** Dew point over liquid water, °C, of vapour pressure pwPa: bisection on {@link hylandWexlerWaterPa} to 1e-9 K. */
export function dewPointOverWaterC(pwPa: number): number {
  let lo = -100;
  let hi = 200;
  while (hi - lo > 1e-9) {
    const mid = 0.5 * (lo + hi);
    if (hylandWexlerWaterPa(mid) > pwPa) hi = mid;
    else lo = mid;
  }
  return 0.5 * (lo + hi);
}
