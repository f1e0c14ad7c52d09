/**
 * The hybrid hall: two loops, each classified by its own kind's rules with its share of the load, joined into the
 * hall's hours, energy and water. The limits (share 0 and 1) must give exactly the single systems, hour by hour.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import {
  FACILITY_WATER_CLASSES,
  MODE,
  parseScenario,
  runScenario,
  supplyFitsClass,
  type Scenario,
  type ScenarioRun,
  type ScenarioSeries,
} from '../../../shared/scenario';
import { RECOMMENDED } from './fixtures';
import { HOT_DRY_HIGH, HOT_HUMID, MILD_MARITIME, syntheticSeries } from './synthetic-climate';

const HOUR = 3_600_000;

/** The example hybrid, with overrides. */
function hybrid(
  overrides: {
    liquidShare?: number;
    liquid?: Record<string, unknown>;
    air?: Record<string, unknown>;
    heatReuse?: unknown;
    energy?: Record<string, unknown>;
  } = {},
): Scenario {
  const parsed = parseScenario({
    name: 'test hybrid',
    elevationM: 0,
    envelope: RECOMMENDED,
    system: {
      kind: 'hybrid',
      liquidShare: overrides.liquidShare ?? 0.8,
      liquid: {
        kind: 'water-side',
        chilledWaterSupplyC: 32,
        chilledWaterDeltaTK: 10,
        approachK: 5,
        heatRejection: 'dry-cooler',
        evaporativeEffectiveness: 0,
        cduApproachK: 2,
        ...overrides.liquid,
      },
      air: { kind: 'indirect-air', supplyAirC: 24, itDeltaTK: 12, heatExchangerEffectiveness: 0.7, evaporativeEffectiveness: 0.85, ...overrides.air },
      ...(overrides.heatReuse ? { heatReuse: overrides.heatReuse } : {}),
    },
    energy: { itLoadKw: 1000, mechanicalCop: 5, fanPowerFraction: 1 / 12, ...overrides.energy },
  });
  if (!parsed.ok) throw new Error(parsed.errors.join('; '));
  return parsed.scenario;
}

/** The same hall as one single system of the air loop's kind (the whole IT load to air). */
const airAlone = (h: Scenario): Scenario => ({ ...h, system: (h.system as Extract<Scenario['system'], { kind: 'hybrid' }>).air });

/**
 * The liquid loop as one water-side system: the facility-water fields, the hall's supply air and rise, and no hall
 * fans (cold plates move no air), written out here apart from the engine's liquidLoopSystem.
 */
function liquidAlone(h: Scenario): Scenario {
  const system = h.system as Extract<Scenario['system'], { kind: 'hybrid' }>;
  const { liquid, air } = system;
  return {
    ...h,
    system: {
      kind: 'water-side',
      supplyAirC: air.supplyAirC,
      itDeltaTK: air.itDeltaTK,
      evaporativeEffectiveness: liquid.evaporativeEffectiveness,
      chilledWaterSupplyC: liquid.chilledWaterSupplyC,
      chilledWaterDeltaTK: liquid.chilledWaterDeltaTK,
      approachK: liquid.approachK,
      heatRejection: liquid.heatRejection,
      dryCoolerAirRiseK: liquid.dryCoolerAirRiseK,
      freezeProtectionWetBulbC: liquid.freezeProtectionWetBulbC,
    },
    energy: { ...h.energy, fanPowerFraction: 0 },
  };
}

const YEAR = (climate = HOT_HUMID) => syntheticSeries(climate, { hours: 8760, step: 3 });

function expectSameHours(a: ScenarioRun, b: ScenarioRun) {
  expect(Array.from(a.classification.modes)).toEqual(Array.from(b.classification.modes));
  expect(Array.from(a.classification.mechanicalFraction)).toEqual(Array.from(b.classification.mechanicalFraction));
  expect(Array.from(a.classification.humidified)).toEqual(Array.from(b.classification.humidified));
  expect(Array.from(a.classification.excursions)).toEqual(Array.from(b.classification.excursions));
  for (const key of ['itKw', 'compressorKw', 'fanKw', 'pumpKw', 'basinHeaterKw', 'evaporativeCoolingL', 'humidificationL', 'driftL'] as const) {
    expect(Array.from(a.energy[key]), key).toEqual(Array.from(b.energy[key]));
  }
  const { loops: _loops, heatReuse: _reuse, systemKind: _kind, scenarioName: _name, ...aResults } = a.results;
  const { systemKind: _k2, scenarioName: _n2, ...bResults } = b.results;
  expect(aResults).toEqual(bResults);
}

