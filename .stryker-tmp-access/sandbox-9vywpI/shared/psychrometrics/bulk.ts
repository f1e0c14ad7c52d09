/**
 * Bulk moist-air states for whole hourly series: Float64Array in, Float64Array out, one pass, no
 * object per hour. An hour whose inputs are missing (NaN) or invalid (out of range, supersaturated)
 * gets NaN in every output; the loop never throws. Same equations as the scalar API: relative humidity
 * and dew point over liquid water at every temperature, in and out (WMO-No. 8; see saturation.ts).
 */
// @ts-nocheck

import { CP_DRY_AIR, CP_VAPOUR, LATENT_HEAT_0C, MOLAR_MASS_RATIO } from './constants';
import { dewPointAtLnPressure, frostOrDewPointAtLnPressure, LN_TRIPLE_POINT_PRESSURE, lnSaturationPressure } from './saturation';
import { DRY_AIR_SLACK, humidityRatioFromWetBulbUnchecked, wetBulbUnchecked } from './wet-bulb';
import { isPressureOk, isTemperatureOk, requirePressurePa, SATURATION_SLACK } from './validate';

const SATURATION_OK = 1 + SATURATION_SLACK;

export type HumidityKind = 'relative-humidity-pct' | 'dew-point-c' | 'wet-bulb-c' | 'humidity-ratio-kgkg';

export interface BulkStateInput {
  dryBulbC: Float64Array;
  humidity: { kind: HumidityKind; values: Float64Array };
  /** One pressure per hour, or one pressure (Pa) for the whole series. */
  pressurePa: Float64Array | number;
}

export interface BulkState {
  humidityRatio: Float64Array;
  dewPointC: Float64Array;
  wetBulbC: Float64Array;
  rhPct: Float64Array;
  enthalpyKJPerKg: Float64Array;
}

const HUMIDITY_KINDS: readonly HumidityKind[] = ['relative-humidity-pct', 'dew-point-c', 'wet-bulb-c', 'humidity-ratio-kgkg'];

/**
 * Full state per hour (W, dew point, wet-bulb, RH, enthalpy) from dry-bulb, one humidity measure and pressure.
 * Throws only for structural mistakes found before the loop (unknown kind, arrays of different
 * lengths, a single pressure out of range); bad hours give NaN.
 * Sources: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 5, 6, 20, 22, 32, 33, 35, 36.
 */
export function bulkStates(input: BulkStateInput): BulkState {
  const { dryBulbC, humidity, pressurePa } = input;
  const kind = humidity.kind;
  if (!HUMIDITY_KINDS.includes(kind)) {
    throw new RangeError(`humidity.kind must be one of ${HUMIDITY_KINDS.join(', ')} (got ${String(kind)})`);
  }
  const n = dryBulbC.length;
  const values = humidity.values;
  if (values.length !== n) {
    throw new RangeError(`humidity.values has ${values.length} hours but dryBulbC has ${n}`);
  }
  const pressureSeries = typeof pressurePa === 'number' ? null : pressurePa;
  if (pressureSeries === null) requirePressurePa('pressurePa', pressurePa as number);
  else if (pressureSeries.length !== n) {
    throw new RangeError(`pressurePa has ${pressureSeries.length} hours but dryBulbC has ${n}`);
  }
  const fixedPressure = pressureSeries === null ? (pressurePa as number) : 0;
  const kindCode = HUMIDITY_KINDS.indexOf(kind);

  const wOut = new Float64Array(n);
  const dewOut = new Float64Array(n);
  const wbOut = new Float64Array(n);
  const rhOut = new Float64Array(n);
  const hOut = new Float64Array(n);

  for (let i = 0; i < n; i++) {
    const t = dryBulbC[i];
    const p = pressureSeries === null ? fixedPressure : pressureSeries[i];
    const v = values[i];
    let w = Number.NaN;
    let dew = Number.NaN;
    let wb = Number.NaN;
    let rh = Number.NaN;
    if (isTemperatureOk(t) && isPressureOk(p) && v === v) {
      const lnPws = lnSaturationPressure(t);
      const pws = Math.exp(lnPws);
      let pw = Number.NaN;
      let lnPw = Number.NaN;
      if (kindCode === 0) {
        if (v >= 0 && v <= 100) {
          rh = v;
          pw = (v / 100) * pws;
          if (pw > 0) lnPw = Math.log(v / 100) + lnPws;
        }
      } else if (kindCode === 1) {
        if (v <= t && isTemperatureOk(v)) {
          dew = v;
          lnPw = lnSaturationPressure(v);
          pw = Math.exp(lnPw);
        }
      } else if (kindCode === 2) {
        if (v <= t && isTemperatureOk(v)) {
          const wFromWb = humidityRatioFromWetBulbUnchecked(t, v, p);
          if (wFromWb > -DRY_AIR_SLACK) {
            wb = v;
            w = wFromWb > 0 ? wFromWb : 0;
            pw = (p * w) / (MOLAR_MASS_RATIO + w);
          }
        }
      } else if (v >= 0) {
        pw = (p * v) / (MOLAR_MASS_RATIO + v);
        if (pw <= pws * SATURATION_OK) w = v;
        else pw = Number.NaN;
      }
      if (pw >= 0 && pw < p) {
        if (w !== w) w = (MOLAR_MASS_RATIO * pw) / (p - pw);
        if (rh !== rh) rh = Math.min((100 * pw) / pws, 100);
        if (pw > 0) {
          if (lnPw !== lnPw) lnPw = Math.log(pw);
          if (dew !== dew) dew = dewPointAtLnPressure(lnPw);
          if (dew > t) dew = t;
          // The wet-bulb solver starts from the saturation temperature on ASHRAE's switch: below the
          // triple point that is the frost point, not the dew point over water.
          if (wb !== wb) wb = wetBulbUnchecked(t, w, p, lnPw > LN_TRIPLE_POINT_PRESSURE ? dew : frostOrDewPointAtLnPressure(lnPw));
        } else if (wb !== wb) {
          wb = wetBulbUnchecked(t, w, p, Number.NaN);
        }
      } else {
        w = Number.NaN;
        dew = Number.NaN;
        wb = Number.NaN;
        rh = Number.NaN;
      }
    }
    wOut[i] = w;
    dewOut[i] = dew;
    wbOut[i] = wb;
    rhOut[i] = rh;
    hOut[i] = CP_DRY_AIR * t + w * (LATENT_HEAT_0C + CP_VAPOUR * t);
  }
  return { humidityRatio: wOut, dewPointC: dewOut, wetBulbC: wbOut, rhPct: rhOut, enthalpyKJPerKg: hOut };
}
