// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { analyseProposal, countExcursions, durationBin, modelInletHours, xFactorAt, type EnvelopeBounds } from '../../shared/excursions';
import { findEnvelopePreset } from '../../shared/scenario/envelopes';
import { MODE } from '../../shared/scenario/classify';
import { runScenario } from '../../shared/scenario/run';
import { makeScenario, outdoorHours, plantOf, psy, RECOMMENDED, SEA_LEVEL_PA, stateFromDewPoint, stateFromWetBulb, wFromDewPoint } from './scenario/fixtures';
import { HOT_HUMID, MILD_MARITIME, syntheticSeries } from './scenario/synthetic-climate';

// ASHRAE TC 9.9 2021 recommended range and class A1 (recalled from memory, as shared/scenario/envelopes.ts).
const REC: EnvelopeBounds = RECOMMENDED;
const A1: EnvelopeBounds = { dryBulbMinC: 15, dryBulbMaxC: 32, dewPointMinC: -12, dewPointMaxC: 17, rhMinPct: 8, rhMaxPct: 80 };
const HOUR = 3_600_000;
const T0 = Date.UTC(2019, 6, 1);

/**
 * Hourly inlet series from dry-bulbs at one dew point (psychrolib gives W: the reference library, not the engine;
 * a dew point below 0 °C is over liquid water, WMO-No. 8, so psychrolib is fed its vapour pressure: fixtures.ts).
 */
function inletSeries(temps: number[], dewPointC = 5, step = HOUR) {
  const w = wFromDewPoint(dewPointC, SEA_LEVEL_PA);
  return {
    timestampsMs: Float64Array.from(temps, (_, i) => T0 + i * step),
    inletC: Float64Array.from(temps),
    inletW: Float64Array.from(temps, (t) => (Number.isNaN(t) ? Number.NaN : w)),
    pressurePa: SEA_LEVEL_PA,
    recommended: REC,
    allowable: A1,
    rateLimitKPerHour: 20,
  };
}

describe('excursion events on a constructed series with known runs', () => {
  // Three events of 1, 4 and 2 hours; the 4-hour one starts with a 21 K jump (20 → 41 °C) and has two
  // hours above A1's 32 °C (41 and 33), split by a 30 °C hour.
  const temps = [20, 20, 28, 20, 20, 41, 30, 33, 29, 20, 20, 29, 29, 20];
  const result = countExcursions(inletSeries(temps));

  it('counts the hours in each band', () => {
    expect(result.dataHours).toBe(14);
    expect(result.insideRecommendedHours).toBe(7);
    expect(result.outsideRecommendedHours).toBe(5); // 28, 30, 29, 29, 29
    expect(result.outsideAllowableHours).toBe(2); // 41, 33
    expect(result.causes.recommended).toEqual({ warm: 7, cold: 0, humid: 0, dry: 0 });
    expect(result.causes.allowable).toEqual({ warm: 2, cold: 0, humid: 0, dry: 0 });
  });

  it('finds 3 events of 1, 4 and 2 hours, the longest starting at the 41 °C hour', () => {
    expect(result.events.count).toBe(3);
    expect(result.events.longestHours).toBe(4);
    expect(result.events.longestStartMs).toBe(T0 + 5 * HOUR);
    // Bins 1 h, 2–3 h, 4–6 h, 7–12 h, 13–24 h, 25–72 h, 73 h and longer.
    expect(result.events.histogram).toEqual([1, 1, 1, 0, 0, 0, 0]);
    expect(result.allowableEvents).toEqual({ count: 2, longestHours: 1, longestStartMs: T0 + 5 * HOUR });
  });

  it('flags the one hour-to-hour step above 20 K/h (ASHRAE TC 9.9 hourly limit, recalled from memory)', () => {
    expect(result.rateOfChange.stepsChecked).toBe(13);
    expect(result.rateOfChange.stepsAboveLimit).toBe(1);
    expect(result.rateOfChange.maxKPerHour).toBe(21);
    expect(result.rateOfChange.maxAtMs).toBe(T0 + 5 * HOUR);
  });

  it('weights the X-factor by time, checked by hand from the table', () => {
    // ASHRAE TC 9.9 (2011) white paper table (recalled from memory), linear between 2.5 K points:
    // 20 °C 1.00 (7 h); 28 °C 1.34 + 0.2·0.08 = 1.356; 41 °C 1.66 + 0.4·0.05 = 1.68; 30 °C 1.42;
    // 33 °C 1.48 + 0.2·0.07 = 1.494; 29 °C 1.34 + 0.6·0.08 = 1.388 (3 h).
    // Sum = 7 + 1.356 + 1.68 + 1.42 + 1.494 + 3·1.388 = 17.114; over 14 h = 1.222428…
    expect(xFactorAt(20)).toBe(1);
    expect(xFactorAt(28)).toBeCloseTo(1.356, 12);
    expect(xFactorAt(10)).toBe(0.72); // held at the table's first value below 15 °C
    expect(xFactorAt(50)).toBe(1.76); // and its last above 45 °C
    expect(result.timeWeightedXFactor).toBeCloseTo(17.114 / 14, 12);
  });

  it('breaks an event at a no-data hour and at a gap in time', () => {
    const withHole = countExcursions(inletSeries([28, 28, Number.NaN, 28, 20]));
    expect(withHole.events.count).toBe(2);
    expect(withHole.noDataHours).toBe(1);
    const series = inletSeries([28, 28, 28]);
    series.timestampsMs[2] += 5 * HOUR;
    const withGap = countExcursions(series);
    expect(withGap.events.count).toBe(2);
    expect(withGap.events.longestHours).toBe(2);
    expect(withGap.rateOfChange.stepsChecked).toBe(1);
  });

  it('tells humid and dry hours apart by the dew-point and RH limits', () => {
    // 25 °C at 16 °C dew point: above the recommended 15 °C dew point, inside A1 (17 °C, 80 % RH).
    expect(countExcursions(inletSeries([25], 16)).causes).toEqual({
      recommended: { warm: 0, cold: 0, humid: 1, dry: 0 },
      allowable: { warm: 0, cold: 0, humid: 0, dry: 0 },
    });
    // 20 °C at −10 °C dew point: below the recommended −9 °C, inside A1 (−12 °C and 8 % RH; about 12 % RH over water here).
    const dry = countExcursions(inletSeries([20], -10));
    expect(dry.causes.recommended.dry).toBe(1);
    expect(dry.outsideRecommendedHours).toBe(1);
  });

  it('puts durations in the right bins and refuses bad arguments', () => {
    expect([1, 2, 3, 4, 6, 7, 12, 13, 24, 25, 72, 73, 1000].map(durationBin)).toEqual([0, 1, 1, 2, 2, 3, 3, 4, 4, 5, 5, 6, 6]);
    expect(() => countExcursions({ ...inletSeries([20]), rateLimitKPerHour: 0 })).toThrow(/rateLimitKPerHour/);
    expect(() => countExcursions({ ...inletSeries([20, 21]), inletW: new Float64Array(1) })).toThrow(/inletW/);
  });
});