describe('the hybrid schema', () => {
  it('accepts the issue example and refuses a share above 1 and an unknown loop kind, naming the field', () => {
    expect(hybrid().system.kind).toBe('hybrid');
    const base = JSON.parse(JSON.stringify(hybrid()));
    const tooMuch = parseScenario({ ...base, system: { ...base.system, liquidShare: 1.2 } });
    expect(!tooMuch.ok && tooMuch.errors).toEqual(['system.liquidShare: must be a number from 0 to 1 (got 1.2)']);
    const wrongLoop = parseScenario({ ...base, system: { ...base.system, liquid: { ...base.system.liquid, kind: 'direct-air' } } });
    expect(!wrongLoop.ok && wrongLoop.errors[0]).toMatch(/^system\.liquid\.kind: /);
    const hybridAir = parseScenario({ ...base, system: { ...base.system, air: { ...base.system } } });
    expect(hybridAir.ok).toBe(false);
  });
});

describe('a hybrid at its limits equals the single systems hour by hour', { timeout: 60_000 }, () => {
  for (const climate of [MILD_MARITIME, HOT_HUMID, HOT_DRY_HIGH]) {
    it(`share 0 is the air system alone (${climate.name})`, () => {
      const h = hybrid({ liquidShare: 0 });
      const series = YEAR(climate);
      expectSameHours(runScenario(h, series), runScenario(airAlone(h), series));
    });
    it(`share 1 is the liquid loop alone (${climate.name})`, () => {
      const h = hybrid({ liquidShare: 1, liquid: { heatRejection: 'cooling-tower', chilledWaterSupplyC: 27 } });
      const series = YEAR(climate);
      expectSameHours(runScenario(h, series), runScenario(liquidAlone(h), series));
    });
  }
  it('share 0 with a wetted dry cooler on the liquid side and a direct-air hall', () => {
    const h = hybrid({
      liquidShare: 0,
      liquid: { evaporativeEffectiveness: 0.7 },
      air: { kind: 'direct-air', evaporativeEffectiveness: 0.8, heatExchangerEffectiveness: undefined },
    });
    const series = YEAR(HOT_DRY_HIGH);
    expectSameHours(runScenario(h, series), runScenario(airAlone(h), series));
  });
});

describe('the overall mode and the loops', () => {
  it('is the more demanding loop each hour (mechanical > adiabatic > free) and counts each loop apart', () => {
    const h = hybrid({ liquidShare: 0.8 });
    const run = runScenario(h, YEAR());
    const liquid = run.loops!.liquid.classification.modes;
    const air = run.loops!.air.classification.modes;
    let mixed = 0;
    for (let i = 0; i < liquid.length; i++) {
      expect(run.classification.modes[i]).toBe(Math.max(liquid[i], air[i]));
      if (liquid[i] !== air[i]) mixed++;
    }
    expect(mixed).toBeGreaterThan(0); // the test climate really has hours where the loops differ
    const { loops, hours } = run.results;
    expect(loops!.liquid.hours.total).toBe(hours.total);
    expect(loops!.liquid.hours.free).toBe(Array.from(liquid).filter((m) => m === MODE.free).length);
    expect(loops!.air.hours.mechanical).toBe(Array.from(air).filter((m) => m === MODE.mechanical).length);
    // The hall is never freer than either loop.
    expect(hours.free).toBeLessThanOrEqual(Math.min(loops!.liquid.hours.free, loops!.air.hours.free));
    expect(hours.mechanical).toBeGreaterThanOrEqual(Math.max(loops!.liquid.hours.mechanical, loops!.air.hours.mechanical));
  });

  it('reports the CDU approach as the coolant supply: facility supply + approach (definition of an approach)', () => {
    const run = runScenario(hybrid({ liquid: { chilledWaterSupplyC: 32, cduApproachK: 2, chilledWaterDeltaTK: 10 } }), YEAR());
    // 32 °C facility water, 2 K CDU approach → 34 °C coolant to the cold plates; return 32 + 10 = 42 °C.
    expect(run.results.loops!.liquid.temperatures).toEqual({ facilitySupplyC: 32, facilityReturnC: 42, coolantSupplyC: 34, facilityWaterClassId: null });
  });
});

