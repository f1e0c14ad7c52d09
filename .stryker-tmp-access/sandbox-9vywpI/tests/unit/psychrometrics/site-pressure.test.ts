/**
 * The one rule for missing station pressure (hourlyPressurePa): the standard atmosphere at the site's elevation
 * (ASHRAE Handbook—Fundamentals 2017 ch. 1 eq. 3; psychrolib's GetStandardAtmPressure as the reference), counted
 * only on hours that have data, and the same in every place that computes states from a stored series.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { HOUR_FLAG, type ClimateSeries } from '../../../shared/climate';
import { summariseClimate } from '../../../shared/climate-summary';
import { monthlyClimate } from '../../../shared/morphing';
import { hourlyPressurePa } from '../../../shared/psychrometrics';
import { runScenario } from '../../../shared/scenario';
import { makeScenario } from '../scenario/fixtures';
import { psychrolib as psy } from './reference-psychrolib';

const NaN_ = Number.NaN;
const HOUR = 3_600_000;

/** Four hours: a measured hour, a hole in pressure only, a hole in pressure on an hour without data, a measured hour. */
function series(): ClimateSeries {
  return {
    timestampsMs: Float64Array.from({ length: 4 }, (_, i) => Date.UTC(2023, 0, 10) + i * HOUR),
    dryBulbC: Float64Array.of(5, 6, NaN_, 7),
    humidity: { kind: 'dew-point-c', values: Float64Array.of(0, 1, NaN_, 2) },
    pressurePa: Float64Array.of(88_000, NaN_, NaN_, 88_500),
    flags: Uint8Array.of(HOUR_FLAG.measured, HOUR_FLAG.measured, HOUR_FLAG.missing, HOUR_FLAG.measured),
  };
}

describe('hourlyPressurePa', () => {
  it('fills holes with the standard atmosphere at the elevation and counts only hours with data', () => {
    const s = series();
    const out = hourlyPressurePa(s, 1200);
    const standard = psy.GetStandardAtmPressure(1200);
    expect(out.sitePressurePa).toBeCloseTo(standard, 6);
    expect(Array.from(out.pressurePa as Float64Array)).toEqual([88_000, out.sitePressurePa, out.sitePressurePa, 88_500]);
    expect(out.filledHours).toBe(1);
    // The stored column stays as it was.
    expect(Number.isNaN(s.pressurePa![1])).toBe(true);
  });

  it('gives one number and no filled hours for a file without station pressure, and the column itself when it has no hole', () => {
    expect(hourlyPressurePa({ ...series(), pressurePa: null }, 0)).toEqual({ pressurePa: 101_325, sitePressurePa: 101_325, filledHours: 0 });
    const full = Float64Array.of(90_000, 90_100);
    const out = hourlyPressurePa({ dryBulbC: Float64Array.of(1, 2), humidity: { values: Float64Array.of(0, 0) }, pressurePa: full }, 0);
    expect(out.pressurePa).toBe(full);
    expect(out.filledHours).toBe(0);
  });
});

describe('every place uses it', () => {
  it("a run's pressureFilledHours counts the hole on an hour with data, not the one on a missing hour", () => {
    const run = runScenario(makeScenario('direct-air', { elevationM: 1200 }), series());
    expect(run.results.site).toMatchObject({ pressureSource: 'weather', pressureFilledHours: 1 });
    // The filled hour's state is at the standard atmosphere: W from its dew point by psychrolib (eq. 20 and 36).
    expect(run.states.humidityRatio[1]).toBeCloseTo(psy.GetHumRatioFromTDewPoint(1, psy.GetStandardAtmPressure(1200)), 9);
  });

  it('the climate summary computes the hour with a pressure hole (it used to be left without a state)', () => {
    const summary = summariseClimate(series(), 1200);
    expect(summary.completenessPct).toBeCloseTo(75, 9);
  });

  it('the projection statistics compute it too', () => {
    const monthly = monthlyClimate(series(), 0, 1200);
    expect(monthly.dewPointC[0].hours).toBe(3);
  });
});
