/** Chart geometry in both projections, at sea level and at altitude. */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import {
  chartGeometry,
  constantEnthalpyLine,
  constantRhLine,
  constantVolumeLine,
  constantWetBulbLine,
  humidityRatioFromRh,
  projectPoint,
  saturationCurve,
  standardPressurePa,
} from '../../../shared/psychrometrics';
import { tightPsychrolib as ref } from './reference-psychrolib';

const window = (pressurePa: number) => ({ pressurePa, dryBulbMinC: -20, dryBulbMaxC: 50, humidityRatioMax: 0.03 });

describe('dry-bulb / humidity-ratio chart', () => {
  for (const pressurePa of [101_325, standardPressurePa(2500)]) {
    it(`saturation and RH lines lie on W(t, φ) at ${Math.round(pressurePa)} Pa`, () => {
      for (const line of [saturationCurve(window(pressurePa), 'dry-bulb-humidity-ratio'), constantRhLine(50, window(pressurePa), 'dry-bulb-humidity-ratio')]) {
        expect(line.points.length).toBeGreaterThan(20);
        for (const { x, y } of line.points) expect(y).toBeCloseTo(humidityRatioFromRh(x, line.value, pressurePa), 12);
      }
    });
  }

  it('wet-bulb, enthalpy and volume lines hold their constant (psychrolib, SI, tight)', () => {
    const w = window(101_325);
    for (const { x, y } of constantWetBulbLine(18, w, 'dry-bulb-humidity-ratio').points) {
      expect(ref.GetTWetBulbFromHumRatio(x, Math.max(y, 1e-7), 101_325)).toBeCloseTo(18, 3);
    }
    for (const { x, y } of constantEnthalpyLine(55, w, 'dry-bulb-humidity-ratio').points) {
      expect(ref.GetMoistAirEnthalpy(x, y) / 1000).toBeCloseTo(55, 9);
    }
    const volume = constantVolumeLine(0.86, w, 'dry-bulb-humidity-ratio');
    expect(volume.points.length).toBe(24);
    // psychrolib raises W below 1e-7 to 1e-7, so the dry end (W = 0) differs by 1.6e-7 relative.
    for (const { x, y } of volume.points) expect(ref.GetMoistAirVolume(x, y, 101_325)).toBeCloseTo(0.86, 6);
    // Each line starts on the saturation curve.
    const start = volume.points[0];
    expect(start.y).toBeCloseTo(humidityRatioFromRh(start.x, 100, 101_325), 9);
  });
});

describe('h–x diagram with oblique enthalpy axis', () => {
  it('draws the 0 °C isotherm horizontal', () => {
    for (const w of [0, 0.002, 0.004]) expect(projectPoint({ dryBulbC: 0, humidityRatio: w }, 'h-x').y).toBe(0);
  });
  it('draws lines of constant enthalpy straight, falling 2501 kJ/kg per kg/kg (ASHRAE 2017 ch. 1 eq. 32)', () => {
    const points = constantEnthalpyLine(40, window(101_325), 'h-x').points;
    for (const { x, y } of points) expect(y + 2501 * x).toBeCloseTo(40, 9);
  });
  it('gives every family at any pressure', () => {
    const lines = chartGeometry({
      ...window(standardPressurePa(1800)),
      projection: 'h-x',
      rhPcts: [20, 60],
      wetBulbsC: [10],
      enthalpiesKJPerKg: [30],
      volumesM3PerKg: [0.95],
    });
    expect(lines.map((l) => l.kind)).toEqual(['saturation', 'relative-humidity', 'relative-humidity', 'wet-bulb', 'enthalpy', 'specific-volume']);
    for (const line of lines) expect(line.points.length).toBeGreaterThan(5);
  });
  it('refuses a bad window by name', () => {
    expect(() => saturationCurve({ ...window(101_325), dryBulbMaxC: -30 }, 'h-x')).toThrow(/dryBulbMaxC/);
    expect(() => saturationCurve({ ...window(101_325), humidityRatioMax: 0 }, 'h-x')).toThrow(/humidityRatioMax/);
  });
});
