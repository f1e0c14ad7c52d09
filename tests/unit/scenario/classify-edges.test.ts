/**
 * The classifier's branches at their edges: hours exactly on a threshold (the rules say "≤", so the hour is on the
 * kinder side), the evaporation written in mechanical hours, a tower's freeze protection, an envelope whose dew-point
 * ceiling lies above the off-coil temperature, and bad or missing inputs. Each case was added for a mutant that
 * survived `npm run mutation` (docs/benchmarks.md). Reference values: psychrolib (ASHRAE Handbook—Fundamentals 2017
 * ch. 1 eq. 32 enthalpy, eq. 33 wet-bulb line); the rule arithmetic is written out beside each check.
 */
import { describe, expect, it } from 'vitest';
import { classifyHours, EXCURSION, MODE, moistureTargets, type InletLimits } from '../../../shared/scenario/classify';
import { makeScenario, outdoorHours, plantOf, psy, RECOMMENDED, SEA_LEVEL_PA, stateFromDewPoint, stateFromWetBulb, type ReferenceState } from './fixtures';

const p = SEA_LEVEL_PA;
const limits: InletLimits = RECOMMENDED;
/** Moist-air enthalpy, kJ/kg, by psychrolib (ASHRAE 2017 ch. 1 eq. 32). */
const h = (t: number, w: number) => psy.GetMoistAirEnthalpy(t, w) / 1000;

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

describe('direct-air edges (Ts 24 °C, f 1 K, ΔT 12 K, ε 0.8)', () => {
  const withEvap = makeScenario('direct-air', { system: { evaporativeEffectiveness: 0.8 } });
  const halfEvap = makeScenario('direct-air', { system: { evaporativeEffectiveness: 0.5 } });

  it('an hour exactly at the off-coil temperature (T + f = Ts) is free cooling, with nothing added', () => {
    const r = classifyOne(withEvap, stateFromDewPoint(23, 5));
    expect(r.mode).toBe(MODE.free);
    expect(r.humidified).toBe(0);
    expect(r.evaporation).toBe(0);
  });

  it('an hour exactly at W_hi is not dehumidified: free cooling when cool enough', () => {
    const { highW } = moistureTargets(limits, 24, p);
    // W_hi is W at the 15 °C dew point (psychrolib), the ceiling that binds at 24 °C.
    expect(highW).toBeCloseTo(psy.GetHumRatioFromTDewPoint(15, p), 7);
    const hour = { t: 20, w: highW, twb: psy.GetTWetBulbFromHumRatio(20, highW, p) };
    expect(classifyOne(withEvap, hour).mode).toBe(MODE.free);
  });

  it('ε cannot reach Ts − f although the wet-bulb line at Ts − f is dry enough: mechanical, not adiabatic', () => {
    // 40 °C with a 15 °C wet-bulb: ε 0.5 reaches 40 − 0.5·25 = 27.5 °C > 23 °C.
    const hour = stateFromWetBulb(40, 15);
    expect(40 - 0.5 * 25).toBeGreaterThan(23);
    expect(psy.GetHumRatioFromTWetBulb(23, 15, p)).toBeLessThan(moistureTargets(limits, 24, p).highW);
    const r = classifyOne(halfEvap, hour);
    expect(r.mode).toBe(MODE.mechanical);
    // The coil cools the pre-cooled air (27.5 °C on the wet-bulb line) to 23 °C, over the recirculation load.
    const preW = psy.GetHumRatioFromTWetBulb(27.5, 15, p);
    expect(r.fraction).toBeCloseTo((h(27.5, preW) - h(23, preW)) / (h(36, hour.w) - h(23, hour.w)), 4);
    expect(r.evaporation).toBeCloseTo(preW - hour.w, 6);
  });

  it('air still above the return temperature after a weak stage: fraction 1, the hall recirculates and no water is evaporated', () => {
    // 48 °C, dew point 5 °C, ε 0.2: the stage would leave the air near 48 − 0.2·(48 − t*) ≈ 43 °C, above the 36 °C return.
    const weakEvap = makeScenario('direct-air', { system: { evaporativeEffectiveness: 0.2 } });
    const hour = stateFromDewPoint(48, 5);
    expect(48 - 0.2 * (48 - hour.twb)).toBeGreaterThan(36);
    const r = classifyOne(weakEvap, hour);
    expect(r.mode).toBe(MODE.mechanical);
    expect(r.fraction).toBe(1);
    expect(r.evaporation).toBe(0);
  });

  it('too humid with a dew-point ceiling above the off-coil temperature: the coil cools outdoor air to Ts − f at W_hi', () => {
    // A custom envelope (synthetic): dew point up to 23.5 °C, RH up to 100 %; W_hi is W at 23.5 °C dew point.
    const humid = { ...limits, dewPointMaxC: 23.5, rhMaxPct: 100, dryBulbMaxC: 32 };
    const targets = moistureTargets(humid, 24, p);
    expect(targets.highDewPointC).toBeCloseTo(23.5, 3);
    const highW = psy.GetHumRatioFromTDewPoint(23.5, p);
    const hour = stateFromDewPoint(26, 24);
    const r = classifyOne(withEvap, hour, humid);
    expect(r.mode).toBe(MODE.mechanical);
    const load = h(26, hour.w) - h(23, highW);
    const recirculation = h(36, highW) - h(23, highW);
    expect(r.fraction).toBeCloseTo(Math.min(1, load / recirculation), 4);
    expect(r.fraction).toBeLessThan(1);
  });

  it('flags a supply below the envelope minimum, and a supply exactly at the maximum not at all', () => {
    expect(classifyOne(withEvap, stateFromDewPoint(10, 5), { ...limits, dryBulbMinC: 25 }).excursion & EXCURSION.supplyBelowMin).toBe(EXCURSION.supplyBelowMin);
    expect(classifyOne(withEvap, stateFromDewPoint(10, 5), { ...limits, dryBulbMinC: 24 }).excursion).toBe(0);
    expect(classifyOne(withEvap, stateFromDewPoint(10, 5), { ...limits, dryBulbMaxC: 24 }).excursion).toBe(0);
  });
});

