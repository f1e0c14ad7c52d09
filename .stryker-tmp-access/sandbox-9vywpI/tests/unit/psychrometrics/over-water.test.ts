/**
 * The humidity convention: relative humidity and dew point over liquid water at every temperature, as weather
 * data give them (WMO-No. 8, *Guide to Instruments and Methods of Observation*, part I ch. 4), the frost point as
 * a quantity of its own (over ice), conversions for files written over ice, and the wet-bulb root over liquid
 * water near 0 °C. Outside references: Hyland–Wexler eq. 6 and eq. 5 of ASHRAE Handbook—Fundamentals (2017)
 * ch. 1 evaluated apart from the engine (reference-over-water.ts), and psychrolib (npm 1.1.1) where it computes
 * the same thing: eq. 20 from a vapour pressure, the wet-bulb equation, and its sub-zero dew point, which is a
 * frost point.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import {
  bulkStates,
  dewPointFromFrostPoint,
  dewPointFromHumidityRatio,
  frostPointFromHumidityRatio,
  humidityRatioFromDewPoint,
  humidityRatioFromRh,
  moistAirState,
  rhOverWaterFromRhOverIce,
  rhPctFromHumidityRatio,
  wetBulbFromHumidityRatio,
  wetBulbRootsNearFreezing,
} from '../../../shared/psychrometrics';
import { tightPsychrolib as ref } from './reference-psychrolib';
import { hylandWexlerIcePa, hylandWexlerWaterPa } from './reference-over-water';

const SEA_LEVEL_PA = 101_325;

describe('dew point over liquid water below 0 °C', () => {
  it('−10 °C → W → −10 °C (over ice it came back as a frost point of about −8.9 °C)', () => {
    const w = humidityRatioFromDewPoint(-10, SEA_LEVEL_PA);
    // W from eq. 20 fed pws over water at −10 °C (eq. 6 evaluated apart), by psychrolib.
    expect(w / ref.GetHumRatioFromVapPres(hylandWexlerWaterPa(-10), SEA_LEVEL_PA)).toBeCloseTo(1, 9);
    expect(dewPointFromHumidityRatio(w, SEA_LEVEL_PA)).toBeCloseTo(-10, 4);
    // The same air's frost point is a different, higher temperature: psychrolib's "dew point" below 0 °C is over ice.
    expect(frostPointFromHumidityRatio(w, SEA_LEVEL_PA)).toBeCloseTo(ref.GetTDewPointFromHumRatio(0, w, SEA_LEVEL_PA), 4);
    expect(frostPointFromHumidityRatio(w, SEA_LEVEL_PA)).toBeCloseTo(-8.895, 2);
  });

  it('round trips at −20 and −40 °C too', () => {
    for (const td of [-20, -40]) expect(dewPointFromHumidityRatio(humidityRatioFromDewPoint(td, 90_000), 90_000)).toBeCloseTo(td, 4);
  });

  it('has no frost point once the vapour pressure is above the triple point', () => {
    expect(frostPointFromHumidityRatio(humidityRatioFromDewPoint(5, SEA_LEVEL_PA), SEA_LEVEL_PA)).toBeNaN();
  });
});

describe('relative humidity over liquid water below 0 °C', () => {
  it.each([-5, -10, -20])('RH 80 %% at %s °C: W from pws over water, and back', (tC) => {
    const w = humidityRatioFromRh(tC, 80, SEA_LEVEL_PA);
    expect(w / ref.GetHumRatioFromVapPres(0.8 * hylandWexlerWaterPa(tC), SEA_LEVEL_PA)).toBeCloseTo(1, 9);
    expect(rhPctFromHumidityRatio(tC, w, SEA_LEVEL_PA)).toBeCloseTo(80, 9);
  });

  it('air with a dew point of −12 °C at −10 °C has RH pws(−12)/pws(−10) over water = 85.3 %', () => {
    const w = humidityRatioFromDewPoint(-12, SEA_LEVEL_PA);
    expect(rhPctFromHumidityRatio(-10, w, SEA_LEVEL_PA)).toBeCloseTo((100 * hylandWexlerWaterPa(-12)) / hylandWexlerWaterPa(-10), 6);
    expect(rhPctFromHumidityRatio(-10, w, SEA_LEVEL_PA)).toBeCloseTo(85.27, 2);
  });

  it('allows RH over water up to 100 % below 0 °C, though that is above saturation over ice', () => {
    const s = moistAirState({ pressurePa: SEA_LEVEL_PA, dryBulbC: -10, rhPct: 100 });
    expect(s.dewPointC).toBeCloseTo(-10, 4);
    expect(s.frostPointC).toBeCloseTo(-8.895, 2);
    expect(s.wetBulbC).toBe(-10);
  });
});

describe('files written over ice', () => {
  it('RH over ice 100 % at −10 °C is RH over water pws,ice/pws,water = 90.70 %', () => {
    expect(rhOverWaterFromRhOverIce(-10, 100)).toBeCloseTo((100 * hylandWexlerIcePa(-10)) / hylandWexlerWaterPa(-10), 9);
    expect(rhOverWaterFromRhOverIce(-10, 100)).toBeCloseTo(90.7, 2);
    expect(rhOverWaterFromRhOverIce(5, 60)).toBe(60);
  });

  it('a frost point of −8.895 °C is a dew point over water of −10 °C; above 0.01 °C it passes through', () => {
    const frost = frostPointFromHumidityRatio(humidityRatioFromDewPoint(-10, SEA_LEVEL_PA), SEA_LEVEL_PA);
    expect(dewPointFromFrostPoint(frost)).toBeCloseTo(-10, 4);
    expect(dewPointFromFrostPoint(3)).toBe(3);
  });

  it('the same RH read over ice gives less water: W ratio 1.050 at −5 °C, 1.103 at −10 °C, 1.217 at −20 °C', () => {
    // pws,water/pws,ice by eq. 6 and eq. 5 evaluated apart (the ratio of W is that of pw to within 0.05 % here).
    for (const [tC, ratio] of [
      [-5, 1.05],
      [-10, 1.103],
      [-20, 1.217],
    ]) {
      const overWater = humidityRatioFromRh(tC, 70, SEA_LEVEL_PA);
      const overIce = humidityRatioFromRh(tC, rhOverWaterFromRhOverIce(tC, 70), SEA_LEVEL_PA);
      expect(overWater / overIce).toBeCloseTo(ratio, 3);
      expect(overWater / overIce).toBeCloseTo(hylandWexlerWaterPa(tC) / hylandWexlerIcePa(tC), 3);
    }
  });
});

describe('wet-bulb: the root over liquid water where two exist (regression)', () => {
  // 6.5 °C, 1.766 g/kg, 92.61 kPa: eq. 35 (ice) has a root at −0.068 °C and eq. 33 (water) one at +0.364 °C.
  // The engine took the ice root before; pads and wicks carry liquid water, so it now takes the water root.
  const [t, w, p] = [6.5, 0.001766, 92_610];

  it('both roots solve the Handbook equations (psychrolib gives back 1.766 g/kg from each)', () => {
    const roots = wetBulbRootsNearFreezing(t, w, p)!;
    expect(roots.iceC).toBeCloseTo(-0.068, 3);
    expect(roots.waterC).toBeCloseTo(0.3636, 3);
    expect(ref.GetHumRatioFromTWetBulb(t, roots.iceC, p)).toBeCloseTo(w, 8);
    expect(ref.GetHumRatioFromTWetBulb(t, roots.waterC, p)).toBeCloseTo(w, 8);
  });

  it('the engine, scalar and bulk, gives the water root', () => {
    expect(wetBulbFromHumidityRatio(t, w, p)).toBeCloseTo(0.3636, 3);
    const bulk = bulkStates({ dryBulbC: Float64Array.of(t), humidity: { kind: 'humidity-ratio-kgkg', values: Float64Array.of(w) }, pressurePa: p });
    expect(bulk.wetBulbC[0]).toBeCloseTo(0.3636, 3);
  });

  it('more cases that moved from the ice root to the water root', () => {
    for (const [tC, wKgKg, pPa] of [
      [8, 0.00075, 101_325],
      [5, 0.0029, 80_000],
      [10.5, 0.00015, 95_000],
    ]) {
      const roots = wetBulbRootsNearFreezing(tC, wKgKg, pPa);
      expect(roots).not.toBeNull();
      expect(roots!.iceC).toBeLessThan(0);
      expect(wetBulbFromHumidityRatio(tC, wKgKg, pPa)).toBe(roots!.waterC);
      expect(roots!.waterC).toBeGreaterThanOrEqual(0);
    }
  });
});

describe('bulk states read and write over liquid water', () => {
  it('a dew-point column of −10 °C comes back as −10 °C, with W over water', () => {
    const out = bulkStates({
      dryBulbC: Float64Array.of(-5, 2),
      humidity: { kind: 'dew-point-c', values: Float64Array.of(-10, -10) },
      pressurePa: SEA_LEVEL_PA,
    });
    for (let i = 0; i < 2; i++) {
      expect(out.dewPointC[i]).toBe(-10);
      expect(out.humidityRatio[i] / ref.GetHumRatioFromVapPres(hylandWexlerWaterPa(-10), SEA_LEVEL_PA)).toBeCloseTo(1, 9);
    }
    // RH over water at −5 °C of that air: pws(−10)/pws(−5), both eq. 6.
    expect(out.rhPct[0]).toBeCloseTo((100 * hylandWexlerWaterPa(-10)) / hylandWexlerWaterPa(-5), 6);
  });

  it('an RH column at −10 °C gives the dew point over water and the scalar wet-bulb', () => {
    const out = bulkStates({
      dryBulbC: Float64Array.of(-10, -10),
      humidity: { kind: 'relative-humidity-pct', values: Float64Array.of(80, 97) },
      pressurePa: 95_000,
    });
    expect(out.dewPointC[0]).toBeCloseTo(dewPointFromHumidityRatio(humidityRatioFromRh(-10, 80, 95_000), 95_000), 6);
    expect(out.wetBulbC[0]).toBeCloseTo(wetBulbFromHumidityRatio(-10, out.humidityRatio[0], 95_000), 7);
    // 97 % over water at −10 °C is above saturation over ice (90.7 %): no wet-bulb depression.
    expect(out.wetBulbC[1]).toBe(-10);
  });
});
