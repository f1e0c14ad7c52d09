/**
 * Energy and water per hour, checked on hand-computed worked examples. The compressor figures are computed
 * here from the written-out relations (Carnot COP × a calibrated fraction, AHRI 550/590 rating conditions
 * recalled from memory, the quadratic part-load curve), not by calling the engine's compressor module.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { MODE, type HourClassification } from '../../../shared/scenario/classify';
import { hallAirMassFlowKgPerS, LATENT_HEAT_TOWER_KJ_PER_KG } from '../../../shared/scenario/air';
import { hourlyEnergy } from '../../../shared/scenario/energy';
import { SEA_LEVEL_PA, makeScenario, psy } from './fixtures';

function oneHour(mode: number, fraction: number, evaporation = 0, humidified = 0): HourClassification {
  return {
    modes: Uint8Array.of(mode),
    humidified: Uint8Array.of(humidified),
    mechanicalFraction: Float64Array.of(fraction),
    excursions: new Uint8Array(1),
    evaporationKgPerKgAir: Float64Array.of(evaporation),
  };
}

/** Outdoor hour from dry-bulb and wet-bulb (psychrolib, the reference library). */
function outdoor(t: number, twb: number) {
  const w = psy.GetHumRatioFromTWetBulb(t, twb, SEA_LEVEL_PA);
  return { dryBulbC: Float64Array.of(t), wetBulbC: Float64Array.of(twb), humidityRatio: Float64Array.of(w) };
}

const K = 273.15;
/** Carnot COP T_evap / (T_cond − T_evap), kelvin. */
const carnot = (evapC: number, condC: number) => (evapC + K) / (condC - evapC);
const ENERGY = { fanPowerFraction: 0.05, pumpPowerFraction: 0.01, heatRejectionFanFraction: 0.02 };

describe('air flow', () => {
  it('carries the IT load across ΔT: ṁ = P / (cp · ΔT), cp 1.006 kJ/(kg·K) (ASHRAE 2017 ch. 1 eq. 32)', () => {
    expect(hallAirMassFlowKgPerS(1000, 12)).toBeCloseTo(1000 / (1.006 * 12), 10); // 82.836 kg/s
    expect(() => hallAirMassFlowKgPerS(0, 12)).toThrow(RangeError);
  });

  it('uses a latent heat consistent with the Handbook enthalpy terms at 30 °C', () => {
    // 2501 + 1.86·30 − 4.186·30 = 2431.2 kJ/kg (ASHRAE 2017 ch. 1 eq. 32 and 33 terms); steam tables 2429.8 (recalled from memory).
    expect(Math.abs(LATENT_HEAT_TOWER_KJ_PER_KG - (2501 + 1.86 * 30 - 4.186 * 30)) / 2431.2).toBeLessThan(0.001);
  });
});

