// @ts-nocheck
// The command line's hourly file, written the straightforward way with psychrolib (the reference library): the yardstick
// the command-line bench holds `tramontane-estimate --hourly` against (tests/bench/command-line.bench.ts). Same rules as
// the engine for the bench's design — a direct-air system with an evaporative stage, canonical CSV weather (UTC
// timestamps, dry-bulb °C, RH % over liquid water), no station pressure — written out hour by hour from psychrolib's
// functions, so it shares no code with shared/. Reads with papaparse's fast path, writes one string per row.
//   node psychrolib-estimate.mjs WEATHER.csv SCENARIO.json OUT.csv
import { readFileSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';

const require = createRequire(import.meta.url);
const Papa = require('papaparse');
const psy = require('psychrolib');
psy.SetUnitSystem(psy.SI);

const [weatherFile, scenarioFile, outFile] = process.argv.slice(2);
const scenario = JSON.parse(readFileSync(scenarioFile, 'utf8'));
const { envelope, system, energy } = scenario;
if (system.kind !== 'direct-air') throw new Error('this yardstick re-implements the direct-air rules only');

// Saturation over liquid water, Pa: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 6, also below 0 °C (WMO-No. 8's
// convention for RH and dew point), where psychrolib switches to ice.
const pwsWater = (tC) => {
  const T = tC + 273.15;
  return Math.exp(-5.8002206e3 / T + 1.3914993 - 4.8640239e-2 * T + 4.1764768e-5 * T * T - 1.4452093e-8 * T * T * T + 6.5459673 * Math.log(T));
};
const wFromRh = (t, rhPct, p) => (t > 0.01 ? psy.GetHumRatioFromRelHum(t, rhPct / 100, p) : psy.GetHumRatioFromVapPres((rhPct / 100) * pwsWater(t), p));
const wFromDewPoint = (td, p) => (td > 0.01 ? psy.GetHumRatioFromTDewPoint(td, p) : psy.GetHumRatioFromVapPres(pwsWater(td), p));
/** Dew point over liquid water, °C: psychrolib above 0.01 °C, bisection on eq. 6 below. */
function dewPointC(t, w, p) {
  const pw = psy.GetVapPresFromHumRatio(w, p);
  if (pw > pwsWater(0.01)) return psy.GetTDewPointFromVapPres(t, pw);
  let lo = -100;
  let hi = 0.01;
  while (hi - lo > 1e-6) {
    const mid = 0.5 * (lo + hi);
    if (pwsWater(mid) > pw) hi = mid;
    else lo = mid;
  }
  return 0.5 * (lo + hi);
}
/** Wet-bulb, °C; the dry-bulb for air above saturation over ice (possible with RH over water below 0 °C). */
function wetBulbC(t, w, p) {
  if (t <= 0.01 && w >= psy.GetHumRatioFromVapPres(psy.GetSatVapPres(t), p)) return t;
  return psy.GetTWetBulbFromHumRatio(t, w, p);
}
const enthalpy = (t, w) => psy.GetMoistAirEnthalpy(t, w) / 1000;

const p = psy.GetStandardAtmPressure(scenario.elevationM);
const fanHeatK = energy.fanPowerFraction * system.itDeltaTK;
const supplyC = system.supplyAirC;
const offCoilC = supplyC - fanHeatK;
const returnC = supplyC + system.itDeltaTK;
const eps = system.evaporativeEffectiveness;
const highW = Math.min(wFromDewPoint(envelope.dewPointMaxC, p), wFromRh(supplyC, envelope.rhMaxPct, p));
const lowW = Math.max(wFromDewPoint(envelope.dewPointMinC, p), wFromRh(supplyC, envelope.rhMinPct, p));
const highDewPointC = dewPointC(supplyC, highW, p);
const lineW = (tC, twb) => psy.GetHumRatioFromTWetBulb(Math.max(tC, twb), twb, p);

/** Mode and compressor share of one hour, by the direct-air rules (README, "How it works"). */
function classify(t, w, twb) {
  if (w <= highW && t <= offCoilC) return { mode: 'free', fraction: 0, humidified: w < lowW && eps > 0 ? 1 : 0 };
  if (w <= highW && eps > 0 && t - eps * (t - twb) <= offCoilC && lineW(offCoilC, twb) <= highW) return { mode: 'adiabatic', fraction: 0, humidified: 0 };
  // mechanical: the evaporative stage runs as far as the moisture limit allows
  let enteringC = t;
  let enteringW = w;
  if (eps > 0 && w < highW) {
    const fullC = t - eps * (t - twb);
    const fullW = lineW(fullC, twb);
    if (fullW <= highW) {
      enteringC = fullC;
      enteringW = fullW;
    } else {
      // where the wet-bulb line reaches highW, ASHRAE 2017 ch. 1 eq. 33 solved for t
      const wsStar = lineW(twb, twb);
      const limitC = ((2501 - 2.326 * twb) * wsStar + 1.006 * twb - highW * (2501 - 4.186 * twb)) / (1.006 + 1.86 * highW);
      if (limitC < t) {
        enteringC = limitC;
        enteringW = highW;
      }
    }
  }
  const hallW = Math.min(w, highW);
  const recirculation = enthalpy(returnC, hallW) - enthalpy(offCoilC, hallW);
  let outdoor;
  if (w <= highW) outdoor = enthalpy(enteringC, enteringW) - enthalpy(offCoilC, enteringW);
  else if (highDewPointC < offCoilC) outdoor = ((returnC - offCoilC) / (returnC - highDewPointC)) * (enthalpy(t, w) - enthalpy(highDewPointC, highW));
  else outdoor = enthalpy(t, w) - enthalpy(offCoilC, highW);
  return { mode: 'mechanical', fraction: Math.min(1, Math.max(0, Math.min(outdoor, recirculation) / recirculation)), humidified: 0 };
}

const rows = Papa.parse(readFileSync(weatherFile, 'utf8').trimEnd(), { delimiter: ',', fastMode: true }).data;
const out = [
  'timestamp,mode,dry_bulb_c,wet_bulb_c,dew_point_c,relative_humidity_pct,humidity_ratio_gkg,enthalpy_kjkg,mechanical_fraction,humidified,local_standard_time',
];
for (let r = 1; r < rows.length; r++) {
  const [stamp, tText, rhText] = rows[r];
  const iso = new Date(Date.parse(stamp)).toISOString();
  const t = Number(tText);
  const rh = Number(rhText);
  const w = wFromRh(t, rh, p);
  const twb = wetBulbC(t, w, p);
  const { mode, fraction, humidified } = classify(t, w, twb);
  out.push(
    `${iso.slice(0, 16)}Z,${mode},${t.toFixed(2)},${twb.toFixed(2)},${dewPointC(t, w, p).toFixed(2)},${rh.toFixed(2)},${(w * 1000).toFixed(3)},${enthalpy(t, w).toFixed(2)},${fraction.toFixed(3)},${humidified},${iso.slice(0, 16)}`,
  );
}
writeFileSync(outFile, `${out.join('\n')}\n`);
