/**
 * The import option humidityOverIce: a sub-zero file read both ways. By default RH and dew point are over liquid
 * water (WMO-No. 8 part I ch. 4); with the option they are read over ice below 0 °C and converted at import. For
 * the same RH the humidity ratio then differs by pws,water/pws,ice (Hyland–Wexler eq. 6 over eq. 5 of ASHRAE
 * Handbook—Fundamentals 2017 ch. 1, evaluated apart from the engine): about 5 % at −5 °C, 10 % at −10 °C and 22 %
 * at −20 °C.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { importClimateText } from '../../../shared/climate';
import { bulkStates } from '../../../shared/psychrometrics';
import { hylandWexlerIcePa, hylandWexlerWaterPa } from '../psychrometrics/reference-over-water';
import { tightPsychrolib as ref } from '../psychrometrics/reference-psychrolib';

const P = 101_325;
const temperaturesC = [-5, -10, -20, 3];

/** Synthetic four-hour file in the command line's canonical columns. */
function file(humidityColumn: 'relative_humidity_pct' | 'dew_point_c', values: number[]): string {
  const rows = temperaturesC.map((t, i) => `2024-01-15T0${i}:00Z,${t},${values[i]}`);
  return ['timestamp,dry_bulb_c,' + humidityColumn, ...rows].join('\n');
}

const stateOf = (text: string, humidityOverIce?: boolean) => {
  const result = importClimateText(text, humidityOverIce === undefined ? {} : { humidityOverIce });
  expect(result.ok).toBe(true);
  const s = result.series!;
  return { result, states: bulkStates({ dryBulbC: s.dryBulbC, humidity: s.humidity, pressurePa: P }) };
};

describe('relative humidity below 0 °C', () => {
  const text = file('relative_humidity_pct', [80, 80, 80, 80]);
  const overWater = stateOf(text);
  const overIce = stateOf(text, true);

  it('is over liquid water by default: W from 80 % of pws over water (psychrolib eq. 20 fed pws by eq. 6)', () => {
    expect(overWater.result.report.humidityOverIce).toBe(false);
    temperaturesC.forEach((t, i) => {
      const pw = 0.8 * (t > 0.01 ? ref.GetSatVapPres(t) : hylandWexlerWaterPa(t));
      expect(overWater.states.humidityRatio[i] / ref.GetHumRatioFromVapPres(pw, P)).toBeCloseTo(1, 9);
    });
  });

  it('read over ice gives less water by pws,water/pws,ice: ≈ 5 % at −5 °C, 10 % at −10 °C, 22 % at −20 °C, none above 0 °C', () => {
    const ratio = (i: number) => overWater.states.humidityRatio[i] / overIce.states.humidityRatio[i];
    expect(ratio(0)).toBeCloseTo(1.05, 2);
    expect(ratio(1)).toBeCloseTo(1.103, 3);
    expect(ratio(2)).toBeCloseTo(1.217, 3);
    [0, 1, 2].forEach((i) => expect(ratio(i)).toBeCloseTo(hylandWexlerWaterPa(temperaturesC[i]) / hylandWexlerIcePa(temperaturesC[i]), 3));
    expect(ratio(3)).toBe(1);
  });

  it('stores the series over water and says so in the report', () => {
    // 80 % over ice at −10 °C is 80 · pws,ice/pws,water = 72.56 % over water.
    expect(overIce.result.series!.humidity.values[1]).toBeCloseTo((80 * hylandWexlerIcePa(-10)) / hylandWexlerWaterPa(-10), 9);
    expect(overIce.result.report.humidityOverIce).toBe(true);
    const note = overIce.result.report.issues.find((issue) => issue.kind === 'humidity-over-ice');
    expect(note).toMatchObject({ severity: 'info', value: '3' });
    expect(note!.message).toMatch(/relative humidity converted to over liquid water in 3 hours at or below 0 °C/);
  });
});

describe('dew point below 0 °C', () => {
  it('read over ice is a frost point: −8.895 °C becomes a dew point over water of −10 °C', () => {
    const { result, states } = stateOf(file('dew_point_c', [-8.895398, -12, -25, 1]), true);
    expect(result.series!.humidity.values[0]).toBeCloseTo(-10, 4);
    // The frost point's vapour pressure is pws over ice at it (eq. 5): psychrolib's own sub-zero dew point is over ice.
    // The dew point over water is solved to within 1e-5 K (saturation.ts), so W agrees within 1e-6.
    expect(states.humidityRatio[0] / ref.GetHumRatioFromTDewPoint(-8.895398, P)).toBeCloseTo(1, 6);
    expect(states.dewPointC[3]).toBe(1);
  });

  it('by default is over water and comes back unchanged in the states', () => {
    const { states } = stateOf(file('dew_point_c', [-10, -12, -25, 1]));
    expect(states.dewPointC[0]).toBe(-10);
    expect(states.humidityRatio[0] / ref.GetHumRatioFromVapPres(hylandWexlerWaterPa(-10), P)).toBeCloseTo(1, 9);
  });
});

describe('the option itself', () => {
  it('changes nothing for a wet-bulb column, and says so', () => {
    const text = ['timestamp,dry_bulb_c,wet_bulb_c', '2024-01-15T00:00Z,-5,-6', '2024-01-15T01:00Z,-6,-7'].join('\n');
    const plain = importClimateText(text);
    const withOption = importClimateText(text, { humidityOverIce: true });
    expect(Array.from(withOption.series!.humidity.values)).toEqual(Array.from(plain.series!.humidity.values));
    expect(withOption.report.issues.find((issue) => issue.kind === 'humidity-over-ice')!.message).toMatch(/wet-bulb.*nothing was converted/);
  });

  it('refuses a value that is not true or false, naming it', () => {
    const result = importClimateText(file('relative_humidity_pct', [80, 80, 80, 80]), { humidityOverIce: 'yes' as unknown as boolean });
    expect(result.ok).toBe(false);
    expect(result.report.issues[0]).toMatchObject({ kind: 'invalid-option', value: 'yes' });
  });
});

describe('the option on a published format', () => {
  it('converts the sub-zero dew points of an EPW file too, as frost points', () => {
    const epw = readFileSync(new URL('../../fixtures/weather/synthetic-typical-year.epw', import.meta.url), 'utf8');
    const plain = importClimateText(epw);
    const overIce = importClimateText(epw, { humidityOverIce: true });
    expect(overIce.report.humidityOverIce).toBe(true);
    const before = plain.series!.humidity.values;
    const after = overIce.series!.humidity.values;
    let converted = 0;
    for (let i = 0; i < before.length; i++) {
      if (before[i] < 0) {
        // The same vapour pressure's dew point over water lies below its frost point, since pws over water exceeds
        // pws over ice below 0 °C (ASHRAE 2017 ch. 1 eq. 6 against eq. 5).
        expect(after[i]).toBeLessThan(before[i]);
        converted++;
      } else if (before[i] === before[i]) {
        expect(after[i]).toBe(before[i]);
      }
    }
    expect(converted).toBeGreaterThan(0);
  });
});