describe('indirect-air edges (Ts 24, Tr 36, f 1, ε_hx 0.7, scavenger ratio 1)', () => {
  const withEvap = makeScenario('indirect-air', { system: { evaporativeEffectiveness: 0.8 } });
  const dry = makeScenario('indirect-air', { system: { evaporativeEffectiveness: 0 } });

  it('a dry supply between Tr − f and Tr + f is still cooled by the exchanger (only ≥ Tr + f bypasses it)', () => {
    // 36 − 0.7·(36 − 35) + 1 = 36.3 °C: below 37 °C, so the exchanger carries part: (36.3 − 24) / 13.
    const r = classifyOne(dry, stateFromWetBulb(35, 20));
    expect(r.mode).toBe(MODE.mechanical);
    expect(r.fraction).toBeCloseTo((36.3 - 24) / 13, 10);
  });

  it('a mechanical hour with the wetted scavenger air evaporates water on its wet-bulb line', () => {
    // 30 °C, wet-bulb 22 °C: scavenger air wetted to 30 − 0.8·8 = 23.6 °C (psychrolib W on the 22 °C wet-bulb line).
    const hour = stateFromWetBulb(30, 22);
    const r = classifyOne(withEvap, hour);
    expect(r.mode).toBe(MODE.mechanical);
    expect(r.evaporation).toBeCloseTo(1 * (psy.GetHumRatioFromTWetBulb(23.6, 22, p) - hour.w), 6);
    expect(classifyOne(dry, hour).evaporation).toBe(0);
  });
});

