import { describe, expect, it } from 'vitest';
import {
  chartWindowFor,
  densityBins,
  envelopePolygon,
  hoursInside,
  hoursToChartXY,
  hourStates,
  sampleIndex,
  stateToChartXY,
} from '../../../src/lib/charts/moist-air-data';
import { ENVELOPE_PRESETS } from '../../../shared/scenario/envelopes';
import { psychrolib } from '../psychrometrics/reference-psychrolib';
import { hylandWexlerWaterPa } from '../psychrometrics/reference-over-water';

const seaLevelPa = 101_325;

describe('moist-air chart coordinates', () => {
  it('keeps the 0 °C isotherm level in the h–x diagram, at any moisture', () => {
    // y = (h − 2501·W)/1.006 = t·(1 + 1.86·W/1.006): zero at t = 0 (ASHRAE 2017 ch. 1 eq. 32).
    for (const w of [0, 0.002, 0.0038]) expect(stateToChartXY(0, w, 'h-x', 'SI').y).toBe(0);
    // In IP the same line reads 32 °F.
    expect(stateToChartXY(0, 0.003, 'h-x', 'IP').y).toBeCloseTo(32, 12);
    // Warmer isotherms rise slightly with moisture: 20 °C at 10 g/kg sits at 20·(1 + 1.86·0.01/1.006).
    expect(stateToChartXY(20, 0.01, 'h-x', 'SI').y).toBeCloseTo(20 * (1 + (1.86 * 0.01) / 1.006), 12);
  });

  it('converts the dry-bulb / humidity-ratio chart to the person’s units', () => {
    // 20 °C = 68 °F (°F = 1.8·°C + 32, NIST SP 811 App. B); 0.01 kg/kg = 70 gr/lb (7000 grains per pound, exact).
    expect(stateToChartXY(20, 0.01, 'dry-bulb-humidity-ratio', 'IP')).toEqual({ x: 68, y: 70 });
    expect(stateToChartXY(20, 0.01, 'dry-bulb-humidity-ratio', 'SI')).toEqual({ x: 20, y: 10 });
  });

  it('gives the same coordinates in bulk as one by one, NaN for hours without data', () => {
    const hours = { dryBulbC: [12, Number.NaN, -3], humidityRatio: [0.007, 0.004, 0.002] };
    for (const projection of ['h-x', 'dry-bulb-humidity-ratio'] as const) {
      for (const system of ['SI', 'IP'] as const) {
        const bulk = hoursToChartXY(hours, projection, system);
        const one = stateToChartXY(12, 0.007, projection, system);
        expect(bulk.x[0]).toBeCloseTo(one.x, 10);
        expect(bulk.y[0]).toBeCloseTo(one.y, 10);
        expect(Number.isNaN(bulk.x[1])).toBe(true);
      }
    }
  });
});

describe('density binning', () => {
  it('counts points per cell, skips NaN and points outside, and returns only filled cells', () => {
    const x = [0.5, 0.6, 1.5, 9.99, 10, Number.NaN, 11];
    const y = [0.5, 0.7, 0.5, 9.99, 10, 1, 1];
    const { cells, binned } = densityBins(x, y, [0, 10], [0, 10], 10, 10);
    expect(binned).toBe(5);
    expect(cells).toContainEqual({ x1: 0, x2: 1, y1: 0, y2: 1, hours: 2 });
    expect(cells).toContainEqual({ x1: 1, x2: 2, y1: 0, y2: 1, hours: 1 });
    // The upper edge belongs to the last cell.
    expect(cells).toContainEqual({ x1: 9, x2: 10, y1: 9, y2: 10, hours: 2 });
    expect(cells).toHaveLength(3);
  });

  it('refuses a bad grid, naming the argument', () => {
    expect(() => densityBins([], [], [0, 1], [0, 1], 0, 4)).toThrow(/nx must be/);
    expect(() => densityBins([], [], [1, 1], [0, 1], 4, 4)).toThrow(/xDomain must rise/);
  });

  it('thins long series to every k-th hour', () => {
    const { index, stride } = sampleIndex(87_600, 30_000);
    expect(stride).toBe(3);
    expect(index[1]).toBe(3);
    expect(index).toHaveLength(29_200);
  });
});

