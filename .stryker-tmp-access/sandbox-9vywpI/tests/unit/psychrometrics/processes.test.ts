/** Air-side processes, checked against psychrolib (SI, tight) and the Handbook's balance equations. */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import {
  coolAndDehumidify,
  dewPointFromHumidityRatio,
  dryBulbAtRhLimit,
  enthalpyKJPerKg,
  evaporativeCooling,
  humidityRatioAtDewPointLimit,
  humidityRatioAtRhLimit,
  humidityRatioFromRh,
  maxHumidityRatioForLimits,
  mixAirStreams,
  rhPctFromHumidityRatio,
  sensibleHeatOrCool,
  wetBulbFromHumidityRatio,
} from '../../../shared/psychrometrics';
import { tightPsychrolib as ref } from './reference-psychrolib';

const P = 101_325;

describe('adiabatic mixing (ASHRAE 2017 ch. 1, mixing of two streams: mass and energy balance)', () => {
  it('mass-weighted W and h; dry-bulb from them', () => {
    const a = { dryBulbC: 30, humidityRatio: 0.015, dryAirMass: 1 };
    const b = { dryBulbC: 20, humidityRatio: 0.008, dryAirMass: 3 };
    const mixed = mixAirStreams(a, b, P);
    expect(mixed.humidityRatio).toBeCloseTo(0.00975, 12);
    expect(mixed.enthalpyKJPerKg).toBeCloseTo((enthalpyKJPerKg(30, 0.015) + 3 * enthalpyKJPerKg(20, 0.008)) / 4, 10);
    expect(enthalpyKJPerKg(mixed.dryBulbC, mixed.humidityRatio)).toBeCloseTo(mixed.enthalpyKJPerKg, 10);
    expect(mixed.supersaturated).toBe(false);
  });

  it('flags fog when cold dry and warm saturated air mix', () => {
    const cold = { dryBulbC: -15, humidityRatio: humidityRatioFromRh(-15, 90, P), dryAirMass: 1 };
    const warm = { dryBulbC: 30, humidityRatio: humidityRatioFromRh(30, 100, P), dryAirMass: 1 };
    expect(mixAirStreams(cold, warm, P).supersaturated).toBe(true);
  });
});

describe('sensible heating and cooling', () => {
  it('keeps W and adds cp·Δt of moist air', () => {
    const result = sensibleHeatOrCool({ dryBulbC: 10, humidityRatio: 0.005 }, 25, P);
    expect(result.humidityRatio).toBe(0.005);
    expect(result.sensibleKJPerKg).toBeCloseTo((1.006 + 1.86 * 0.005) * 15, 10); // ASHRAE 2017 ch. 1 eq. 32 difference
  });
  it('refuses to cool below the dew point', () => {
    expect(() => sensibleHeatOrCool({ dryBulbC: 25, humidityRatio: 0.012 }, 10, P)).toThrow(/leavingDryBulbC/);
  });
});

describe('evaporative cooling along the constant wet-bulb line', () => {
  it('leaves at t − ε(t − t*) with W from the psychrometric equation (psychrolib GetHumRatioFromTWetBulb)', () => {
    const entering = { dryBulbC: 35, humidityRatio: 0.008 };
    const result = evaporativeCooling(entering, 0.85, P);
    const wb = ref.GetTWetBulbFromHumRatio(35, 0.008, P);
    expect(result.wetBulbC).toBeCloseTo(wb, 4);
    expect(result.dryBulbC).toBeCloseTo(35 - 0.85 * (35 - wb), 4);
    expect(result.humidityRatio).toBeCloseTo(ref.GetHumRatioFromTWetBulb(result.dryBulbC, wb, P), 7);
    expect(wetBulbFromHumidityRatio(result.dryBulbC, result.humidityRatio, P)).toBeCloseTo(wb, 4);
    expect(result.waterKgPerKg).toBeCloseTo(result.humidityRatio - 0.008, 12);
  });
  it('at effectiveness 1 reaches saturation at the wet-bulb', () => {
    const result = evaporativeCooling({ dryBulbC: 30, humidityRatio: 0.006 }, 1, P);
    expect(rhPctFromHumidityRatio(result.dryBulbC, result.humidityRatio, P)).toBeCloseTo(100, 6);
  });
  it('refuses an effectiveness outside 0…1', () => {
    expect(() => evaporativeCooling({ dryBulbC: 30, humidityRatio: 0.006 }, 1.2, P)).toThrow(/effectiveness/);
  });
});

describe('cooling and dehumidifying coil', () => {
  it('condenses down to the leaving RH cap and balances energy (ASHRAE 2017 ch. 1, coil balance)', () => {
    const entering = { dryBulbC: 30, humidityRatio: 0.015 };
    const result = coolAndDehumidify(entering, 13, P, 95);
    expect(result.humidityRatio).toBeCloseTo(humidityRatioFromRh(13, 95, P), 12);
    expect(result.condensateKgPerKg).toBeCloseTo(0.015 - result.humidityRatio, 12);
    const expected = enthalpyKJPerKg(30, 0.015) - enthalpyKJPerKg(13, result.humidityRatio) - result.condensateKgPerKg * 4.186 * 13;
    expect(result.totalCoolingKJPerKg).toBeCloseTo(expected, 10);
    expect(result.sensibleCoolingKJPerKg + result.latentCoolingKJPerKg).toBeCloseTo(result.totalCoolingKJPerKg, 10);
  });
  it('is sensible only above the entering dew point', () => {
    const result = coolAndDehumidify({ dryBulbC: 30, humidityRatio: 0.008 }, 18, P);
    expect(result.condensateKgPerKg).toBe(0);
    expect(result.latentCoolingKJPerKg).toBeCloseTo(0, 10);
  });
});

describe('moisture limits', () => {
  it('dew-point and RH limits as humidity ratios (psychrolib GetHumRatioFromTDewPoint / GetHumRatioFromRelHum)', () => {
    expect(humidityRatioAtDewPointLimit(15, P)).toBeCloseTo(ref.GetHumRatioFromTDewPoint(15, P), 14);
    expect(humidityRatioAtRhLimit(27, 60, P)).toBeCloseTo(ref.GetHumRatioFromRelHum(27, 0.6, P), 14);
  });
  it('the tighter of the two limits wins', () => {
    const limits = { dewPointMaxC: 15, rhMaxPct: 60 };
    expect(maxHumidityRatioForLimits(18, limits, P)).toBeCloseTo(humidityRatioFromRh(18, 60, P), 14);
    expect(maxHumidityRatioForLimits(32, limits, P)).toBeCloseTo(humidityRatioAtDewPointLimit(15, P), 14);
    expect(maxHumidityRatioForLimits(32, {}, P)).toBe(Number.POSITIVE_INFINITY);
  });
  it('dry-bulb at which air reaches an RH limit', () => {
    const w = humidityRatioFromRh(25, 40, P);
    const t = dryBulbAtRhLimit(w, 80, P);
    expect(rhPctFromHumidityRatio(t, w, P)).toBeCloseTo(80, 6);
    expect(dryBulbAtRhLimit(w, 100, P)).toBeCloseTo(dewPointFromHumidityRatio(w, P), 9);
  });
});
