/**
 * The engine against an independent calculation: the classification rules of the scenario issue
 * written again here, hour by hour, on psychrolib's moist-air states (the reference library
 * implementing ASHRAE Handbook—Fundamentals 2017 ch. 1), for three synthetic climates and all
 * three system kinds. Agreement is expected to the last hour except where an hour sits within
 * the libraries' tolerance (wet-bulb 0.005 K) of a threshold.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { MODE, runScenario, type SingleScenario } from '../../../shared/scenario';
import { makeScenario, psy, wetBulbOf, wFromDewPoint, wFromRh } from './fixtures';
import { HOT_DRY_HIGH, HOT_HUMID, MILD_MARITIME, syntheticSeries } from './synthetic-climate';

const CLIMATES = [MILD_MARITIME, HOT_HUMID, HOT_DRY_HIGH];

interface ReferenceHour {
  mode: number;
  fraction: number;
  humidified?: boolean;
}

/**
 * Hall-side effectiveness of a cross-flow exchanger, both streams unmixed, at scavenger-to-hall ratio r, from
 * its rated effectiveness at r = 1 with UA held: ε = 1 − exp[(1/Cr)·NTU^0.22·(exp(−Cr·NTU^0.78) − 1)]
 * (Incropera et al., "Fundamentals of Heat and Mass Transfer", Table 11.3), NTU₁ found by bisection.
 */
function hallEffectiveness(rated: number, r: number): number {
  const eps = (ntu: number, cr: number) => 1 - Math.exp((Math.pow(ntu, 0.22) * (Math.exp(-cr * Math.pow(ntu, 0.78)) - 1)) / cr);
  let lo = 0;
  let hi = 200;
  for (let k = 0; k < 200; k++) {
    const mid = (lo + hi) / 2;
    if (eps(mid, 1) < rated) lo = mid;
    else hi = mid;
  }
  const ntu1 = (lo + hi) / 2;
  const cmin = Math.min(r, 1);
  return r === 1 ? rated : eps(ntu1 / cmin, Math.min(r, 1 / r)) * cmin;
}