describe('hourly energy worked examples (IT 1000 kW, fans 5 %, pumps 1 %, heat-rejection fans 2 %)', () => {
  it('water-side cooling tower, half mechanical at wet-bulb 20 °C: COP from the lift, part-load curve', () => {
    const scenario = makeScenario('water-side', { system: { heatRejection: 'cooling-tower', evaporativeEffectiveness: 0 }, energy: ENERGY });
    const e = hourlyEnergy(scenario.system, scenario.energy, outdoor(28, 20), Float64Array.of(1), oneHour(MODE.mechanical, 0.5), SEA_LEVEL_PA);
    // η from the rating (water-cooled: 29.4 °C entering condenser water, 6.7 °C leaving; approaches 5 K and 10 K):
    const eta = 4 / carnot(6.7 - 5, 29.4 + 10); // 4 / 7.2905 = 0.5487
    // The hour: chilled water 18 °C − 5 K; condenser water = wet-bulb 20 + approach 5 = 25 °C, + 10 K.
    const cop = eta * carnot(13, 35); // 0.5487 · 13.007 = 7.136
    // Cooling load = IT + fans = 1050 kW; compressors carry 525 kW, PLR 0.5: EIR ratio 0.2 + 0.2·0.5 + 0.6·0.25 = 0.45.
    expect(e.cop[0]).toBeCloseTo(cop, 9);
    expect(e.mechanicalLoadKw[0]).toBeCloseTo(525, 9);
    expect(e.compressorKw[0]).toBeCloseTo((1050 / cop) * 0.45, 9); // ≈ 66.2 kW
    expect(e.fanKw[0]).toBeCloseTo(50 + 20, 9);
    expect(e.pumpKw[0]).toBeCloseTo(10, 9);
    expect(e.rejectedKw[0]).toBeCloseTo(1050 + e.compressorKw[0], 9);
    expect(e.evaporativeCoolingL[0]).toBeGreaterThan(0);
    expect(e.driftL[0]).toBeCloseTo((0.0002 * e.rejectedKw[0] * 3600) / (4.186 * 5.6), 9); // 0.02 % of circulating water
  });

  it('below the minimum turndown the compressor cycles at its turndown efficiency', () => {
    const scenario = makeScenario('water-side', { system: { heatRejection: 'cooling-tower', evaporativeEffectiveness: 0 }, energy: ENERGY });
    const e = hourlyEnergy(scenario.system, scenario.energy, outdoor(28, 20), Float64Array.of(1), oneHour(MODE.mechanical, 0.1), SEA_LEVEL_PA);
    const cop = (4 / carnot(1.7, 39.4)) * carnot(13, 35);
    // PLR 0.1 < 0.2: P = (0.1 / 0.2) · (1050 / COP) · EIR(0.2) with EIR(0.2) = 0.2 + 0.04 + 0.024 = 0.264.
    expect(e.compressorKw[0]).toBeCloseTo(0.5 * (1050 / cop) * 0.264, 9);
  });

  it('a tower below the freeze-protection wet-bulb runs dry: no evaporation or drift, basin heaters on', () => {
    const scenario = makeScenario('water-side', { system: { heatRejection: 'cooling-tower', evaporativeEffectiveness: 0 }, energy: ENERGY });
    const e = hourlyEnergy(scenario.system, scenario.energy, outdoor(0, -2), Float64Array.of(1), oneHour(MODE.free, 0), SEA_LEVEL_PA);
    expect(e.evaporativeCoolingL[0]).toBe(0);
    expect(e.driftL[0]).toBe(0);
    expect(e.basinHeaterKw[0]).toBeCloseTo(0.001 * 1000, 12);
  });

  it('water-side dry cooler in adiabatic assist: water = ΔW · the unit’s design air flow', () => {
    const scenario = makeScenario('water-side', { system: { heatRejection: 'dry-cooler', dryCoolerAirRiseK: 10 }, energy: ENERGY });
    const e = hourlyEnergy(scenario.system, scenario.energy, outdoor(20, 14), Float64Array.of(0.5), oneHour(MODE.adiabatic, 0, 0.002), SEA_LEVEL_PA);
    // Design heat rejected = 1050 kW · (1 + 1/COP 4) = 1312.5 kW; air = that / (cp · 10 K), whatever the hour's load.
    const airKgPerH = ((1050 * 1.25) / (1.006 * 10)) * 3600;
    expect(e.compressorKw[0]).toBe(0);
    expect(e.evaporativeCoolingL[0]).toBeCloseTo(0.002 * airKgPerH, 6); // ≈ 939.4 L
  });

  it('direct-air: humidification water apart from evaporative cooling; pumps only while the stage runs', () => {
    const scenario = makeScenario('direct-air', { energy: ENERGY });
    const air = (1000 / (1.006 * 12)) * 3600;
    const wet = hourlyEnergy(scenario.system, scenario.energy, outdoor(30, 18), Float64Array.of(1), oneHour(MODE.adiabatic, 0, 0.004), SEA_LEVEL_PA);
    expect(wet.evaporativeCoolingL[0]).toBeCloseTo(0.004 * air, 6); // ≈ 1192.8 L
    expect(wet.humidificationL[0]).toBe(0);
    expect(wet.pumpKw[0]).toBeCloseTo(10, 9);
    expect(wet.fanKw[0]).toBeCloseTo(50, 9); // no heat-rejection fans for direct air
    const humid = hourlyEnergy(scenario.system, scenario.energy, outdoor(-5, -7), Float64Array.of(1), oneHour(MODE.free, 0, 0.001, 1), SEA_LEVEL_PA);
    expect(humid.humidificationL[0]).toBeCloseTo(0.001 * air, 6);
    expect(humid.evaporativeCoolingL[0]).toBe(0);
    const free = hourlyEnergy(scenario.system, scenario.energy, outdoor(10, 5), Float64Array.of(1), oneHour(MODE.free, 0), SEA_LEVEL_PA);
    expect(free.pumpKw[0]).toBe(0);
    expect(free.humidificationL[0] + free.evaporativeCoolingL[0]).toBe(0);
  });

  it('hall fans follow the load by the affinity law (power ∝ speed³) down to their minimum speed', () => {
    const scenario = makeScenario('direct-air', { system: { evaporativeEffectiveness: 0 }, energy: { ...ENERGY, fanMinSpeedFraction: 0.3 } });
    const e = hourlyEnergy(
      scenario.system,
      scenario.energy,
      { ...outdoor(10, 5), dryBulbC: Float64Array.of(10, 10), wetBulbC: Float64Array.of(5, 5), humidityRatio: Float64Array.of(0.004, 0.004) },
      Float64Array.of(0.5, 0.2),
      {
        modes: Uint8Array.of(MODE.free, MODE.free),
        humidified: new Uint8Array(2),
        mechanicalFraction: new Float64Array(2),
        excursions: new Uint8Array(2),
        evaporationKgPerKgAir: new Float64Array(2),
      },
      SEA_LEVEL_PA,
    );
    expect(e.itKw[0]).toBe(500);
    expect(e.fanKw[0]).toBeCloseTo(50 * 0.5 ** 3, 12); // 6.25 kW
    expect(e.fanKw[1]).toBeCloseTo(50 * 0.3 ** 3, 12); // minimum speed: 1.35 kW
  });

  it('scavenger fans scale with the scavenger air flow (affinity law) and stop when the exchanger is bypassed', () => {
    const half = makeScenario('indirect-air', { system: { scavengerAirRatio: 0.5, evaporativeEffectiveness: 0 }, energy: ENERGY });
    const e = hourlyEnergy(half.system, half.energy, outdoor(10, 5), Float64Array.of(1), oneHour(MODE.free, 0), SEA_LEVEL_PA);
    expect(e.fanKw[0]).toBeCloseTo(50 + 20 * 0.5 ** 3, 12);
    const bypassed = hourlyEnergy(half.system, half.energy, outdoor(40, 25), Float64Array.of(1), oneHour(MODE.mechanical, 1), SEA_LEVEL_PA);
    expect(bypassed.fanKw[0]).toBeCloseTo(50, 12);
  });

  it('a no-data hour uses no energy and no water', () => {
    const scenario = makeScenario('water-side', { system: { heatRejection: 'cooling-tower' } });
    const nan = Float64Array.of(Number.NaN);
    const e = hourlyEnergy(
      scenario.system,
      scenario.energy,
      { dryBulbC: nan, wetBulbC: nan, humidityRatio: nan },
      Float64Array.of(1),
      oneHour(MODE.noData, 0),
      SEA_LEVEL_PA,
    );
    expect([e.itKw[0], e.fanKw[0], e.compressorKw[0], e.pumpKw[0], e.evaporativeCoolingL[0], e.driftL[0]]).toEqual([0, 0, 0, 0, 0, 0]);
  });
});
