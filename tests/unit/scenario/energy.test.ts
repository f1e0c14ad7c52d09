/**
 * Energy and water per hour, checked on hand-computed worked examples.
 */
import { describe, expect, it } from 'vitest';
import { MODE, type HourClassification } from '../../../shared/scenario/classify';
import { copAt, hallAirMassFlowKgPerS, hourlyEnergy, LATENT_HEAT_TOWER_KJ_PER_KG } from '../../../shared/scenario/energy';
import { makeScenario } from './fixtures';

function oneHour(mode: number, fraction: number, evaporation = 0): HourClassification {
  return {
    modes: Uint8Array.of(mode),
    mechanicalFraction: Float64Array.of(fraction),
    excursions: new Uint8Array(1),
    evaporationKgPerKgAir: Float64Array.of(evaporation),
  };
}

describe('air flow and COP', () => {
  it('carries the IT load across ΔT: ṁ = P / (cp · ΔT), cp 1.006 kJ/(kg·K) (ASHRAE 2017 ch. 1 eq. 32)', () => {
    expect(hallAirMassFlowKgPerS(1000, 12)).toBeCloseTo(1000 / (1.006 * 12), 10); // 82.836 kg/s
    expect(() => hallAirMassFlowKgPerS(0, 12)).toThrow(RangeError);
  });

  it('varies COP linearly with outdoor dry-bulb and never below the floor', () => {
    const energy = { mechanicalCop: 4, copSlopePerK: -0.1, copReferenceC: 35, copMin: 1.5 };
    expect(copAt(40, energy)).toBeCloseTo(3.5, 12);
    expect(copAt(25, energy)).toBeCloseTo(5, 12);
    expect(copAt(70, energy)).toBe(1.5);
  });

  it('uses a latent heat consistent with the Handbook enthalpy terms at 30 °C', () => {
    // 2501 + 1.86·30 − 4.186·30 = 2431.2 kJ/kg (ASHRAE 2017 ch. 1 eq. 32 and 33 terms); steam tables 2429.8 (recalled from memory).
    expect(Math.abs(LATENT_HEAT_TOWER_KJ_PER_KG - (2501 + 1.86 * 30 - 4.186 * 30)) / 2431.2).toBeLessThan(0.001);
  });
});

describe('hourly energy worked examples (IT 1000 kW, fans 5 %, pumps 1 %, heat-rejection fans 2 %)', () => {
  it('water-side cooling tower, half mechanical at 40 °C', () => {
    const scenario = makeScenario('water-side', {
      system: { heatRejection: 'cooling-tower', evaporativeEffectiveness: 0 },
      energy: { copSlopePerK: -0.1, copReferenceC: 35 },
    });
    const e = hourlyEnergy(scenario.system, scenario.energy, Float64Array.of(40), oneHour(MODE.mechanical, 0.5));
    // Cooling load = IT + fan heat = 1050 kW; compressors carry half: 525 kW at COP 4 − 0.1·5 = 3.5 → 150 kW.
    expect(e.mechanicalLoadKw[0]).toBeCloseTo(525, 9);
    expect(e.compressorKw[0]).toBeCloseTo(150, 9);
    expect(e.fanKw[0]).toBeCloseTo(50 + 20, 9);
    expect(e.pumpKw[0]).toBeCloseTo(10, 9);
    // Tower evaporation: 0.85 of the rejected heat (1050 + 150 kW) over the latent heat, per hour.
    expect(e.evaporatedL[0]).toBeCloseTo((0.85 * 1200 * 3600) / 2430, 6); // 1511.1 L
  });

  it('water-side dry cooler in adiabatic assist: water = ΔW · rejected heat / (cp · air rise)', () => {
    const scenario = makeScenario('water-side', { system: { heatRejection: 'dry-cooler', dryCoolerAirRiseK: 10 } });
    const e = hourlyEnergy(scenario.system, scenario.energy, Float64Array.of(20), oneHour(MODE.adiabatic, 0, 0.002));
    const airKgPerH = (1050 / (1.006 * 10)) * 3600;
    expect(e.compressorKw[0]).toBe(0);
    expect(e.evaporatedL[0]).toBeCloseTo(0.002 * airKgPerH, 6); // ≈ 751.5 L
  });

  it('direct-air adiabatic hour: water = ΔW per kg supply · hall air flow; pumps only while evaporating', () => {
    const scenario = makeScenario('direct-air');
    const wet = hourlyEnergy(scenario.system, scenario.energy, Float64Array.of(30), oneHour(MODE.adiabatic, 0, 0.004));
    expect(wet.evaporatedL[0]).toBeCloseTo(0.004 * (1000 / (1.006 * 12)) * 3600, 6); // ≈ 1192.8 L
    expect(wet.pumpKw[0]).toBeCloseTo(10, 9);
    expect(wet.fanKw[0]).toBeCloseTo(50, 9); // no heat-rejection fans for direct air
    const free = hourlyEnergy(scenario.system, scenario.energy, Float64Array.of(10), oneHour(MODE.free, 0));
    expect(free.pumpKw[0]).toBe(0);
    expect(free.evaporatedL[0]).toBe(0);
  });

  it('a no-data hour uses no energy and no water', () => {
    const scenario = makeScenario('water-side', { system: { heatRejection: 'cooling-tower' } });
    const e = hourlyEnergy(scenario.system, scenario.energy, Float64Array.of(Number.NaN), oneHour(MODE.noData, 0));
    expect([e.fanKw[0], e.compressorKw[0], e.pumpKw[0], e.evaporatedL[0]]).toEqual([0, 0, 0, 0]);
  });
});