/** Dry-bulb on the wet-bulb line twb where W reaches wTarget, by bisection on psychrolib's line. */
function wbLineAtW(wTarget: number, twb: number, tMax: number, p: number): number {
  let lo = twb;
  let hi = tMax;
  for (let k = 0; k < 60; k++) {
    const mid = (lo + hi) / 2;
    if (psy.GetHumRatioFromTWetBulb(mid, twb, p) > wTarget) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

const h = (t: number, w: number) => psy.GetMoistAirEnthalpy(t, w) / 1000;
const wbLine = (t: number, twb: number, p: number) => psy.GetHumRatioFromTWetBulb(t, twb, p);
const clamp01 = (x: number) => Math.min(1, Math.max(0, x));

/** The rules for one hour, on psychrolib states. */
function referenceHour(scenario: SingleScenario, t: number, w: number, twb: number, p: number): ReferenceHour {
  const s = scenario.system;
  const e = scenario.envelope;
  const Ts = s.supplyAirC;
  const f = scenario.energy.fanPowerFraction * s.itDeltaTK; // fan heat = P_fan / (ṁ·cp) = fanPowerFraction · ΔT_IT
  const eps = s.evaporativeEffectiveness;
  const Tr = Ts + s.itDeltaTK;
  if (s.kind === 'direct-air') {
    // Envelope dew points are over liquid water also below 0 °C (WMO-No. 8), as the engine reads them (fixtures.ts).
    const wHi = Math.min(wFromDewPoint(e.dewPointMaxC, p), psy.GetHumRatioFromRelHum(Ts, e.rhMaxPct / 100, p));
    const wLo = Math.max(wFromDewPoint(e.dewPointMinC, p), psy.GetHumRatioFromRelHum(Ts, e.rhMinPct / 100, p));
    const offCoil = Ts - f;
    let mode: number;
    if (w > wHi) mode = MODE.mechanical;
    // Too dry but cool enough: free cooling, humidified when there is a stage (engine 2.0.0; adiabatic in 1.0.0).
    else if (t + f <= Ts) return { mode: MODE.free, fraction: 0, humidified: w < wLo && eps > 0 };
    else if (eps > 0 && t - eps * (t - twb) <= offCoil && wbLine(offCoil, twb, p) <= wHi) mode = MODE.adiabatic;
    else mode = MODE.mechanical;
    if (mode !== MODE.mechanical) return { mode, fraction: 0 };
    const hallW = Math.min(w, wHi);
    const recirculation = h(Tr, hallW) - h(offCoil, hallW);
    let outdoor: number;
    if (w <= wHi) {
      let tIn = t;
      let wIn = w;
      // The stage runs at full effectiveness while the wetted air stays at or below W_hi, else only up to W_hi
      // (modulated to the moisture limit, engine 2.0.0; off in 1.0.0).
      if (eps > 0 && wbLine(t - eps * (t - twb), twb, p) <= wHi) {
        tIn = t - eps * (t - twb);
        wIn = wbLine(tIn, twb, p);
      } else if (eps > 0 && w < wHi) {
        tIn = wbLineAtW(wHi, twb, t, p);
        wIn = wHi;
      }
      outdoor = h(tIn, wIn) - h(offCoil, wIn);
    } else {
      const tDew = psy.GetTDewPointFromHumRatio(Ts, wHi, p);
      outdoor = ((Tr - offCoil) / (Tr - tDew)) * (h(t, w) - h(tDew, wHi));
    }
    return { mode, fraction: clamp01(Math.min(outdoor, recirculation) / recirculation) };
  }
  if (s.kind === 'indirect-air') {
    const hx = hallEffectiveness(s.heatExchangerEffectiveness, s.scavengerAirRatio);
    const supply = (scavenger: number) => Tr - hx * (Tr - scavenger) + f;
    if (supply(t) <= Ts) return { mode: MODE.free, fraction: 0 };
    const wet = supply(t - eps * (t - twb));
    if (eps > 0 && wet <= Ts) return { mode: MODE.adiabatic, fraction: 0 };
    const best = eps > 0 ? wet : supply(t);
    return { mode: MODE.mechanical, fraction: best >= Tr + f ? 1 : (best - Ts) / (Tr + f - Ts) };
  }
  const tower = s.heatRejection === 'cooling-tower';
  // Below the freeze-protection wet-bulb the tower runs dry: its water approaches the dry-bulb.
  const water = (tower && twb >= s.freezeProtectionWetBulbC ? twb : t) + s.approachK;
  if (water <= s.chilledWaterSupplyC) return { mode: MODE.free, fraction: 0 };
  if (tower || eps === 0) return { mode: MODE.mechanical, fraction: clamp01((water - s.chilledWaterSupplyC) / s.chilledWaterDeltaTK) };
  const wetWater = t - eps * (t - twb) + s.approachK;
  if (wetWater <= s.chilledWaterSupplyC) return { mode: MODE.adiabatic, fraction: 0 };
  return { mode: MODE.mechanical, fraction: clamp01((wetWater - s.chilledWaterSupplyC) / s.chilledWaterDeltaTK) };
}

const SCENARIOS: Record<string, (elevationM: number) => SingleScenario> = {
  'direct-air': (elevationM) => makeScenario('direct-air', { elevationM, system: { supplyAirC: 24, evaporativeEffectiveness: 0.8 } }),
  'direct-air, no evaporative stage': (elevationM) => makeScenario('direct-air', { elevationM, system: { evaporativeEffectiveness: 0 } }),
  'indirect-air': (elevationM) => makeScenario('indirect-air', { elevationM, system: { evaporativeEffectiveness: 0.75, heatExchangerEffectiveness: 0.65 } }),
  'indirect-air, half the scavenger air': (elevationM) =>
    makeScenario('indirect-air', { elevationM, system: { evaporativeEffectiveness: 0.75, heatExchangerEffectiveness: 0.65, scavengerAirRatio: 0.5 } }),
  'water-side dry cooler': (elevationM) => makeScenario('water-side', { elevationM, system: { heatRejection: 'dry-cooler', evaporativeEffectiveness: 0.7 } }),
  'water-side cooling tower': (elevationM) =>
    makeScenario('water-side', { elevationM, system: { heatRejection: 'cooling-tower', evaporativeEffectiveness: 0 } }),
};

describe.each(CLIMATES.map((c, i) => [c.name, c, i] as const))('%s', (_name, climate, index) => {
  // Every 4th hour of a year: 2190 hours over all seasons and times of day.
  const series = syntheticSeries(climate, { hours: 8760, step: 4, seed: 17 + index });
  const p = psy.GetStandardAtmPressure(climate.elevationM);
  const reference = Array.from(series.dryBulbC, (t, k) => {
    // RH over liquid water at every temperature: psychrolib is fed the vapour pressure over water below 0.01 °C (fixtures.ts).
    const w = wFromRh(t, series.humidity.values[k], p);
    return { t, w, twb: wetBulbOf(t, w, p) };
  });

  it.each(Object.keys(SCENARIOS))('%s agrees with the independent calculation', (key) => {
    const scenario = SCENARIOS[key](climate.elevationM);
    const run = runScenario(scenario, series);
    let modeMismatches = 0;
    let maxFractionError = 0;
    const counts = [0, 0, 0, 0];
    let humidifiedMismatches = 0;
    reference.forEach(({ t, w, twb }, k) => {
      const expected = referenceHour(scenario, t, w, twb, p);
      counts[expected.mode]++;
      if ((run.classification.humidified[k] === 1) !== (expected.humidified ?? false)) humidifiedMismatches++;
      if (run.classification.modes[k] !== expected.mode) modeMismatches++;
      else maxFractionError = Math.max(maxFractionError, Math.abs(run.classification.mechanicalFraction[k] - expected.fraction));
    });
    // At most 1 hour in 1000 may fall on the other side of a threshold through library tolerances.
    expect(modeMismatches).toBeLessThanOrEqual(Math.ceil(reference.length / 1000));
    expect(humidifiedMismatches).toBeLessThanOrEqual(Math.ceil(reference.length / 1000));
    expect(maxFractionError).toBeLessThan(1e-3);
    expect(run.results.hours.noData).toBe(0);
    // Each climate and design exercises at least two modes, so agreement is not trivial.
    expect(counts.filter((c) => c > 0).length).toBeGreaterThanOrEqual(2);
    expect(Math.abs(run.results.hours.mechanical - counts[MODE.mechanical])).toBeLessThanOrEqual(Math.ceil(reference.length / 1000));
  });
});