describe('the inlet model, one worked hour per system kind', () => {
  const hold = { supplyAirC: 20, ceilingC: 20, hallDewPointC: 3 };

  it('direct air: mixing holds the setpoint in cool hours; a float lets the supply follow outdoor air + fan heat', () => {
    const scenario = makeScenario('direct-air', { system: { supplyAirC: 20, evaporativeEffectiveness: 0 } });
    const hours = outdoorHours([stateFromDewPoint(10, 5), stateFromDewPoint(24, 5)]);
    const held = modelInletHours(scenario.system, RECOMMENDED, hours, hold, plantOf(scenario));
    // 10 °C + 1 K fan heat ≤ 20 °C: free, mixed up to 20 °C. 24 °C + 1 K > 20 °C and no evaporative stage: mechanical at 20 °C.
    expect(Array.from(held.modes)).toEqual([MODE.free, MODE.mechanical]);
    expect(Array.from(held.inletC)).toEqual([20, 20]);
    expect(held.inletW[0]).toBeCloseTo(hours.humidityRatio[0], 15); // outdoor moisture reaches the hall
    const floated = modelInletHours(scenario.system, RECOMMENDED, hours, { ...hold, ceilingC: 27 }, plantOf(scenario));
    // 24 + 1 = 25 °C ≤ 27 °C: free cooling at 25 °C.
    expect(Array.from(floated.modes)).toEqual([MODE.free, MODE.free]);
    expect(floated.inletC[1]).toBeCloseTo(25, 12);
  });

  it('direct air, adiabatic: the evaporatively cooled air plus fan heat, on the outdoor wet-bulb line', () => {
    const scenario = makeScenario('direct-air', { system: { supplyAirC: 20, evaporativeEffectiveness: 0.8 } });
    // 30 °C dry-bulb, 16 °C wet-bulb: the stage reaches tE = 30 − 0.8·14 = 18.8 °C ≤ Ts − f = 19 °C, so adiabatic
    // (classifier rule 3); the inlet is max(Ts, tE + f) = max(20, 19.8) = 20 °C.
    const hours = outdoorHours([stateFromWetBulb(30, 16)]);
    const inlet = modelInletHours(scenario.system, RECOMMENDED, hours, hold, plantOf(scenario));
    expect(inlet.modes[0]).toBe(MODE.adiabatic);
    expect(inlet.inletC[0]).toBe(20);
    // Moisture where the 16 °C wet-bulb line reaches 19 °C (psychrolib as reference).
    expect(inlet.inletW[0]).toBeCloseTo(psy.GetHumRatioFromTWetBulb(19, 16, SEA_LEVEL_PA), 6);
  });

  it('indirect air: supply = scavenger + (ΔT(1 − ε_hx) + f)/ε_hx, never below the setpoint', () => {
    // ΔT 12 K, ε_hx 0.7, f 1 K: offset (12·0.3 + 1)/0.7 = 6.5714… K.
    const scenario = makeScenario('indirect-air', { system: { supplyAirC: 20, evaporativeEffectiveness: 0 } });
    const hours = outdoorHours([stateFromDewPoint(10, 5), stateFromDewPoint(20, 5)]);
    const floated = modelInletHours(scenario.system, RECOMMENDED, hours, { ...hold, ceilingC: 30 }, plantOf(scenario));
    expect(Array.from(floated.modes)).toEqual([MODE.free, MODE.free]);
    expect(floated.inletC[0]).toBe(20); // 16.57 °C held up to 20 °C
    expect(floated.inletC[1]).toBeCloseTo(20 + 4.6 / 0.7, 12);
    // The hall keeps its moisture: the dew point given (3 °C), W by psychrolib.
    expect(floated.inletW[1]).toBeCloseTo(psy.GetHumRatioFromTDewPoint(3, SEA_LEVEL_PA), 6);
  });

  it('water side, tower: supply = wet-bulb + approach + coil approach, the float moving the water setpoint with it', () => {
    // Supply 24 °C, chilled water 18 °C (coil approach 6 K), tower approach 5 K: free while Twb + 5 ≤ 18.
    const scenario = makeScenario('water-side', { system: { heatRejection: 'cooling-tower' } });
    const hours = outdoorHours([stateFromWetBulb(25, 15)]);
    const held = modelInletHours(scenario.system, RECOMMENDED, hours, { supplyAirC: 24, ceilingC: 24, hallDewPointC: 3 }, plantOf(scenario));
    expect(held.modes[0]).toBe(MODE.mechanical);
    expect(held.inletC[0]).toBe(24);
    // Ceiling 27 °C: chilled water may rise to 21 °C; 15 + 5 = 20 ≤ 21, free, supply 15 + 5 + 6 = 26 °C.
    const floated = modelInletHours(scenario.system, RECOMMENDED, hours, { supplyAirC: 24, ceilingC: 27, hallDewPointC: 3 }, plantOf(scenario));
    expect(floated.modes[0]).toBe(MODE.free);
    expect(floated.inletC[0]).toBeCloseTo(26, 9);
  });

  it('refuses a ceiling below the setpoint, naming it', () => {
    const scenario = makeScenario('direct-air');
    expect(() => modelInletHours(scenario.system, RECOMMENDED, outdoorHours([stateFromDewPoint(10, 5)]), { ...hold, ceilingC: 19 }, plantOf(scenario))).toThrow(
      /ceilingC/,
    );
  });
});