describe('water-side edges (chilled water 18 °C, ΔT 6 K, approach 5 K)', () => {
  const tower = (overrides: Record<string, unknown> = {}) =>
    makeScenario('water-side', { system: { heatRejection: 'cooling-tower', evaporativeEffectiveness: 0, ...overrides } });
  const dryCooler = makeScenario('water-side', { system: { heatRejection: 'dry-cooler', evaporativeEffectiveness: 0.5 } });

  it('a wetted dry cooler exactly meeting the setpoint is adiabatic: 20 − 0.5·(20 − 6) + 5 = 18', () => {
    const r = classifyOne(dryCooler, stateFromWetBulb(20, 6));
    expect(r.mode).toBe(MODE.adiabatic);
  });

  it('a wetted dry cooler in a mechanical hour evaporates down to the pre-cooled air, and nothing when the chiller carries all', () => {
    // 30 °C, wet-bulb 20 °C: pre-cooled to 25 °C, water 30 °C ≥ 18 + 6: the chiller carries it all, no water used.
    expect(classifyOne(dryCooler, stateFromWetBulb(30, 20))).toMatchObject({ mode: MODE.mechanical, fraction: 1, evaporation: 0 });
    // 22 °C, wet-bulb 14 °C: pre-cooled to 22 − 0.5·8 = 18 °C, water 23 °C: fraction (23 − 18) / 6.
    const hour = stateFromWetBulb(22, 14);
    const r = classifyOne(dryCooler, hour);
    expect(r.mode).toBe(MODE.mechanical);
    expect(r.fraction).toBeCloseTo(5 / 6, 10);
    expect(r.evaporation).toBeCloseTo(psy.GetHumRatioFromTWetBulb(18, 14, p) - hour.w, 6);
  });

  it('a tower ignores an evaporative effectiveness it was given: its water follows the wet-bulb alone', () => {
    const r = classifyOne(tower({ evaporativeEffectiveness: 0.8 }), stateFromWetBulb(25, 16));
    expect(r.mode).toBe(MODE.mechanical);
    expect(r.fraction).toBeCloseTo((16 + 5 - 18) / 6, 10);
    expect(r.evaporation).toBe(0);
  });

  it('a tower below its freeze-protection wet-bulb runs dry, on the dry-bulb; at that wet-bulb exactly, still wet', () => {
    const guarded = tower({ freezeProtectionWetBulbC: 10 });
    // Wet-bulb 9 °C < 10 °C: water at 20 + 5 = 25 °C ≥ 18 + 6, the chiller carries all.
    expect(classifyOne(guarded, stateFromWetBulb(20, 9))).toMatchObject({ mode: MODE.mechanical, fraction: 1 });
    // Wet-bulb 10 °C: water at 10 + 5 = 15 °C ≤ 18 °C, free cooling.
    expect(classifyOne(guarded, stateFromWetBulb(20, 10)).mode).toBe(MODE.free);
  });
});

describe('inputs', () => {
  const scenario = makeScenario('direct-air');

  it('an hour missing only its humidity ratio, or only its wet-bulb, is no data', () => {
    const good = stateFromDewPoint(10, 5);
    const hours = outdoorHours([{ ...good, w: Number.NaN }, { ...good, twb: Number.NaN }, good]);
    expect([...classifyHours(scenario.system, limits, hours, plantOf(scenario)).modes]).toEqual([MODE.noData, MODE.noData, MODE.free]);
  });

  it('reads a pressure per hour: a missing one is no data, the others classified at their own pressure', () => {
    const good = stateFromDewPoint(10, 5);
    const hours = { ...outdoorHours([good, good]), pressurePa: Float64Array.from([p, Number.NaN]) };
    expect([...classifyHours(scenario.system, limits, hours, plantOf(scenario)).modes]).toEqual([MODE.free, MODE.noData]);
  });

  it('refuses a pressure series or flags of another length, naming them', () => {
    const hours = outdoorHours([stateFromDewPoint(10, 5)]);
    expect(() => classifyHours(scenario.system, limits, { ...hours, pressurePa: new Float64Array(3) }, plantOf(scenario))).toThrow(
      /pressurePa has 3 hours, dryBulbC has 1/,
    );
    expect(() => classifyHours(scenario.system, limits, { ...hours, flags: new Uint8Array(2) }, plantOf(scenario))).toThrow(
      /flags has 2 hours, dryBulbC has 1/,
    );
  });
});
