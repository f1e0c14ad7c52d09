/** The state API: the phase rule, supersaturation, and agreement with the single-property functions. */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { moistAirState, StateRequestError, saturationHumidityRatio, standardPressurePa } from '../../../shared/psychrometrics';
import type { MoistAirRequest, StateRequestProblem } from '../../../shared/psychrometrics';
import { tightPsychrolib as ref } from './reference-psychrolib';

const P = 101_325;

function problemOf(request: MoistAirRequest): StateRequestProblem | 'none' | 'other' {
  try {
    moistAirState(request);
    return 'none';
  } catch (error) {
    return error instanceof StateRequestError ? error.problem : 'other';
  }
}

describe('every supported pair gives the same state', () => {
  // Reference state: 40 °C dry-bulb, 20 °C wet-bulb at 101.325 kPa (ASHRAE 2017 ch. 1 worked example inputs).
  const base = moistAirState({ pressurePa: P, dryBulbC: 40, wetBulbC: 20 });
  const pairs: MoistAirRequest[] = [
    { pressurePa: P, dryBulbC: 40, rhPct: base.rhPct },
    { pressurePa: P, dryBulbC: 40, dewPointC: base.dewPointC },
    { pressurePa: P, dryBulbC: 40, humidityRatio: base.humidityRatio },
    { pressurePa: P, dryBulbC: 40, enthalpyKJPerKg: base.enthalpyKJPerKg },
    { pressurePa: P, enthalpyKJPerKg: base.enthalpyKJPerKg, humidityRatio: base.humidityRatio },
  ];
  it.each(pairs)('%o', (request) => {
    const state = moistAirState(request);
    expect(state.dryBulbC).toBeCloseTo(40, 9);
    expect(state.humidityRatio).toBeCloseTo(base.humidityRatio, 8); // dew point and wet-bulb are solved to about 1e-5 K
    expect(state.wetBulbC).toBeCloseTo(20, 4);
  });

  it('matches psychrolib (SI, tight) on the derived properties', () => {
    // psychrolib GetMoistAirVolume, GetRelHumFromHumRatio, GetTDewPointFromHumRatio (SI).
    expect(base.specificVolumeM3PerKg).toBeCloseTo(ref.GetMoistAirVolume(40, base.humidityRatio, P), 12);
    expect(base.rhPct / 100).toBeCloseTo(ref.GetRelHumFromHumRatio(40, base.humidityRatio, P), 12);
    expect(base.dewPointC).toBeCloseTo(ref.GetTDewPointFromHumRatio(40, base.humidityRatio, P), 5);
    expect(base.densityKgPerM3).toBeCloseTo((1 + base.humidityRatio) / base.specificVolumeM3PerKg, 12);
  });

  it('takes the pressure of the standard atmosphere from elevationM', () => {
    const state = moistAirState({ elevationM: 1500, dryBulbC: 30, rhPct: 40 });
    expect(state.pressurePa).toBe(standardPressurePa(1500));
  });
});

describe('the phase rule', () => {
  it('refuses under-determined requests', () => {
    expect(problemOf({ pressurePa: P, dryBulbC: 20 })).toBe('under-determined');
    expect(problemOf({ dryBulbC: 20, rhPct: 50 })).toBe('under-determined');
    expect(() => moistAirState({ pressurePa: P, dryBulbC: 20 })).toThrow(/pressure plus two; got pressure plus 1 \(dryBulbC\)/);
  });

  it('refuses over-determined requests', () => {
    expect(problemOf({ pressurePa: P, dryBulbC: 20, rhPct: 50, dewPointC: 9 })).toBe('over-determined');
    expect(problemOf({ pressurePa: P, elevationM: 0, dryBulbC: 20, rhPct: 50 })).toBe('over-determined');
    expect(problemOf({ pressurePa: P, saturated: true, dryBulbC: 20, wetBulbC: 20 })).toBe('over-determined');
    expect(problemOf({ pressurePa: P, saturated: true, rhPct: 100 })).toBe('over-determined');
  });

  it('names an unsupported pair rather than guessing', () => {
    expect(problemOf({ pressurePa: P, rhPct: 50, dewPointC: 9 })).toBe('unsupported-pair');
  });

  it('saturated air needs only pressure plus one property', () => {
    const fromT = moistAirState({ pressurePa: P, saturated: true, dryBulbC: 20 });
    expect(fromT.rhPct).toBe(100);
    expect(fromT.humidityRatio).toBe(saturationHumidityRatio(20, P));
    expect(fromT.wetBulbC).toBeCloseTo(20, 6);
    expect(fromT.dewPointC).toBeCloseTo(20, 6);
    const fromH = moistAirState({ pressurePa: P, saturated: true, enthalpyKJPerKg: fromT.enthalpyKJPerKg });
    expect(fromH.dryBulbC).toBeCloseTo(20, 8);
    const fromW = moistAirState({ pressurePa: P, saturated: true, humidityRatio: fromT.humidityRatio });
    expect(fromW.dryBulbC).toBeCloseTo(20, 6);
  });
});

describe('supersaturated requests say so', () => {
  const cases: MoistAirRequest[] = [
    { pressurePa: P, dryBulbC: 20, rhPct: 105 },
    { pressurePa: P, dryBulbC: 20, dewPointC: 21 },
    { pressurePa: P, dryBulbC: 20, wetBulbC: 21 },
    { pressurePa: P, dryBulbC: 20, humidityRatio: 0.02 },
    { pressurePa: P, dryBulbC: 20, enthalpyKJPerKg: 80 },
    { pressurePa: P, enthalpyKJPerKg: 40, humidityRatio: 0.02 },
  ];
  it.each(cases)('%o', (request) => {
    expect(problemOf(request)).toBe('supersaturated');
    expect(() => moistAirState(request)).toThrow(/supersaturated/);
  });

  it('a bad value is a RangeError naming it', () => {
    expect(() => moistAirState({ pressurePa: P, dryBulbC: 20, rhPct: -3 })).toThrow(/rhPct/);
    expect(() => moistAirState({ pressurePa: 1_000, dryBulbC: 20, rhPct: 30 })).toThrow(/pressurePa/);
    expect(() => moistAirState({ pressurePa: P, dryBulbC: Number.NaN, rhPct: 30 })).toThrow(/dryBulbC/);
  });
});
