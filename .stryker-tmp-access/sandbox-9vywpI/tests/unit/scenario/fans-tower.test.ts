/**
 * Fans and pumps on the affinity laws, the fan heat they derive, and the cooling tower's water: worked examples.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { affinityPowerKw, designFanHeatK, fanHeatK, speedFraction } from '../../../shared/scenario/fans';
import { SaturatedExit, TOWER_AIR_ENTHALPY_RISE_KJ_PER_KG, towerEvaporationPerKgAir } from '../../../shared/scenario/tower';
import { hallAirMassFlowKgPerS } from '../../../shared/scenario/air';
import { psy, SEA_LEVEL_PA } from './fixtures';

describe('affinity laws (flow ∝ N, pressure ∝ N², power ∝ N³; ASHRAE Handbook—HVAC Systems and Equipment, fans chapter, recalled from memory)', () => {
  it('at 80 % speed a fan draws 0.8³ = 51.2 % of its design power', () => {
    expect(affinityPowerKw(100, 0.8)).toBeCloseTo(51.2, 12);
  });

  it('follows the load down to the minimum speed, then holds it', () => {
    expect(speedFraction(0.6, 0.3)).toBe(0.6);
    expect(speedFraction(0.1, 0.3)).toBe(0.3);
  });
});

describe('fan heat, derived: ΔT = P_fan / (ṁ·cp)', () => {
  it('is fanPowerFraction · ΔT_IT at the design flow: 5 % at a 12 K rise is 0.6 K', () => {
    expect(designFanHeatK(0.05, 12)).toBeCloseTo(0.6, 12);
    // The same from the definition: 50 kW of fans in the air that carries 1000 kW across 12 K.
    expect(fanHeatK(50, hallAirMassFlowKgPerS(1000, 12))).toBeCloseTo(0.6, 12);
  });
});

/** Saturation temperature of air with enthalpy h (kJ/kg), by bisection on psychrolib's saturated enthalpy. */
function saturatedAt(h: number, p: number): number {
  let lo = -40;
  let hi = 80;
  for (let k = 0; k < 80; k++) {
    const mid = (lo + hi) / 2;
    if (psy.GetSatAirEnthalpy(mid, p) / 1000 < h) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

describe('cooling-tower evaporation (saturated leaving air, Merkel; energy balance on the air)', () => {
  const p = SEA_LEVEL_PA;

  it('closes the energy balance on a summer hour (30 °C dry-bulb, 24 °C wet-bulb): Q = ṁ·Δh = latent + sensible', () => {
    const w = psy.GetHumRatioFromTWetBulb(30, 24, p);
    const hIn = psy.GetMoistAirEnthalpy(30, w) / 1000;
    const hOut = hIn + TOWER_AIR_ENTHALPY_RISE_KJ_PER_KG; // (L/G 1.2) · 4.186 · 5.6 K = 28.13 kJ/kg
    const tOut = saturatedAt(hOut, p);
    const wOut = psy.GetSatHumRatio(tOut, p);
    const evaporated = wOut - w;
    expect(towerEvaporationPerKgAir(30, w, p)).toBeCloseTo(evaporated, 5);
    expect(new SaturatedExit(p).humidityRatioAt(hOut) - w).toBeCloseTo(evaporated, 5);
    // Per kg of air: latent (evaporated water at 2501 + 1.86·t_out) + sensible (1.006 + 1.86·W_in)·Δt equals Δh (eq. 32).
    const latent = evaporated * (2501 + 1.86 * tOut);
    const sensible = (1.006 + 1.86 * w) * (tOut - 30);
    expect(latent + sensible).toBeCloseTo(TOWER_AIR_ENTHALPY_RISE_KJ_PER_KG, 6);
    // Evaporation ≈ 1 % of the circulating water per 5.6 K of range is the trade's rule of thumb (common practice):
    const circulatingPerKgAir = 1.2;
    expect(evaporated / circulatingPerKgAir).toBeGreaterThan(0.007);
    expect(evaporated / circulatingPerKgAir).toBeLessThan(0.011);
  });

  it('evaporates a smaller share of the heat in cold, dry air than in warm, humid air', () => {
    const share = (t: number, twb: number) => {
      const w = psy.GetHumRatioFromTWetBulb(t, twb, p);
      return (towerEvaporationPerKgAir(t, w, p) * 2430) / TOWER_AIR_ENTHALPY_RISE_KJ_PER_KG;
    };
    expect(share(5, 2)).toBeLessThan(0.75);
    expect(share(30, 24)).toBeGreaterThan(0.85);
    expect(share(5, 2)).toBeLessThan(share(30, 24));
  });
});