describe('worked example: dry-cooler free hours at W32 and W45 from the approach rule', () => {
  // A dry cooler's leaving water approaches the entering air's dry-bulb: free cooling while T_db + approach ≤ supply
  // (the approach rule of dry coolers, common practice). Dry-bulbs −10…49.5 °C by 0.5 K, one hour each.
  const dryBulbs = Array.from({ length: 120 }, (_, i) => -10 + i * 0.5);
  const series: ScenarioSeries = {
    timestampsMs: Float64Array.from(dryBulbs, (_, i) => Date.UTC(2023, 6, 1) + i * HOUR),
    dryBulbC: Float64Array.from(dryBulbs),
    humidity: { kind: 'relative-humidity-pct', values: new Float64Array(dryBulbs.length).fill(30) },
    pressurePa: null,
  };
  it.each([
    // W32 (recalled from memory): supply 32 °C, approach 5 K → free up to 27 °C: −10…27 by 0.5 is 75 hours.
    ['ashrae-2021-w32', 75],
    // W45: supply 45 °C, approach 5 K → free up to 40 °C: −10…40 by 0.5 is 101 hours.
    ['ashrae-2021-w45', 101],
  ])('%s gives %i free hours of 120', (classId, expected) => {
    const waterClass = FACILITY_WATER_CLASSES.find((c) => c.id === classId)!;
    const run = runScenario(hybrid({ liquid: { chilledWaterSupplyC: waterClass.presetSupplyC, approachK: 5, facilityWaterClassId: classId } }), series);
    expect(run.results.loops!.liquid.hours.free).toBe(expected);
    expect(run.results.loops!.liquid.hours.mechanical).toBe(120 - expected);
  });
});

describe('facility-water classes (ASHRAE TC 9.9, 2021; recalled from memory)', () => {
  it('lists W17…W45 by their upper supply and W+ above 45 °C, each with its edition and the recalled flag', () => {
    expect(FACILITY_WATER_CLASSES.map((c) => [c.label, c.supplyMaxC, c.supplyMinC])).toEqual([
      ['W17', 17, null],
      ['W27', 27, null],
      ['W32', 32, null],
      ['W40', 40, null],
      ['W45', 45, null],
      ['W+', null, 45],
    ]);
    for (const c of FACILITY_WATER_CLASSES) {
      expect(c.edition).toMatch(/2021/);
      expect(c.recalledFromMemory).toBe(true);
      expect(supplyFitsClass(c.presetSupplyC, c)).toBe(true);
    }
    const wPlus = FACILITY_WATER_CLASSES.at(-1)!;
    expect(supplyFitsClass(45, wPlus)).toBe(false);
    expect(supplyFitsClass(45.5, wPlus)).toBe(true);
  });
});

describe('properties', () => {
  for (const climate of [MILD_MARITIME, HOT_HUMID, HOT_DRY_HIGH]) {
    it(`raising the facility-water supply never lowers the liquid loop's free hours (${climate.name})`, { timeout: 120_000 }, () => {
      const series = syntheticSeries(climate, { hours: 8760, step: 7 });
      for (const heatRejection of ['dry-cooler', 'cooling-tower']) {
        for (const eps of [0, 0.7]) {
          let previousFree = -1;
          let previousMechanical = Number.POSITIVE_INFINITY;
          for (let supplyC = 10; supplyC <= 50; supplyC += 5) {
            const run = runScenario(hybrid({ liquid: { chilledWaterSupplyC: supplyC, heatRejection, evaporativeEffectiveness: eps } }), series);
            const { free, mechanical } = run.results.loops!.liquid.hours;
            expect(free).toBeGreaterThanOrEqual(previousFree);
            expect(mechanical).toBeLessThanOrEqual(previousMechanical);
            previousFree = free;
            previousMechanical = mechanical;
          }
        }
      }
    });
  }

  it('loop energies and water add up to the total, for shares across 0…1', () => {
    const series = YEAR(HOT_DRY_HIGH);
    for (const share of [0, 0.1, 0.35, 0.5, 0.8, 0.95, 1]) {
      const { results, energy } = runScenario(hybrid({ liquidShare: share, liquid: { heatRejection: 'cooling-tower' } }), series);
      const { liquid, air } = results.loops!;
      for (const key of ['itKwh', 'fanKwh', 'rejectionFanKwh', 'compressorKwh', 'pumpKwh', 'basinHeaterKwh', 'coolingKwh'] as const) {
        expect(liquid.energy[key]! + air.energy[key]!).toBeCloseTo(results.energy[key]!, 6);
      }
      // The tower's fans are the liquid loop's heat-rejection fans; the joined hours carry them as well as the totals.
      if (share > 0) expect(liquid.energy.rejectionFanKwh).toBeGreaterThan(0);
      expect(energy.rejectionFanKw.reduce((sum, kw) => sum + kw, 0)).toBeCloseTo(results.energy.rejectionFanKwh!, 6);
      expect(liquid.water.totalL + air.water.totalL).toBeCloseTo(results.water.totalL, 6);
      // pPUE and WUE over the whole hall (ISO/IEC 30134-2 style partial PUE; ISO/IEC 30134-9).
      expect(results.energy.partialPue).toBeCloseTo((results.energy.itKwh + results.energy.coolingKwh) / results.energy.itKwh, 12);
      expect(results.water.wueLPerKwh).toBeCloseTo(results.water.totalL / results.energy.itKwh, 12);
      // The loops carry their shares of the IT energy.
      expect(liquid.energy.itKwh).toBeCloseTo(share * results.energy.itKwh, 6);
    }
  });
});
