// @ts-nocheck
import { describe, expect, it } from 'vitest';
import type { ClimateSeries } from '../../shared/climate';
import {
  changeFactorsSchema,
  describeFactorIssues,
  localCalendar,
  monthlyDayStatistics,
  morphClimate,
  parseFactorsCsv,
  rhPctFromSpecificHumidity,
  shiftAndStretchByMonth,
  shiftByMonth,
  stretchByMonth,
  stretchFactors,
  zeroFactors,
  type ChangeFactors,
} from '../../shared/morphing';
import { psychrolib } from './psychrometrics/reference-psychrolib';

const HOUR = 3_600_000;
const P = 101_325;

/**
 * Two local days of January at a site on UTC+01:00 (offset 60 min). The first hour, local 2021-01-01 00:00,
 * is 2020-12-31T23:00Z: on UTC days it would fall in December, on the site's days it is January.
 * Day 1: 12 h at 2 °C then 12 h at 6 °C (max 6, min 2). Day 2: 12 h at 4 °C then 12 h at 10 °C (max 10, min 4).
 */
function twoJanuaryDays(): Float64Array[] {
  const t0 = Date.UTC(2020, 11, 31, 23);
  const ts = new Float64Array(48);
  const tC = new Float64Array(48);
  for (let i = 0; i < 48; i++) {
    ts[i] = t0 + i * HOUR;
    const day = i < 24 ? 0 : 1;
    const afternoon = i % 24 >= 12;
    tC[i] = day === 0 ? (afternoon ? 6 : 2) : afternoon ? 10 : 4;
  }
  return [ts, tC];
}

function series(ts: Float64Array, tC: Float64Array, humidity: ClimateSeries['humidity'], pressurePa: Float64Array | null = null): ClimateSeries {
  return { timestampsMs: ts, dryBulbC: tC, humidity, pressurePa, flags: new Uint8Array(ts.length).map((_, i) => (tC[i] === tC[i] ? 0 : 2)) };
}

function factors(january: Partial<ChangeFactors['months'][number]>, methods: Partial<ChangeFactors> = {}): ChangeFactors {
  const months = zeroFactors();
  months[0] = { ...months[0], ...january };
  return { dryBulbMethod: 'shift-and-stretch', humidityMethod: 'stretch', months, ...methods };
}

describe('the site-local calendar and monthly statistics', () => {
  it("puts each hour in the site's local month and day, not the UTC one", () => {
    const [ts] = twoJanuaryDays();
    expect(localCalendar(ts, 60).monthOfHour[0]).toBe(0); // 00:00 local, 1 January
    expect(localCalendar(ts, 0).monthOfHour[0]).toBe(11); // 23:00 UTC, 31 December
    const cal = localCalendar(ts, 60);
    expect(cal.dayOfHour[23]).toBe(cal.dayOfHour[0]);
    expect(cal.dayOfHour[24]).toBe(cal.dayOfHour[0] + 1);
  });

  it('gives <T0>, <Tmax0> and <Tmin0> of the constructed series', () => {
    const [ts, tC] = twoJanuaryDays();
    const s = monthlyDayStatistics(tC, localCalendar(ts, 60));
    // <T0> = (12·2 + 12·6 + 12·4 + 12·10) / 48 = 264 / 48 = 5.5 °C
    expect(s.mean[0]).toBeCloseTo(5.5, 12);
    // <Tmax0> = (6 + 10) / 2 = 8 °C; <Tmin0> = (2 + 4) / 2 = 3 °C
    expect(s.meanDailyMax[0]).toBeCloseTo(8, 12);
    expect(s.meanDailyMin[0]).toBeCloseTo(3, 12);
    expect(s.days[0]).toBe(2);
    expect(s.mean[1]).toBeNaN(); // February has no data
  });

  it('leaves a day with fewer than 18 hours of data out of the daily extremes', () => {
    const [ts, tC] = twoJanuaryDays();
    for (let i = 24; i < 31; i++) tC[i] = Number.NaN; // day 2 keeps 17 hours: 5 at 4 °C, 12 at 10 °C
    const s = monthlyDayStatistics(tC, localCalendar(ts, 60));
    expect(s.days[0]).toBe(1);
    expect(s.meanDailyMax[0]).toBe(6);
    expect(s.meanDailyMin[0]).toBe(2);
    // The hourly mean still counts every hour with data: (12·2 + 12·6 + 5·4 + 12·10) / 41 = 236 / 41
    expect(s.mean[0]).toBeCloseTo(236 / 41, 12);
  });
});

