/**
 * runScenario end to end on small series: pressure from the weather or the elevation, altitude
 * derating, warnings, and the worker task wrapping it (called directly and on a real thread).
 */
import { describe, expect, it } from 'vitest';
import { ENGINE_VERSION, outdoorStates, runScenario, type ScenarioSeries } from '../../../shared/scenario';
import { executeRun } from '../../../workers/execute-run';
import { createWorkerPool } from '../../../workers/pool';
import { makeScenario, psy } from './fixtures';

const HOUR = 3_600_000;

function series(dryBulbC: number[], dewPointC: number[], pressurePa: number[] | null = null): ScenarioSeries {
  return {
    timestampsMs: Float64Array.from(dryBulbC, (_, i) => Date.UTC(2022, 5, 1) + i * HOUR),
    dryBulbC: Float64Array.from(dryBulbC),
    humidity: { kind: 'dew-point-c', values: Float64Array.from(dewPointC) },
    pressurePa: pressurePa ? Float64Array.from(pressurePa) : null,
  };
}

describe('runScenario', () => {
  it('takes the standard atmosphere at the elevation when the weather has no pressure', () => {
    const scenario = makeScenario('direct-air', { elevationM: 1500 });
    const run = runScenario(scenario, series([10], [5]));
    expect(run.results.site).toEqual({ elevationM: 1500, pressureSource: 'elevation', pressureFilledHours: 0 });
    // W at 5 °C dew point and the standard pressure at 1500 m (psychrolib: ASHRAE 2017 ch. 1 eq. 3 and 20).
    expect(run.states.humidityRatio[0]).toBeCloseTo(psy.GetHumRatioFromTDewPoint(5, psy.GetStandardAtmPressure(1500)), 9);
    expect(run.results.engineVersion).toBe(ENGINE_VERSION);
  });

  it('uses station pressure where given and the elevation where a cell is missing', () => {
    const run = runScenario(makeScenario('direct-air'), series([10, 10], [5, 5], [90_000, Number.NaN]));
    expect(run.results.site).toMatchObject({ pressureSource: 'weather', pressureFilledHours: 1 });
    expect(run.states.humidityRatio[0]).toBeCloseTo(psy.GetHumRatioFromTDewPoint(5, 90_000), 9);
    expect(run.states.humidityRatio[1]).toBeCloseTo(psy.GetHumRatioFromTDewPoint(5, 101_325), 9);
  });

  it('derates the envelope maximum for altitude and flags a supply above it on every hour', () => {
    const scenario = makeScenario('direct-air', {
      elevationM: 2400,
      system: { supplyAirC: 26 },
      envelope: { altitudeDerating: { aboveElevationM: 1800, metresPerKelvin: 300 } },
    });
    const run = runScenario(scenario, series([10, 12, 14], [5, 5, 5]));
    // Recommended range 27 °C less 1 K per 300 m above 1800 m (guideline footnote, recalled from memory): 25 °C.
    expect(run.results.envelope.dryBulbMaxC).toBeCloseTo(25, 12);
    expect(run.results.excursions.supplyAboveMaxHours).toBe(3);
    expect(run.results.excursions.longestRunHours).toBe(3);
    expect(run.results.warnings[0]).toMatch(/supplyAirC 26 °C is above the envelope's maximum dry-bulb 25 °C \(derated for 2400 m\)/);
  });

  it('lets an explicit elevation override the scenario', () => {
    const run = runScenario(makeScenario('direct-air', { elevationM: 0 }), series([10], [5]), { elevationM: 3000 });
    expect(run.results.site.elevationM).toBe(3000);
  });

  it('takes outdoor states the caller already holds, and refuses states of another length', () => {
    const scenario = makeScenario('direct-air', { elevationM: 1500 });
    const weather = series([10, 22, 31], [5, 14, 20]);
    const outdoor = outdoorStates(weather, 1500);
    expect(runScenario(scenario, weather, { outdoor }).results).toEqual(runScenario(scenario, weather).results);
    expect(() => runScenario(scenario, weather, { outdoor: outdoorStates(series([10], [5]), 1500) })).toThrow(/options.outdoor has 1 hours, the series has 3/);
  });

  it('refuses series whose columns differ in length', () => {
    const bad = { ...series([10, 11], [5, 5]), timestampsMs: Float64Array.of(0) };
    expect(() => runScenario(makeScenario('direct-air'), bad)).toThrow(/timestampsMs has 1 hours/);
  });
});

describe('worker task executeRun', () => {
  const scenario = makeScenario('indirect-air');
  const weather = series([5, 15, 25, 35], [0, 8, 12, 18]);

  it('returns the same results as runScenario when called directly', () => {
    const direct = runScenario(scenario, weather);
    const task = executeRun({ scenario, series: weather });
    expect(task.results).toEqual(direct.results);
    expect(Array.from(task.modes)).toEqual(Array.from(direct.classification.modes));
  });

  it('computes the outdoor states of a keyed series once per elevation, and afresh for another key or elevation', () => {
    const warm = series([5, 15, 25, 35], [0, 8, 12, 18]);
    const options = { elevationM: 300 };
    const alone = (input: Parameters<typeof executeRun>[0]) => executeRun(input).results;
    const cold = executeRun({ scenario, series: warm, seriesKey: 'file:1', options });
    // The same key at another elevation, and a second point of the sweep, agree with runs computed from scratch.
    expect(alone({ scenario, series: warm, seriesKey: 'file:1', options: { elevationM: 2500 } })).toEqual(
      runScenario(scenario, warm, { elevationM: 2500 }).results,
    );
    const other = makeScenario('indirect-air', { system: { supplyAirC: 24 } });
    expect(alone({ scenario: other, series: warm, seriesKey: 'file:1', options })).toEqual(runScenario(other, warm, options).results);
    expect(cold.results).toEqual(runScenario(scenario, warm, options).results);
    // Another file under a new key: its own states, not the last file's.
    const dry = series([5, 15, 25, 35], [-10, -5, 0, 2]);
    expect(alone({ scenario, series: dry, seriesKey: 'file:2', options })).toEqual(runScenario(scenario, dry, options).results);
  });

  it('rejects an invalid scenario, naming the field', () => {
    expect(() => executeRun({ scenario: { ...scenario, system: { ...scenario.system, supplyAirC: 'warm' } }, series: weather })).toThrow(/system.supplyAirC: /);
  });

  it('runs on a piscina thread with the hourly columns as typed arrays', { timeout: 30_000 }, async () => {
    const pool = createWorkerPool({ threads: 1 });
    try {
      const { results } = await pool.run('executeRun', { scenario, series: weather });
      expect(results.hours).toEqual(runScenario(scenario, weather).results.hours);
    } finally {
      await pool.destroy();
    }
  });
});