describe('a proposal over a year of (synthetic) weather', () => {
  const a1 = findEnvelopePreset('ashrae-2021-a1')!.limits;
  const recommended = findEnvelopePreset('ashrae-2021-recommended')!.limits;

  it("holding the run's own setpoint and envelope gives the run's own hours per mode", () => {
    for (const kind of ['direct-air', 'indirect-air', 'water-side'] as const) {
      const scenario = makeScenario(kind);
      const series = syntheticSeries(HOT_HUMID, { hours: 8760 });
      const run = runScenario(scenario, series, { elevationM: 10 });
      const analysis = analyseProposal(scenario, series, 10, {
        supplyAirC: scenario.system.supplyAirC,
        floatUpToC: null,
        control: scenario.envelope,
        recommended,
        allowable: a1,
      });
      const { free, adiabatic, mechanical, noData } = run.results.hours;
      expect(analysis.modes, kind).toEqual({ free, adiabatic, mechanical, noData });
    }
  });

  it("letting the supply float to A1's maximum trades mechanical hours for excursion hours", () => {
    const scenario = makeScenario('direct-air', { system: { supplyAirC: 22, evaporativeEffectiveness: 0 } });
    const series = syntheticSeries(MILD_MARITIME, { hours: 8760 });
    const base = { supplyAirC: 22, control: a1, recommended, allowable: a1 };
    const held = analyseProposal(scenario, series, 20, { ...base, floatUpToC: null });
    const floated = analyseProposal(scenario, series, 20, { ...base, floatUpToC: 32 });
    expect(floated.modes.mechanical).toBeLessThan(held.modes.mechanical);
    expect(floated.inletC.max).toBeGreaterThan(held.inletC.max);
    expect(floated.timeWeightedXFactor).toBeGreaterThan(held.timeWeightedXFactor);
    expect(floated.dataHours).toBe(8760);
    expect(floated.insideRecommendedHours + floated.outsideRecommendedHours + floated.outsideAllowableHours).toBe(8760);
    expect(floated.eventsPerYear).toBeCloseTo(floated.events.count, 9); // one year of data
  });
});