describe('the operations of Belcher, Hacker and Powell (2005), by hand', () => {
  const monthOfHour = new Uint8Array([0, 0, 6, 6]);
  const twelve = (jan: number, jul: number) => Float64Array.from({ length: 12 }, (_, m) => (m === 0 ? jan : m === 6 ? jul : 0));

  it('shift: x = x0 + Δx_m', () => {
    const out = shiftByMonth(new Float64Array([1, Number.NaN, 20, 25]), monthOfHour, twelve(2, 3.5), new Float64Array(4));
    // 1 + 2 = 3; NaN stays NaN; 20 + 3.5 = 23.5; 25 + 3.5 = 28.5
    expect(Array.from(out)).toEqual([3, Number.NaN, 23.5, 28.5]);
  });

  it('stretch: x = α_m · x0', () => {
    const out = stretchByMonth(new Float64Array([0.004, 0.005, 0.01, 0.012]), monthOfHour, twelve(1.1, 0.95), new Float64Array(4));
    // 1.1 · 0.004 = 0.0044; 1.1 · 0.005 = 0.0055; 0.95 · 0.01 = 0.0095; 0.95 · 0.012 = 0.0114
    [0.0044, 0.0055, 0.0095, 0.0114].forEach((v, i) => expect(out[i]).toBeCloseTo(v, 15));
  });

  it('shift-and-stretch: T = T0 + ΔTmean + α (T0 − <T0>), α = (ΔTmax − ΔTmin) / (<Tmax0> − <Tmin0>)', () => {
    const [ts, tC] = twoJanuaryDays();
    const cal = localCalendar(ts, 60);
    const s = monthlyDayStatistics(tC, cal);
    // January: ΔTmean = 2 K, ΔTmax = 3 K, ΔTmin = 1 K → α = (3 − 1) / (8 − 3) = 0.4
    const alpha = stretchFactors(twelve(3, 0), twelve(1, 0), s.meanDailyMax, s.meanDailyMin);
    expect(alpha[0]).toBeCloseTo(0.4, 12);
    expect(alpha[1]).toBe(0); // no data, no range: nothing to stretch
    const out = shiftAndStretchByMonth(tC, cal.monthOfHour, twelve(2, 0), alpha, s.mean, new Float64Array(48));
    // 2 °C → 2 + 2 + 0.4 (2 − 5.5) = 2.6;  6 °C → 6 + 2 + 0.4 (6 − 5.5) = 8.2
    // 4 °C → 4 + 2 + 0.4 (4 − 5.5) = 5.4; 10 °C → 10 + 2 + 0.4 (10 − 5.5) = 13.8
    expect(out[0]).toBeCloseTo(2.6, 12);
    expect(out[12]).toBeCloseTo(8.2, 12);
    expect(out[24]).toBeCloseTo(5.4, 12);
    expect(out[36]).toBeCloseTo(13.8, 12);
    // So the month moves as the factors say: mean 5.5 + 2 = 7.5; mean daily max (8.2 + 13.8)/2 = 11 = 8 + 3;
    // mean daily min (2.6 + 5.4)/2 = 4 = 3 + 1.
    const after = monthlyDayStatistics(out, cal);
    expect(after.mean[0]).toBeCloseTo(7.5, 12);
    expect(after.meanDailyMax[0]).toBeCloseTo(11, 12);
    expect(after.meanDailyMin[0]).toBeCloseTo(4, 12);
  });

  it('throws RangeError naming the argument for a factor list that is not 12 long', () => {
    expect(() => shiftByMonth(new Float64Array(1), new Uint8Array(1), [1, 2], new Float64Array(1))).toThrow(/deltaByMonth/);
  });
});

