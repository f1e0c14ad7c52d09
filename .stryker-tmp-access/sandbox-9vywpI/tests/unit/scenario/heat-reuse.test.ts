/**
 * Heat reuse from the liquid loop: available heat at a threshold, the heat pump's COP from the lift model, and the
 * Energy Reuse Factor by its ISO/IEC 30134-6 definition.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { energyReuseFactor, parseScenario, runScenario, type ScenarioSeries } from '../../../shared/scenario';
import { RECOMMENDED } from './fixtures';

const HOUR = 3_600_000;
const KELVIN = 273.15;

/** 48 hours from 1 January (local standard time = UTC) at 10 °C: every hour free for the liquid loop. */
const series: ScenarioSeries = {
  timestampsMs: Float64Array.from({ length: 48 }, (_, i) => Date.UTC(2023, 0, 31) + i * HOUR),
  dryBulbC: new Float64Array(48).fill(10),
  humidity: { kind: 'relative-humidity-pct', values: new Float64Array(48).fill(50) },
  pressurePa: null,
};

function hall(heatReuse: unknown, liquid: Record<string, unknown> = {}) {
  const parsed = parseScenario({
    name: 'reuse',
    elevationM: 0,
    envelope: RECOMMENDED,
    system: {
      kind: 'hybrid',
      liquidShare: 0.8,
      liquid: {
        kind: 'water-side',
        chilledWaterSupplyC: 32,
        chilledWaterDeltaTK: 10,
        approachK: 5,
        heatRejection: 'dry-cooler',
        evaporativeEffectiveness: 0,
        cduApproachK: 2,
        ...liquid,
      },
      air: { kind: 'indirect-air', supplyAirC: 24, itDeltaTK: 12, heatExchangerEffectiveness: 0.7, evaporativeEffectiveness: 0.85 },
      heatReuse,
    },
    energy: { itLoadKw: 1000, mechanicalCop: 5, fanPowerFraction: 0.05 },
  });
  if (!parsed.ok) throw new Error(parsed.errors.join('; '));
  return parsed.scenario;
}

describe('ERF (ISO/IEC 30134-6: reused energy / total data-centre energy; recalled from memory)', () => {
  it('is the plain ratio, null without energy, and refuses a negative figure', () => {
    expect(energyReuseFactor(2_000_000, 10_000_000)).toBe(0.2);
    expect(energyReuseFactor(0, 0)).toBeNull();
    expect(() => energyReuseFactor(-1, 10)).toThrow(RangeError);
  });

  it('worked example: 42 °C return over a 40 °C threshold, half the heat taken', () => {
    const run = runScenario(hall({ thresholdC: 40, reusedShare: 0.5 }), series);
    const reuse = run.results.heatReuse!;
    // Return = 32 + 10 = 42 °C ≥ 40 °C: every hour with load offers the liquid loop's heat, 0.8 × 1000 kW.
    expect(reuse).toMatchObject({ source: 'direct', returnWaterC: 42, availableHours: 48, heatPumpCop: null, heatPumpKwh: 0 });
    expect(reuse.availableKwh).toBeCloseTo(48 * 800, 6);
    // 24 hours in January (31 Jan), 24 in February (1 Feb), in the site's standard time.
    expect(reuse.availableKwhByMonth.slice(0, 3)).toEqual([24 * 800, 24 * 800, 0]);
    expect(reuse.reusedKwh).toBeCloseTo(0.5 * 48 * 800, 6);
    const dataCentreKwh = run.results.energy.itKwh + run.results.energy.coolingKwh;
    expect(reuse.erf).toBeCloseTo((0.5 * 48 * 800) / dataCentreKwh, 12);
    // E_DC here is IT (48 000 kWh) plus the cooling energy, so ERF sits a little below 19 200 / 48 000 = 0.4.
    expect(reuse.erf!).toBeLessThan(0.4);
    expect(reuse.erf!).toBeGreaterThan(0.35);
  });

  it('offers nothing when the return is below the threshold and there is no heat pump', () => {
    const reuse = runScenario(hall({ thresholdC: 55, reusedShare: 1 }), series).results.heatReuse!;
    expect(reuse).toMatchObject({ source: 'none', availableHours: 0, availableKwh: 0, reusedKwh: 0, erf: 0 });
  });

  it('lifts the return with a heat pump whose COP follows the lift model (Carnot fraction calibrated at AHRI 550/590 rating)', () => {
    const reuse = runScenario(hall({ thresholdC: 60, reusedShare: 1, heatPump: true }), series).results.heatReuse!;
    // Carnot fraction η: rated COP 5, water-cooled rating (6.7 °C leaving, 29.4 °C entering; AHRI 550/590, recalled),
    // evaporator approach 5 K, condenser approach 10 K: η = 5 / [(1.7 + 273.15) / (39.4 − 1.7)].
    const eta = 5 / ((1.7 + KELVIN) / (39.4 - 1.7));
    // Heat pump: water leaves its evaporator at the 32 °C supply (T_evap 27 °C), delivers at 60 °C (T_cond 70 °C).
    // Heating COP = cooling COP + 1 (first law: Q_hot = Q_cold + W).
    const heating = eta * ((27 + KELVIN) / (70 - 27)) + 1;
    expect(reuse.source).toBe('heat-pump');
    expect(reuse.heatPumpCop).toBeCloseTo(heating, 9);
    // Delivered heat = source heat × COP / (COP − 1); electricity = delivered / COP.
    expect(reuse.availableKwh).toBeCloseTo(48 * 800 * (heating / (heating - 1)), 6);
    expect(reuse.heatPumpKwh).toBeCloseTo(reuse.availableKwh / heating, 6);
    expect(reuse.dataCentreKwh).toBeCloseTo(reuse.reusedKwh / reuse.erf!, 6);
  });

  it('is left out of single-system results and of a hybrid without heat reuse', () => {
    const parsed = hall(undefined);
    expect(runScenario(parsed, series).results.heatReuse).toBeUndefined();
  });
});
