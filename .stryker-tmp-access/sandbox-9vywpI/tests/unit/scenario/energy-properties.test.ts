/**
 * Properties of every hour whatever the weather (fast-check), issue 12: heat rejected = cooling load + compressor
 * work; the same dry-bulb with drier air never raises a tower chiller's compressor energy; humidified hours are
 * free hours; a partial hour's fraction lies strictly between 0 and 1, and the counts agree with the hours.
 */
// @ts-nocheck

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MODE, runScenario, type ScenarioSeries } from '../../../shared/scenario';
import { makeScenario } from './fixtures';

const KINDS = ['direct-air', 'indirect-air', 'water-side'] as const;

const hourArb = fc.record({
  t: fc.double({ min: -25, max: 45, noNaN: true }),
  depression: fc.double({ min: 0, max: 35, noNaN: true }),
  load: fc.double({ min: 0, max: 1, noNaN: true }),
});

function seriesOf(hours: { t: number; depression: number }[]): ScenarioSeries {
  return {
    timestampsMs: Float64Array.from(hours, (_, i) => Date.UTC(2021, 0, 1) + i * 3_600_000),
    dryBulbC: Float64Array.from(hours, (h) => h.t),
    humidity: { kind: 'dew-point-c', values: Float64Array.from(hours, (h) => Math.max(-60, h.t - h.depression)) },
    pressurePa: null,
  };
}

const systemArb = fc.record({
  kind: fc.constantFrom(...KINDS),
  evaporativeEffectiveness: fc.constantFrom(0, 0.6, 0.9),
  heatRejection: fc.constantFrom('dry-cooler', 'cooling-tower'),
  scavengerAirRatio: fc.constantFrom(0.3, 1, 2),
  supplyAirC: fc.double({ min: 20, max: 28, noNaN: true }), // above the fixtures' 18 °C chilled water
});

/** A ramp of 2 values keeps the load varying by year; hourly variation comes from a profile of the drawn loads. */
function scenarioFor(system: { kind: (typeof KINDS)[number] } & Record<string, unknown>, loads: number[]) {
  const fractions = Array.from({ length: 8760 }, (_, h) => loads[h % loads.length]);
  return makeScenario(system.kind, { system, energy: { itLoadProfile: { kind: 'hourly-profile', name: 'drawn', fractions } } });
}

describe('every hour', () => {
  it('rejects the cooling load (IT + hall fans) plus the compressors’ work, and uses no negative energy or water', () => {
    fc.assert(
      fc.property(systemArb, fc.array(hourArb, { minLength: 1, maxLength: 48 }), (system, hours) => {
        const scenario = scenarioFor(
          system,
          hours.map((h) => h.load),
        );
        const run = runScenario(scenario, seriesOf(hours));
        const e = run.energy;
        const hallFanDesignKw = scenario.energy.fanPowerFraction * scenario.energy.itLoadKw;
        for (let i = 0; i < hours.length; i++) {
          if (run.classification.modes[i] === MODE.noData) continue;
          const speed = Math.max(hours[i].load, scenario.energy.fanMinSpeedFraction);
          const coolingLoadKw = e.itKw[i] + hallFanDesignKw * speed ** 3;
          expect(e.rejectedKw[i]).toBeCloseTo(coolingLoadKw + e.compressorKw[i], 9);
          expect(e.mechanicalLoadKw[i]).toBeCloseTo(run.classification.mechanicalFraction[i] * coolingLoadKw, 9);
          for (const v of [e.compressorKw[i], e.fanKw[i], e.pumpKw[i], e.humidificationL[i], e.evaporativeCoolingL[i], e.driftL[i]]) {
            expect(v).toBeGreaterThanOrEqual(0);
          }
        }
      }),
      { numRuns: 60 },
    );
  });

  it('counts humidified hours only among free hours, and partial hours exactly where 0 < fraction < 1 in mechanical hours', () => {
    fc.assert(
      fc.property(systemArb, fc.array(hourArb, { minLength: 1, maxLength: 48 }), (system, hours) => {
        const run = runScenario(scenarioFor(system, [1]), seriesOf(hours));
        const { modes, humidified, mechanicalFraction } = run.classification;
        let partial = 0;
        let humid = 0;
        for (let i = 0; i < hours.length; i++) {
          if (humidified[i] === 1) {
            expect(modes[i]).toBe(MODE.free);
            humid++;
          }
          if (modes[i] !== MODE.mechanical) expect(mechanicalFraction[i]).toBe(0);
          else if (mechanicalFraction[i] > 0 && mechanicalFraction[i] < 1) partial++;
        }
        expect(run.results.hours.humidified).toBe(humid);
        expect(run.results.hours.partialMechanical).toBe(partial);
        expect(run.results.hours.humidified).toBeLessThanOrEqual(run.results.hours.free);
        expect(run.results.hours.partialMechanical).toBeLessThanOrEqual(run.results.hours.mechanical);
      }),
      { numRuns: 60 },
    );
  });
});

describe('a tower chiller', () => {
  it('never draws more compressor power at the same dry-bulb with drier air (lower wet-bulb), above the freeze-protection wet-bulb', () => {
    const scenario = makeScenario('water-side', {
      system: { heatRejection: 'cooling-tower', evaporativeEffectiveness: 0, chilledWaterSupplyC: 12, freezeProtectionWetBulbC: -20 },
    });
    fc.assert(
      fc.property(
        fc.array(
          fc.record({
            t: fc.double({ min: 5, max: 45, noNaN: true }),
            depression: fc.double({ min: 0, max: 30, noNaN: true }),
            drier: fc.double({ min: 0, max: 15, noNaN: true }),
          }),
          { minLength: 1, maxLength: 24 },
        ),
        (hours) => {
          const humid = runScenario(scenario, seriesOf(hours));
          const dry = runScenario(scenario, seriesOf(hours.map((h) => ({ t: h.t, depression: h.depression + h.drier }))));
          for (let i = 0; i < hours.length; i++) expect(dry.energy.compressorKw[i]).toBeLessThanOrEqual(humid.energy.compressorKw[i] + 1e-9);
        },
      ),
      { numRuns: 100 },
    );
  });

  it('known exception: crossing below the freeze-protection wet-bulb the tower runs dry, so drier air can need the chiller', () => {
    const scenario = makeScenario('water-side', { system: { heatRejection: 'cooling-tower', evaporativeEffectiveness: 0, chilledWaterSupplyC: 10 } });
    // 6 °C dry-bulb: dew point 3 °C gives a wet-bulb of about 4.5 °C (free: water = wet-bulb + 5 K ≤ 10 °C); dew point −20 °C
    // gives one below 2 °C, the tower runs dry and its water approaches the dry-bulb (6 + 5 = 11 °C > 10 °C).
    const humid = runScenario(scenario, seriesOf([{ t: 6, depression: 3 }]));
    const dry = runScenario(scenario, seriesOf([{ t: 6, depression: 26 }]));
    expect(humid.classification.modes[0]).toBe(MODE.free);
    expect(dry.classification.modes[0]).toBe(MODE.mechanical);
    expect(dry.energy.basinHeaterKw[0]).toBeGreaterThan(0);
  });
});
