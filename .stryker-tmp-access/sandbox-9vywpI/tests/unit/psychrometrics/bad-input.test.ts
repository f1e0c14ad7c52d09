/** Bad input: scalar functions throw a RangeError naming the argument; the bulk form gives NaN for that hour. */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import {
  bulkStates,
  dewPointFromHumidityRatio,
  enthalpyKJPerKg,
  humidityRatioFromDewPoint,
  humidityRatioFromRh,
  humidityRatioFromWetBulb,
  rhPctFromHumidityRatio,
  saturationPressurePa,
  standardPressurePa,
  wetBulbFromHumidityRatio,
  humidityRatioFromRh as wFromRh,
} from '../../../shared/psychrometrics';

describe('scalar functions refuse bad arguments by name', () => {
  const cases: Array<[string, () => unknown, RegExp]> = [
    ['NaN temperature', () => saturationPressurePa(Number.NaN), /tC/],
    ['temperature below −100 °C', () => saturationPressurePa(-150), /tC must be between -100 and 200/],
    ['temperature above 200 °C', () => saturationPressurePa(250), /tC/],
    ['RH above 100 %', () => humidityRatioFromRh(20, 101, 101_325), /rhPct/],
    ['RH below 0 %', () => humidityRatioFromRh(20, -1, 101_325), /rhPct/],
    ['pressure below 10 kPa', () => humidityRatioFromRh(20, 50, 5_000), /pressurePa must be between 10000 and 120000/],
    ['pressure above 120 kPa', () => humidityRatioFromRh(20, 50, 130_000), /pressurePa/],
    ['NaN pressure', () => humidityRatioFromDewPoint(10, Number.NaN), /pressurePa/],
    ['NaN dew point', () => humidityRatioFromDewPoint(Number.NaN, 101_325), /dewPointC/],
    ['negative humidity ratio', () => dewPointFromHumidityRatio(-0.001, 101_325), /humidityRatio/],
    ['zero humidity ratio has no dew point', () => dewPointFromHumidityRatio(0, 101_325), /humidityRatio/],
    ['wet-bulb above dry-bulb', () => humidityRatioFromWetBulb(20, 25, 101_325), /wetBulbC .*supersaturated/],
    ['wet-bulb below the dry-air wet-bulb', () => humidityRatioFromWetBulb(40, 5, 101_325), /wetBulbC/],
    ['supersaturated humidity ratio for RH', () => rhPctFromHumidityRatio(20, 0.02, 101_325), /humidityRatio .*supersaturated/],
    ['supersaturated humidity ratio for wet-bulb', () => wetBulbFromHumidityRatio(20, 0.02, 101_325), /supersaturated/],
    ['infinite enthalpy input', () => enthalpyKJPerKg(Number.POSITIVE_INFINITY, 0.01), /tC/],
    ['elevation out of the troposphere', () => standardPressurePa(20_000), /elevationM/],
  ];
  it.each(cases)('%s', (_, call, message) => {
    expect(call).toThrow(RangeError);
    expect(call).toThrow(message);
  });
});

describe('bulk form: NaN for a bad hour, never an exception mid-series', () => {
  const p = 101_325;
  it('relative humidity series with missing and invalid hours', () => {
    const dryBulbC = Float64Array.from([20, Number.NaN, 25, 300, 30, 10, 15, -20]);
    const rhPct = Float64Array.from([50, 50, Number.NaN, 50, 120, -5, 60, 70]);
    const out = bulkStates({ dryBulbC, humidity: { kind: 'relative-humidity-pct', values: rhPct }, pressurePa: p });
    const good = [0, 6, 7];
    for (let i = 0; i < dryBulbC.length; i++) {
      for (const series of [out.humidityRatio, out.dewPointC, out.wetBulbC, out.rhPct, out.enthalpyKJPerKg]) {
        expect(Number.isNaN(series[i])).toBe(!good.includes(i));
      }
    }
    expect(out.humidityRatio[0]).toBe(wFromRh(20, 50, p));
    expect(out.wetBulbC[6]).toBeCloseTo(wetBulbFromHumidityRatio(15, wFromRh(15, 60, p), p), 6);
  });

  it('per-hour pressure series: an hour with bad pressure is NaN', () => {
    const out = bulkStates({
      dryBulbC: Float64Array.from([20, 20, 20]),
      humidity: { kind: 'dew-point-c', values: Float64Array.from([10, 10, 25]) },
      pressurePa: Float64Array.from([101_325, 5_000, 101_325]),
    });
    expect(out.humidityRatio[0]).toBeCloseTo(humidityRatioFromDewPoint(10, 101_325), 12);
    expect(out.dewPointC[0]).toBe(10);
    expect(Number.isNaN(out.humidityRatio[1])).toBe(true); // pressure out of range
    expect(Number.isNaN(out.humidityRatio[2])).toBe(true); // dew point above dry-bulb: supersaturated
  });

  it('wet-bulb and humidity-ratio series', () => {
    const wb = bulkStates({
      dryBulbC: Float64Array.from([40, 40, 40]),
      humidity: { kind: 'wet-bulb-c', values: Float64Array.from([20, 41, 2]) },
      pressurePa: p,
    });
    expect(wb.humidityRatio[0]).toBeCloseTo(humidityRatioFromWetBulb(40, 20, p), 12);
    expect(wb.wetBulbC[0]).toBe(20);
    expect(Number.isNaN(wb.humidityRatio[1])).toBe(true); // wet-bulb above dry-bulb
    expect(Number.isNaN(wb.humidityRatio[2])).toBe(true); // too low a wet-bulb: W would be negative
    const w = bulkStates({
      dryBulbC: Float64Array.from([25, 25, 25]),
      humidity: { kind: 'humidity-ratio-kgkg', values: Float64Array.from([0.01, 0.05, -0.001]) },
      pressurePa: p,
    });
    expect(w.rhPct[0]).toBeCloseTo(rhPctFromHumidityRatio(25, 0.01, p), 9);
    expect(Number.isNaN(w.rhPct[1])).toBe(true); // above saturation at 25 °C
    expect(Number.isNaN(w.rhPct[2])).toBe(true);
  });

  it('structural mistakes are caught before the loop, naming the field', () => {
    const one = Float64Array.from([20]);
    expect(() => bulkStates({ dryBulbC: one, humidity: { kind: 'relative-humidity-pct', values: new Float64Array(2) }, pressurePa: p })).toThrow(
      /humidity.values/,
    );
    expect(() => bulkStates({ dryBulbC: one, humidity: { kind: 'relative-humidity-pct', values: one }, pressurePa: 500 })).toThrow(/pressurePa/);
    expect(() => bulkStates({ dryBulbC: one, humidity: { kind: 'grains' as never, values: one }, pressurePa: p })).toThrow(/humidity.kind/);
  });
});
