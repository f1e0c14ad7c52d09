// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { exceededValue, sortedFinite } from '../../../shared/climate-summary/quantile';
import { monthlyStats } from '../../../shared/climate-summary/monthly';
import { designConditions } from '../../../shared/climate-summary/design-conditions';

describe('the cumulative-frequency reading', () => {
  it('gives the value exceeded by a share of hours, interpolating between hours', () => {
    const values = sortedFinite(Float64Array.from({ length: 1001 }, (_, i) => 1000 - i));
    // 0..1000 in 1001 values: 1 % of hours exceed 990, 0.4 % exceed 996, 2 % exceed 980 (hand count).
    expect(exceededValue(values, 1)).toBeCloseTo(990, 10);
    expect(exceededValue(values, 0.4)).toBeCloseTo(996, 10);
    expect(exceededValue(values, 2)).toBeCloseTo(980, 10);
  });
  it('skips missing hours and refuses a share outside 0..100', () => {
    expect(Array.from(sortedFinite(Float64Array.of(3, NaN, 1)))).toEqual([1, 3]);
    expect(() => exceededValue(Float64Array.of(1), 101)).toThrow(RangeError);
    expect(exceededValue(new Float64Array(0), 1)).toBeNaN();
  });
});

describe('monthly statistics', () => {
  it('takes min, mean and max per month, skipping missing hours', () => {
    const jan1 = Date.UTC(2023, 0, 1);
    const feb1 = Date.UTC(2023, 1, 1);
    const stats = monthlyStats(Float64Array.of(jan1, jan1 + 3_600_000, feb1, feb1 + 3_600_000), Float64Array.of(-2, 4, NaN, 7));
    expect(stats[0]).toEqual({ month: 1, hours: 2, min: -2, mean: 1, max: 4 });
    expect(stats[1]).toEqual({ month: 2, hours: 1, min: 7, mean: 7, max: 7 });
    expect(stats[2].hours).toBe(0);
    expect(stats[2].mean).toBeNaN();
  });
});

describe('design conditions from a file', () => {
  it('pairs the 1 % dry-bulb with the mean wet-bulb of hours near it', () => {
    // 1000 hours: dry-bulb 0..999 °C/10, wet-bulb always dry-bulb − 8 (a made-up series for the arithmetic).
    const db = Float64Array.from({ length: 1000 }, (_, i) => i / 10);
    const wb = db.map((t) => t - 8);
    const dp = db.map((t) => t - 15);
    const dc = designConditions(db, wb, dp, (d) => d / 1000);
    const onePct = dc.dryBulb.find((d) => d.exceedPct === 1)!;
    expect(onePct.valueC).toBeCloseTo(98.901, 3); // position 0.99 × 999 = 989.01 → 98.901
    expect(onePct.meanCoincidentC).toBeCloseTo(onePct.valueC - 8, 1);
    expect(dc.dewPoint!.humidityRatioKgPerKg).toBeCloseTo(dc.dewPoint!.valueC / 1000, 10);
    expect(dc.computedFromFile).toBe(true);
  });
});
