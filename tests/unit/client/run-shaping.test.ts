import { describe, expect, it } from 'vitest';
import { dryBulbBins } from '../../../shared/report/dry-bulb-bins';
import { flattenInputs } from '../../../shared/report/inputs';
import { monthlyModeRows } from '@/lib/charts/monthly-mode-rows';

describe('the bin table', () => {
  it('counts hours per mode in 2 K bins, warmest first, with the mean coincident wet-bulb', () => {
    const dryBulbC = [21.9, 20.0, 23.5, 19.99, 24.0, Number.NaN, 17.2];
    const wetBulbC = [16.0, 15.0, 18.0, 14.0, 19.0, Number.NaN, Number.NaN];
    const modes = [0, 1, 2, 0, 2, 3, 0];
    const { bins, hoursWithoutDryBulb } = dryBulbBins(modes, dryBulbC, wetBulbC);
    expect(hoursWithoutDryBulb).toBe(1);
    expect(bins.map((b) => [b.fromC, b.toC])).toEqual([
      [24, 26],
      [22, 24],
      [20, 22],
      [18, 20],
      [16, 18],
    ]);
    expect(bins[0].hours).toEqual([0, 0, 1, 0]);
    // [20, 22): 21.9 free and 20.0 adiabatic; mean wet-bulb (16 + 15) / 2.
    expect(bins[2].hours).toEqual([1, 1, 0, 0]);
    expect(bins[2].meanWetBulbC).toBeCloseTo(15.5, 12);
    // 19.99 belongs below 20 (lower edge inclusive, upper exclusive).
    expect(bins[3].hours).toEqual([1, 0, 0, 0]);
    // An hour with a dry-bulb but no wet-bulb counts, and leaves the mean undefined.
    expect(bins[4].total).toBe(1);
    expect(bins[4].meanWetBulbC).toBeNaN();
    expect(bins.reduce((s, b) => s + b.total, 0) + hoursWithoutDryBulb).toBe(dryBulbC.length);
  });

  it('keeps empty bins between the coldest and warmest hours', () => {
    const { bins } = dryBulbBins([0, 0], [-3, 4], [-4, 2]);
    expect(bins.map((b) => b.fromC)).toEqual([4, 2, 0, -2, -4]);
    expect(bins.map((b) => b.total)).toEqual([1, 0, 0, 0, 1]);
  });

  it('refuses columns of different lengths, naming them', () => {
    expect(() => dryBulbBins([0], [1, 2], [1, 2])).toThrow(/modes \(1\)/);
  });
});

describe('monthly rows and inputs as run', () => {
  it('lays out each month in the palette order of the modes', () => {
    const rows = monthlyModeRows([{ month: 7, free: 39, adiabatic: 6, mechanical: 27, noData: 0, total: 72, humidified: 0, partialMechanical: 0 }]);
    expect(rows).toEqual([
      { month: 7, mode: 'free', hours: 39 },
      { month: 7, mode: 'adiabatic', hours: 6 },
      { month: 7, mode: 'mechanical', hours: 27 },
      { month: 7, mode: 'noData', hours: 0 },
    ]);
  });

  it('reads each input’s unit from its field name', () => {
    const rows = flattenInputs({
      elevationM: 120,
      system: { supplyAirC: 24, itDeltaTK: 12 },
      energy: { copSlopePerK: -0.08, itLoadKw: 1000 },
      envelope: { rhMaxPct: 80 },
    });
    expect(Object.fromEntries(rows.map((r) => [r.path, r.kind]))).toEqual({
      elevationM: 'elevation',
      'system.supplyAirC': 'temperature',
      'system.itDeltaTK': 'temperatureDifference',
      'energy.copSlopePerK': 'plain',
      'energy.itLoadKw': 'power',
      'envelope.rhMaxPct': 'percent',
    });
  });
});