describe('humidity through specific humidity', () => {
  it('morphs a whole file: dry-bulb by shift-and-stretch, q stretched by +10 %, back to RH by the engine', () => {
    const [ts, tC] = twoJanuaryDays();
    // Humidity ratio 4 g/kg every hour (below saturation at 2 °C, Ws ≈ 4.4 g/kg).
    const parent = series(ts, tC, { kind: 'humidity-ratio-kgkg', values: new Float64Array(48).fill(0.004) });
    const out = morphClimate({
      series: parent,
      factors: factors({ deltaMeanK: 2, deltaMaxK: 3, deltaMinK: 1, humidityChangePct: 10 }),
      utcOffsetMinutes: 60,
      elevationM: 0,
    });
    if (!out.ok) throw new Error(out.problems.join('; '));
    expect(out.alphaByMonth[0]).toBeCloseTo(0.4, 12);
    expect(out.series.dryBulbC[12]).toBeCloseTo(8.2, 12);
    expect(out.series.humidity.kind).toBe('relative-humidity-pct');
    // q0 = W0/(1+W0) (ASHRAE 2017 ch. 1 eq. 9b); q = 1.1 q0; W = q/(1−q) = 1.1·0.004 / (1 − 0.1·0.004) = 0.0044 / 0.9996
    const w = 0.0044 / 0.9996;
    // Reference: psychrolib GetRelHumFromHumRatio (SI, fraction) at the morphed dry-bulb 8.2 °C, 101 325 Pa.
    expect(out.series.humidity.values[12]).toBeCloseTo(100 * psychrolib.GetRelHumFromHumRatio(8.2, w, P), 6);
    expect(out.series.humidity.values[0]).toBeCloseTo(100 * psychrolib.GetRelHumFromHumRatio(2.6, w, P), 6);
    expect(out.clampedHighHours + out.clampedLowHours).toBe(0);
  });

  it('gives back the parent hour by hour with no change (round trip RH → q → RH and dew point → q → RH)', () => {
    const [ts, tC] = twoJanuaryDays();
    const rh = Float64Array.from({ length: 48 }, (_, i) => 30 + i);
    const pressure = Float64Array.from({ length: 48 }, (_, i) => 95_000 + 100 * i);
    const out = morphClimate({
      series: series(ts, tC, { kind: 'relative-humidity-pct', values: rh }, pressure),
      factors: factors({}),
      utcOffsetMinutes: 60,
      elevationM: 0,
    });
    if (!out.ok) throw new Error('refused');
    for (let i = 0; i < 48; i++) {
      expect(out.series.dryBulbC[i]).toBeCloseTo(tC[i], 12);
      expect(out.series.humidity.values[i]).toBeCloseTo(rh[i], 9);
    }
    const dew = Float64Array.from({ length: 48 }, (_, i) => tC[i] - 3);
    const fromDew = morphClimate({ series: series(ts, tC, { kind: 'dew-point-c', values: dew }), factors: factors({}), utcOffsetMinutes: 60, elevationM: 0 });
    if (!fromDew.ok) throw new Error('refused');
    // Reference: psychrolib GetHumRatioFromTDewPoint then GetRelHumFromHumRatio (SI).
    const w = psychrolib.GetHumRatioFromTDewPoint(3, P);
    expect(fromDew.series.humidity.values[12]).toBeCloseTo(100 * psychrolib.GetRelHumFromHumRatio(6, w, P), 6);
  });

  it('bounds RH to 100 % when a cooler hour cannot hold the moisture, and to 0 % below no moisture, and counts both', () => {
    const out = new Float64Array(3);
    // q = 0.01 kg/kg at 5 °C, 101 325 Pa: W = 0.0101 > Ws(5 °C) ≈ 0.0054 (psychrolib GetSatHumRatio, recalled) → 100 %
    const counts = rhPctFromSpecificHumidity(new Float64Array([5, 20, 20]), new Float64Array([0.01, -0.001, Number.NaN]), P, out);
    expect(Array.from(out)).toEqual([100, 0, Number.NaN]);
    expect(counts).toEqual({ clampedHigh: 1, clampedLow: 1 });

    const [ts, tC] = twoJanuaryDays();
    const humid = series(ts, tC, { kind: 'relative-humidity-pct', values: new Float64Array(48).fill(95) });
    // ΔT = −3 K everywhere at unchanged q: every hour at 95 % RH ends above saturation (RH at t − 3 K > 100 %).
    const cooled = morphClimate({ series: humid, factors: factors({ deltaMeanK: -3, deltaMaxK: -3, deltaMinK: -3 }), utcOffsetMinutes: 60, elevationM: 0 });
    if (!cooled.ok) throw new Error('refused');
    expect(cooled.clampedHighHours).toBe(48);
    expect(Math.max(...cooled.series.humidity.values)).toBe(100);
    const dried = morphClimate({
      series: humid,
      factors: factors({ humidityShiftGPerKg: -20 }, { humidityMethod: 'shift' }),
      utcOffsetMinutes: 60,
      elevationM: 0,
    });
    if (!dried.ok) throw new Error('refused');
    expect(dried.clampedLowHours).toBe(48);
  });

  it('with the shift method moves every hour by ΔTmean and ignores ΔTmax and ΔTmin', () => {
    const [ts, tC] = twoJanuaryDays();
    const rh = new Float64Array(48).fill(50);
    const out = morphClimate({
      series: series(ts, tC, { kind: 'relative-humidity-pct', values: rh }),
      factors: factors({ deltaMeanK: 1.5, deltaMaxK: 9, deltaMinK: -9 }, { dryBulbMethod: 'shift' }),
      utcOffsetMinutes: 60,
      elevationM: 0,
    });
    if (!out.ok) throw new Error('refused');
    // 2 + 1.5 = 3.5; 6 + 1.5 = 7.5; 4 + 1.5 = 5.5; 10 + 1.5 = 11.5
    expect([out.series.dryBulbC[0], out.series.dryBulbC[12], out.series.dryBulbC[24], out.series.dryBulbC[36]]).toEqual([3.5, 7.5, 5.5, 11.5]);
    expect(out.alphaByMonth.every((a) => a === 0)).toBe(true);
    // Same q at a warmer hour: RH falls. Reference: psychrolib GetHumRatioFromRelHum then GetRelHumFromHumRatio (SI).
    const w = psychrolib.GetHumRatioFromRelHum(2, 0.5, P);
    expect(out.series.humidity.values[0]).toBeCloseTo(100 * psychrolib.GetRelHumFromHumRatio(3.5, w, P), 6);
  });

  it('keeps hours with no data as no data', () => {
    const [ts, tC] = twoJanuaryDays();
    tC[5] = Number.NaN;
    const rh = new Float64Array(48).fill(60);
    rh[7] = Number.NaN;
    const out = morphClimate({
      series: series(ts, tC, { kind: 'relative-humidity-pct', values: rh }),
      factors: factors({ deltaMeanK: 1, deltaMaxK: 1, deltaMinK: 1 }),
      utcOffsetMinutes: 60,
      elevationM: 0,
    });
    if (!out.ok) throw new Error('refused');
    expect(out.series.dryBulbC[5]).toBeNaN();
    expect(out.series.humidity.values[5]).toBeNaN();
    expect(out.series.flags[5]).toBe(2);
    expect(out.series.humidity.values[7]).toBeNaN();
    expect(out.series.flags[7]).toBe(2);
    expect(out.series.dryBulbC[6]).toBeCloseTo(3, 12);
  });

  it('refuses factors that would turn the daily cycle upside down, naming the month', () => {
    const [ts, tC] = twoJanuaryDays();
    // Mean daily range 5 K; ΔTmax − ΔTmin = −6 K gives α = −1.2, so 1 + α < 0.
    const out = morphClimate({
      series: series(ts, tC, { kind: 'relative-humidity-pct', values: new Float64Array(48).fill(60) }),
      factors: factors({ deltaMeanK: 1, deltaMaxK: -2, deltaMinK: 4 }),
      utcOffsetMinutes: 60,
      elevationM: 0,
    });
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.problems[0]).toMatch(/^January: /);
  });
});

