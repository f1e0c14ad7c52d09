/**
 * Compressor COP from its lift: the reversed Carnot cycle (Çengel & Boles, "Thermodynamics: An Engineering
 * Approach", ch. 6: COP_R,rev = T_L / (T_H − T_L), kelvin), a Carnot fraction calibrated at the AHRI 550/590
 * rating conditions (recalled from memory), and the part-load curve.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import {
  calibrateCompressor,
  carnotCop,
  compressorPowerKw,
  fullLoadCop,
  MIN_LIFT_K,
  partLoadInputRatio,
  RATING_CONDITIONS,
} from '../../../shared/scenario/compressor';

describe('Carnot COP', () => {
  it('is T_L / (T_H − T_L) in kelvin: −5 °C to 35 °C gives 268.15 / 40 = 6.70 (reversed Carnot cycle, Çengel & Boles ch. 6)', () => {
    expect(carnotCop(-5, 35)).toBeCloseTo(268.15 / 40, 12);
    expect(carnotCop(-5, 35)).toBeCloseTo(6.704, 3);
  });

  it('floors the lift at MIN_LIFT_K, so the COP stays finite as the lift falls to 0', () => {
    expect(MIN_LIFT_K).toBe(10);
    expect(carnotCop(15, 16)).toBeCloseTo((15 + 273.15) / 10, 12);
    expect(carnotCop(15, 5)).toBeCloseTo((15 + 273.15) / 10, 12);
  });
});

describe('the lift model calibrated to the rated COP', () => {
  const approaches = { evaporatorApproachK: 5, condenserApproachK: 10, minTurndown: 0.2 };

  it('gives the rated COP at the rating conditions (AHRI 550/590: 6.7 °C leaving, 35 °C air or 29.4 °C condenser water)', () => {
    expect(RATING_CONDITIONS).toEqual({ leavingC: 6.7, airCooledEnteringC: 35, waterCooledEnteringC: 29.4 });
    const air = calibrateCompressor(3.2, 'air-cooled', approaches);
    expect(fullLoadCop(air, 6.7, 35)).toBeCloseTo(3.2, 12);
    const water = calibrateCompressor(6, 'water-cooled', approaches);
    expect(fullLoadCop(water, 6.7, 29.4)).toBeCloseTo(6, 12);
    // η = 6 / (274.85 / 37.7) = 0.8230 for water-cooled.
    expect(water.carnotFraction).toBeCloseTo(6 / (274.85 / 37.7), 12);
  });

  it('scales the COP by the ratio of Carnot COPs away from the rating: lower lift, higher COP', () => {
    const water = calibrateCompressor(6, 'water-cooled', approaches);
    // Condenser water 20 °C, chilled water 12 °C: COP = 6 · (280.15 / 23) / (274.85 / 37.7).
    expect(fullLoadCop(water, 12, 20)).toBeCloseTo((6 * (280.15 / 23)) / (274.85 / 37.7), 10);
    expect(fullLoadCop(water, 12, 20)).toBeGreaterThan(fullLoadCop(water, 12, 30));
  });
});

describe('part load', () => {
  it('uses the quadratic EIR curve 0.2 + 0.2·PLR + 0.6·PLR², 1 at full load', () => {
    expect(partLoadInputRatio(1)).toBeCloseTo(1, 12);
    expect(partLoadInputRatio(0.5)).toBeCloseTo(0.45, 12);
  });

  it('draws capacity/COP × EIR(PLR) above the turndown and cycles linearly below it', () => {
    expect(compressorPowerKw(500, 1000, 5, 0.2)).toBeCloseTo((1000 / 5) * 0.45, 12); // 90 kW
    // PLR 0.1 below 0.2: half of the power at 0.2, (1000/5)·0.264.
    expect(compressorPowerKw(100, 1000, 5, 0.2)).toBeCloseTo(0.5 * 200 * 0.264, 12);
    expect(compressorPowerKw(0, 1000, 5, 0.2)).toBe(0);
  });
});
