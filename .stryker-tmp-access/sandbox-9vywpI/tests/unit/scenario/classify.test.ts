/**
 * Every classification rule of the scenario issue with a worked example. The test computes the
 * rule's quantities itself — moisture limits and wet-bulb-line states from psychrolib (ASHRAE
 * Handbook—Fundamentals 2017 ch. 1 equations), temperatures by the rule's arithmetic — asserts
 * which side of each threshold the hour falls on, then checks the engine's verdict.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { classifyHours, EXCURSION, MODE, moistureTargets, type InletLimits } from '../../../shared/scenario/classify';
import {
  makeScenario,
  outdoorHours,
  plantOf,
  psy,
  RECOMMENDED,
  SEA_LEVEL_PA,
  stateFromDewPoint,
  stateFromWetBulb,
  wFromDewPoint,
  type ReferenceState,
} from './fixtures';

const p = SEA_LEVEL_PA;
const limits: InletLimits = RECOMMENDED;

function classifyOne(scenario: ReturnType<typeof makeScenario>, state: ReferenceState, envelope: InletLimits = limits) {
  const out = classifyHours(scenario.system, envelope, outdoorHours([state]), plantOf(scenario));
  return {
    mode: out.modes[0],
    fraction: out.mechanicalFraction[0],
    excursion: out.excursions[0],
    evaporation: out.evaporationKgPerKgAir[0],
    humidified: out.humidified[0],
  };
}

describe('direct-air (Ts 24 °C, fan heat 1 K, ΔT 12 K, 2021 recommended envelope at sea level)', () => {
  const Ts = 24;
  const f = 1;
  const Tr = Ts + 12;
  // W_hi = min(W at 15 °C dew point, W at 24 °C and 70 % RH); W_lo = max(W at −9 °C dew point, W at 0 % RH).
  // The −9 °C dew point is over liquid water (WMO-No. 8), as the engine reads envelope limits: 1.91 g/kg, not the
  // 1.75 g/kg of a −9 °C frost point this test used when the engine read sub-zero dew points over ice.
  const wHi = Math.min(psy.GetHumRatioFromTDewPoint(15, p), psy.GetHumRatioFromRelHum(Ts, 0.7, p));
  const wLo = Math.max(wFromDewPoint(-9, p), 0);
  const withEvap = makeScenario('direct-air', { system: { evaporativeEffectiveness: 0.8 } });
  const dry = makeScenario('direct-air', { system: { evaporativeEffectiveness: 0 } });

  it('has the moisture limits the rule defines: the engine’s targets equal the psychrolib values', () => {
    // W at 15 °C dew point ≈ 10.65 g/kg is smaller than W at (24 °C, 70 %) ≈ 13.1 g/kg, so the dew point binds.
    expect(wHi * 1000).toBeCloseTo(10.65, 2);
    expect(wLo * 1000).toBeCloseTo(1.91, 2);
    const targets = moistureTargets(limits, Ts, p);
    expect(targets.highW).toBeCloseTo(wHi, 7);
    expect(targets.lowW).toBeCloseTo(wLo, 7);
    // The coil leaves at the dew point of W_hi: 15 °C, the dew-point limit that binds.
    expect(targets.highDewPointC).toBeCloseTo(15, 3);
  });

  it('rule 1: W above W_hi is mechanical (the coil must dehumidify)', () => {
    const hour = stateFromDewPoint(20, 17);
    expect(hour.w).toBeGreaterThan(wHi);
    expect(classifyOne(withEvap, hour).mode).toBe(MODE.mechanical);
  });

  it('rule 1 fraction: humid air cooled to the dew point of W_hi and mixed with return air', () => {
    const hour = stateFromDewPoint(20, 17);
    const tDew = psy.GetTDewPointFromHumRatio(20, wHi, p);
    const offCoil = Ts - f;
    const share = (Tr - offCoil) / (Tr - tDew);
    const outdoorLoad = (share * (psy.GetMoistAirEnthalpy(hour.t, hour.w) - psy.GetMoistAirEnthalpy(tDew, wHi))) / 1000;
    const recirculationLoad = (psy.GetMoistAirEnthalpy(Tr, wHi) - psy.GetMoistAirEnthalpy(offCoil, wHi)) / 1000;
    expect(classifyOne(withEvap, hour).fraction).toBeCloseTo(Math.min(1, outdoorLoad / recirculationLoad), 3);
  });

  it('rule 2: T + f ≤ Ts and W ≥ W_lo is free cooling', () => {
    const hour = stateFromDewPoint(10, 5);
    expect(hour.t + f).toBeLessThanOrEqual(Ts);
    expect(hour.w).toBeGreaterThanOrEqual(wLo);
    const r = classifyOne(withEvap, hour);
    expect(r.mode).toBe(MODE.free);
    expect(r.fraction).toBe(0);
    expect(r.excursion).toBe(0);
  });

  // Engine 2.0.0: this hour was "adiabatic assist" in 1.0.0; the stage only adds moisture, so it is free cooling
  // with humidification (issue 12 §2), and the outdoor share now comes from an enthalpy balance, not a dry-bulb one.
  it('rule 2: too dry with an evaporative stage is free cooling with humidification, the outdoor share humidified to W_lo', () => {
    const hour = stateFromDewPoint(-5, -20);
    expect(hour.w).toBeLessThan(wLo);
    const r = classifyOne(withEvap, hour);
    expect(r.mode).toBe(MODE.free);
    expect(r.humidified).toBe(1);
    // Outdoor share x from h(Ts − f, W_lo) = x·h_out + (1 − x)·h(Tr, W_lo): the mix is humidified at constant enthalpy.
    const hOf = (t: number, w: number) => psy.GetMoistAirEnthalpy(t, w) / 1000;
    const share = (hOf(Tr, wLo) - hOf(Ts - f, wLo)) / (hOf(Tr, wLo) - hOf(hour.t, hour.w));
    expect(share).toBeGreaterThan(0);
    expect(share).toBeLessThan((Tr - (Ts - f)) / (Tr - hour.t)); // less outdoor air than a dry-bulb balance gives
    expect(r.evaporation).toBeCloseTo(share * (wLo - hour.w), 7);
    expect(r.excursion).toBe(0);
  });

  it('rule 2: too dry without an evaporative stage is free cooling flagged as a low-humidity excursion', () => {
    const r = classifyOne(dry, stateFromDewPoint(-5, -20));
    expect(r.mode).toBe(MODE.free);
    expect(r.excursion & EXCURSION.lowHumidity).toBe(EXCURSION.lowHumidity);
  });

  it('rule 3: warm and dry enough is adiabatic assist when ε can reach Ts − f and the leaving W ≤ W_hi', () => {
    const hour = stateFromDewPoint(30, 2);
    const reached = hour.t - 0.8 * (hour.t - hour.twb);
    expect(reached).toBeLessThanOrEqual(Ts - f);
    // Air leaving at Ts − f on the outdoor wet-bulb line (ASHRAE 2017 ch. 1 eq. 33 via psychrolib).
    const leavingW = psy.GetHumRatioFromTWetBulb(Ts - f, hour.twb, p);
    expect(leavingW).toBeLessThanOrEqual(wHi);
    const r = classifyOne(withEvap, hour);
    expect(r.mode).toBe(MODE.adiabatic);
    expect(r.evaporation).toBeCloseTo(leavingW - hour.w, 6);
  });

  it('rule 3: without an evaporative stage the same hour is mechanical, fraction (T − (Ts − f)) / (Tr − (Ts − f))', () => {
    const hour = stateFromDewPoint(30, 2);
    const r = classifyOne(dry, hour);
    expect(r.mode).toBe(MODE.mechanical);
    // Same humidity ratio on both sides, so cp cancels: (30 − 23) / (36 − 23).
    expect(r.fraction).toBeCloseTo(7 / 13, 6);
  });

  // Engine 2.0.0: the stage is modulated to the moisture limit in mechanical hours (issue 12 §5) instead of staying off.
  it('rule 3: ε reaches Ts − f but the leaving air is too humid, so mechanical with the stage modulated to W_hi', () => {
    const hour = stateFromDewPoint(35, 10);
    expect(hour.w).toBeLessThanOrEqual(wHi);
    expect(hour.t - 0.8 * (hour.t - hour.twb)).toBeLessThanOrEqual(Ts - f);
    expect(psy.GetHumRatioFromTWetBulb(Ts - f, hour.twb, p)).toBeGreaterThan(wHi);
    const r = classifyOne(withEvap, hour);
    expect(r.mode).toBe(MODE.mechanical);
    // The stage wets the air along its wet-bulb line only until W = W_hi: find that dry-bulb with psychrolib by bisection.
    let lo = hour.twb;
    let hi = hour.t;
    for (let k = 0; k < 60; k++) {
      const mid = (lo + hi) / 2;
      if (psy.GetHumRatioFromTWetBulb(mid, hour.twb, p) > wHi) lo = mid;
      else hi = mid;
    }
    const enteringC = (lo + hi) / 2;
    const hOf = (t: number, w: number) => psy.GetMoistAirEnthalpy(t, w) / 1000;
    const outdoorLoad = hOf(enteringC, wHi) - hOf(Ts - f, wHi);
    const recirculationLoad = hOf(Tr, hour.w) - hOf(Ts - f, hour.w);
    expect(r.fraction).toBeCloseTo(outdoorLoad / recirculationLoad, 4);
    expect(r.fraction).toBeLessThan((35 - 23) / 13); // better than the unwetted air
    expect(r.evaporation).toBeCloseTo(wHi - hour.w, 6);
  });

  it('rule 3: ε cannot reach Ts − f, so mechanical with the pre-cooled outdoor air easing the coil', () => {
    const halfEvap = makeScenario('direct-air', { system: { evaporativeEffectiveness: 0.5 } });
    const hour = stateFromWetBulb(40, 18);
    const preCooled = hour.t - 0.5 * (hour.t - hour.twb);
    expect(preCooled).toBeGreaterThan(Ts - f);
    const preCooledW = psy.GetHumRatioFromTWetBulb(preCooled, hour.twb, p);
    expect(preCooledW).toBeLessThanOrEqual(wHi);
    const r = classifyOne(halfEvap, hour);
    expect(r.mode).toBe(MODE.mechanical);
    const load = (psy.GetMoistAirEnthalpy(preCooled, preCooledW) - psy.GetMoistAirEnthalpy(Ts - f, preCooledW)) / 1000;
    const recirculation = (psy.GetMoistAirEnthalpy(Tr, hour.w) - psy.GetMoistAirEnthalpy(Ts - f, hour.w)) / 1000;
    expect(r.fraction).toBeCloseTo(load / recirculation, 4);
    expect(r.evaporation).toBeCloseTo(preCooledW - hour.w, 6);
  });

  it('hot outdoor air above the return temperature: the coil works on return air, fraction 1', () => {
    expect(classifyOne(dry, stateFromDewPoint(42, 5)).fraction).toBe(1);
  });

  it('a supply above the envelope maximum flags every hour', () => {
    const r = classifyOne(withEvap, stateFromDewPoint(10, 5), { ...limits, dryBulbMaxC: 23 });
    expect(r.excursion & EXCURSION.supplyAboveMax).toBe(EXCURSION.supplyAboveMax);
  });
});

describe('indirect-air (Ts 24, ΔT 12 so Tr 36, f 1, ε_hx 0.7)', () => {
  const withEvap = makeScenario('indirect-air', { system: { evaporativeEffectiveness: 0.8 } });
  const dry = makeScenario('indirect-air', { system: { evaporativeEffectiveness: 0 } });
  const supply = (scavengerC: number) => 36 - 0.7 * (36 - scavengerC) + 1;

  it('free cooling when the dry exchanger supply ≤ Ts', () => {
    expect(supply(10)).toBeCloseTo(18.8, 10);
    expect(classifyOne(withEvap, stateFromDewPoint(10, 0)).mode).toBe(MODE.free);
  });

  it('adiabatic assist when only the wetted scavenger air (T − ε(T − Twb)) gets the supply to Ts', () => {
    const hour = stateFromWetBulb(20, 14);
    expect(supply(20)).toBeCloseTo(25.8, 10);
    expect(supply(20 - 0.8 * 6)).toBeCloseTo(22.44, 10);
    const r = classifyOne(withEvap, hour);
    expect(r.mode).toBe(MODE.adiabatic);
    // The wetted stage is modulated to the scavenger temperature that just gives Ts: 36 − 13/0.7.
    const neededC = 36 - 13 / 0.7;
    expect(r.evaporation).toBeCloseTo(psy.GetHumRatioFromTWetBulb(neededC, 14, p) - hour.w, 6);
    expect(classifyOne(dry, hour).mode).toBe(MODE.mechanical);
  });

  it('mechanical with the exchanger carrying part: fraction (supply − Ts) / (ΔT + f)', () => {
    const hour = stateFromWetBulb(30, 22);
    const wet = supply(30 - 0.8 * 8);
    expect(wet).toBeCloseTo(28.32, 10);
    const r = classifyOne(withEvap, hour);
    expect(r.mode).toBe(MODE.mechanical);
    expect(r.fraction).toBeCloseTo((28.32 - 24) / 13, 10);
    expect(classifyOne(dry, hour).fraction).toBeCloseTo((supply(30) - 24) / 13, 10);
  });

  it('an exchanger that would heat the hall air is bypassed: fraction 1', () => {
    expect(supply(40)).toBeGreaterThan(37);
    expect(classifyOne(dry, stateFromWetBulb(40, 20)).fraction).toBe(1);
  });

  it('never flags hall humidity (outdoor air does not enter)', () => {
    expect(classifyOne(dry, stateFromDewPoint(-10, -30)).excursion).toBe(0);
  });
});

describe('water-side (chilled water 18 °C, ΔT 6 K, approach 5 K)', () => {
  const tower = makeScenario('water-side', { system: { heatRejection: 'cooling-tower', evaporativeEffectiveness: 0 } });
  const dryCooler = makeScenario('water-side', { system: { heatRejection: 'dry-cooler', evaporativeEffectiveness: 0.8 } });
  const plainDryCooler = makeScenario('water-side', { system: { heatRejection: 'dry-cooler', evaporativeEffectiveness: 0 } });

  it('cooling tower: free when Twb + approach ≤ CHWS', () => {
    expect(classifyOne(tower, stateFromWetBulb(20, 12)).mode).toBe(MODE.free); // 12 + 5 = 17 ≤ 18
  });

  it('cooling tower: mechanical otherwise, the tower pre-cooling the return water in series', () => {
    const r = classifyOne(tower, stateFromWetBulb(25, 16)); // 16 + 5 = 21 > 18
    expect(r.mode).toBe(MODE.mechanical);
    expect(r.fraction).toBeCloseTo((21 - 18) / 6, 10);
    expect(classifyOne(tower, stateFromWetBulb(32, 25)).fraction).toBe(1); // 30 ≥ return 24
  });

  it('dry cooler: free when T + approach ≤ CHWS', () => {
    expect(classifyOne(dryCooler, stateFromDewPoint(13, 5)).mode).toBe(MODE.free);
  });

  it('dry cooler: adiabatic when T − ε(T − Twb) + approach ≤ CHWS', () => {
    const hour = stateFromWetBulb(20, 10);
    expect(20 - 0.8 * 10 + 5).toBeCloseTo(17, 10);
    const r = classifyOne(dryCooler, hour);
    expect(r.mode).toBe(MODE.adiabatic);
    // The pre-cooler is modulated to the air temperature that just meets the setpoint: 18 − 5 = 13 °C.
    expect(r.evaporation).toBeCloseTo(psy.GetHumRatioFromTWetBulb(13, 10, p) - hour.w, 6);
    expect(classifyOne(plainDryCooler, hour).mode).toBe(MODE.mechanical);
  });

  it('dry cooler: mechanical with wetted pre-cooling helping', () => {
    const r = classifyOne(dryCooler, stateFromWetBulb(22, 14));
    expect(r.mode).toBe(MODE.mechanical);
    expect(r.fraction).toBeCloseTo((22 - 0.8 * 8 + 5 - 18) / 6, 10);
  });
});

describe('no data', () => {
  it('counts NaN inputs and missing-flagged hours as no data, never guessed', () => {
    const scenario = makeScenario('direct-air');
    const hours = outdoorHours([stateFromDewPoint(10, 5), { t: Number.NaN, w: 0.005, twb: 5 }, stateFromDewPoint(12, 5), { t: 10, w: Number.NaN, twb: 5 }]);
    hours.flags = Uint8Array.from([0, 0, 2, 1]);
    const out = classifyHours(scenario.system, limits, hours, plantOf(scenario));
    expect([...out.modes]).toEqual([MODE.free, MODE.noData, MODE.noData, MODE.noData]);
    expect([...out.mechanicalFraction]).toEqual([0, 0, 0, 0]);
  });

  it('refuses arrays of different lengths with a RangeError naming the array', () => {
    const hours = outdoorHours([stateFromDewPoint(10, 5)]);
    expect(() => classifyHours(makeScenario('direct-air').system, limits, { ...hours, wetBulbC: new Float64Array(2) }, { fanHeatK: 1 })).toThrow(
      /wetBulbC has 2 hours/,
    );
  });
});