describe('change-factor tables', () => {
  it('names the month and the field of a bad factor', () => {
    const bad = factors({});
    bad.months[2] = { ...bad.months[2], deltaMaxK: 40 };
    const parsed = changeFactorsSchema.safeParse(bad);
    expect(parsed.success).toBe(false);
    if (!parsed.success) expect(describeFactorIssues(parsed.error.issues)).toEqual(['March, ΔTmax (deltaMaxK): ΔTmax must be at most 15 K']);
  });

  it('reads a CSV by month, with °F differences converted (÷ 1.8) and defaults for missing columns', () => {
    const lines = ['# factors for a warmer decade (synthetic)', 'month,delta_mean_f,delta_max_f,humidity_change_pct'];
    for (let m = 1; m <= 12; m++) lines.push(`${m},${1.8 * m},${3.6},${m === 7 ? 5 : 0}`);
    const res = parseFactorsCsv(lines.join('\n'));
    if (!res.ok) throw new Error(res.errors.join('; '));
    expect(res.months[2].deltaMeanK).toBeCloseTo(3, 12); // 5.4 °F difference = 3 K
    expect(res.months[2].deltaMaxK).toBeCloseTo(2, 12); // 3.6 °F difference = 2 K
    expect(res.months[2].deltaMinK).toBeCloseTo(3, 12); // no delta_min column: the mean's change
    expect(res.months[6].humidityChangePct).toBe(5);
  });

  it('names the line and column of a bad cell, a repeated month and the missing months', () => {
    const text = ['month,delta_mean_k,delta_max_k,delta_min_k', '1,1,1,1', '2,1,abc,1', 'Feb,1,1,1', 'Smarch,1,1,1'].join('\n');
    const res = parseFactorsCsv(text);
    expect(res.ok).toBe(false);
    if (res.ok) return;
    expect(res.errors).toContain("line 3, column delta_max_k: 'abc' is not a number");
    expect(res.errors).toContain('line 4, column month: February is given twice (also on line 3)');
    expect(res.errors).toContain("line 5, column month: 'Smarch' is not a month (1–12 or a month name)");
    expect(res.errors.at(-1)).toMatch(/^months missing from the table: March, April/);
  });
});