describe('envelopes and the chart window', () => {
  // ASHRAE TC 9.9 recommended range with RH ≤ 60 %: the 4th edition (2015) of the Thermal Guidelines, recalled from
  // memory (the 5th edition, 2021, raised the upper RH to 70 %): 18–27 °C, dew point −9…15 °C, RH ≤ 60 %.
  const recommended = { dryBulbMinC: 18, dryBulbMaxC: 27, dewPointMinC: -9, dewPointMaxC: 15, rhMinPct: 0, rhMaxPct: 60 };
  const preset60 = ENVELOPE_PRESETS.find((p) => p.limits.rhMaxPct === 60 && p.limits.dryBulbMinC === 18)!;

  it('takes its RH ≤ 60 % envelope from the 4th edition (2015) preset, which says it is recalled from memory', () => {
    expect(preset60.edition).toMatch(/4th edition \(2015\)/);
    expect(preset60.recalledFromMemory).toBe(true);
    expect(preset60.limits).toMatchObject(recommended);
  });
  const window = chartWindowFor(seaLevelPa, { dryBulbC: [], humidityRatio: [] }, [recommended]);

  it('draws the envelope between its limits; its ceiling is the 15 °C dew point where RH 60 % lies higher', () => {
    const polygon = envelopePolygon(recommended, window);
    expect(polygon.length).toBeGreaterThan(10);
    const ts = polygon.map((p) => p.dryBulbC);
    expect(Math.min(...ts)).toBe(18);
    expect(Math.max(...ts)).toBe(27);
    const ceilingAt27 = Math.max(...polygon.filter((p) => p.dryBulbC === 27).map((p) => p.humidityRatio));
    // psychrolib GetHumRatioFromTDewPoint(15 °C, 101 325 Pa), the reference library.
    expect(ceilingAt27).toBeCloseTo(psychrolib.GetHumRatioFromTDewPoint(15, seaLevelPa), 5);
    // At 18 °C the 60 % RH line is lower than the dew-point ceiling: psychrolib GetHumRatioFromRelHum(18, 0.6).
    const ceilingAt18 = Math.max(...polygon.filter((p) => p.dryBulbC === 18).map((p) => p.humidityRatio));
    expect(ceilingAt18).toBeCloseTo(psychrolib.GetHumRatioFromRelHum(18, 0.6, seaLevelPa), 5);
    const floor = Math.min(...polygon.map((p) => p.humidityRatio));
    // The −9 °C dew-point floor is over liquid water (WMO-No. 8), as the engine reads envelope limits; psychrolib would
    // read −9 °C as a frost point, so it is fed pws over water by Hyland–Wexler eq. 6 evaluated apart (reference-over-water.ts).
    expect(floor).toBeCloseTo(psychrolib.GetHumRatioFromVapPres(hylandWexlerWaterPa(-9), seaLevelPa), 5);
  });

  it('is empty when the limits leave no room', () => {
    expect(envelopePolygon({ ...recommended, dewPointMinC: 16 }, window)).toEqual([]);
  });

  it('counts the hours inside all six limits', () => {
    const hours = { dryBulbC: [22, 22, 30, Number.NaN], humidityRatio: [0.008, 0.0125, 0.008, 0.008] };
    const state = hourStates(hours, seaLevelPa);
    // 22 °C at 12.5 g/kg has a dew point near 17.4 °C (above 15 °C); 30 °C is above 27 °C.
    expect(hoursInside(hours, seaLevelPa, recommended)).toEqual({ inside: 1, withData: 3 });
    expect(state.dewPointC[1]).toBeCloseTo(psychrolib.GetTDewPointFromHumRatio(22, 0.0125, seaLevelPa), 2);
  });

  it('widens the window in 5 K steps to hold every hour, and keeps a floor of −10…40 °C and 20 g/kg', () => {
    expect(window).toMatchObject({ dryBulbMinC: -10, dryBulbMaxC: 40, humidityRatioMax: 0.02 });
    const hot = chartWindowFor(seaLevelPa, { dryBulbC: [-23, 46], humidityRatio: [0.0005, 0.028] });
    expect(hot.dryBulbMinC).toBe(-25);
    expect(hot.dryBulbMaxC).toBe(50);
    expect(hot.humidityRatioMax).toBeGreaterThanOrEqual(0.028 * 1.12 - 1e-9);
  });
});
