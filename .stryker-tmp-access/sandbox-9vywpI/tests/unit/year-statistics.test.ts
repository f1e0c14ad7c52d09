// @ts-nocheck
import { describe, expect, it } from 'vitest';
import type { YearResults } from '../../shared/scenario/results';
import { calendarYearHours, nearestRank, yearStatistics } from '../../shared/scenario/year-statistics';

/** A year of the run's results; `total` defaults to the full calendar year. */
function year(y: number, mechanical: number, extra: Partial<YearResults> = {}): YearResults {
  const total = extra.total ?? calendarYearHours(y);
  const adiabatic = extra.adiabatic ?? 100;
  return {
    year: y,
    free: total - adiabatic - mechanical,
    adiabatic,
    mechanical,
    noData: 0,
    total,
    humidified: 0,
    partialMechanical: 0,
    coolingKwh: 1000 + mechanical,
    waterL: 50,
    ...extra,
  };
}

describe('calendar years', () => {
  it('counts 8784 hours in leap years and 8760 otherwise (Gregorian rule)', () => {
    expect(calendarYearHours(2019)).toBe(8760);
    expect(calendarYearHours(2020)).toBe(8784);
    expect(calendarYearHours(1900)).toBe(8760);
    expect(calendarYearHours(2000)).toBe(8784);
    expect(() => calendarYearHours(2020.5)).toThrow(RangeError);
  });
});

describe('nearest-rank percentiles (Hyndman & Fan 1996, definition 1)', () => {
  // Values 1…10: rank ⌈0.1·10⌉ = 1, ⌈0.5·10⌉ = 5, ⌈0.9·10⌉ = 9 — worked by hand.
  const ten = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10];
  it('takes rank ⌈P/100 · N⌉', () => {
    expect(nearestRank(ten, 10)).toBe(1);
    expect(nearestRank(ten, 50)).toBe(5);
    expect(nearestRank(ten, 90)).toBe(9);
    expect(nearestRank(ten, 100)).toBe(10);
    // Five values: ⌈0.5 · 5⌉ = 3 (the middle), ⌈0.1 · 5⌉ = 1, ⌈0.9 · 5⌉ = 5.
    expect([10, 50, 90].map((p) => nearestRank([3, 5, 8, 13, 21], p))).toEqual([3, 8, 21]);
  });
  it('refuses an empty list or a percent outside (0, 100]', () => {
    expect(() => nearestRank([], 50)).toThrow(/sortedAscending/);
    expect(() => nearestRank(ten, 0)).toThrow(/percent/);
    expect(() => nearestRank(ten, 101)).toThrow(/percent/);
  });
});

describe('year statistics of a multi-year run', () => {
  // Five full years with mechanical hours 120, 80, 200, 80, 150 and a partial last year.
  const years = [year(2016, 120), year(2017, 80), year(2018, 200), year(2019, 80), year(2020, 150), year(2021, 30, { total: 4000 })];
  const stats = yearStatistics(years);

  it('sets partial years aside and says how many hours they have', () => {
    expect(stats.fullYears.map((y) => y.year)).toEqual([2016, 2017, 2018, 2019, 2020]);
    expect(stats.partialYears).toEqual([{ year: 2021, hours: 4000, calendarHours: 8760 }]);
  });

  it('counts a year up to a day short as whole, and one more hour short as partial', () => {
    // A file of whole UTC years read on a UTC+01:00 clock starts its first local year an hour late.
    const edge = yearStatistics([year(2021, 10, { total: 8760 - 24 }), year(2022, 10, { total: 8760 - 25 }), year(2023, 10, { total: 8760 })]);
    expect(edge.fullYears.map((y) => y.year)).toEqual([2021, 2023]);
    expect(edge.partialYears).toEqual([{ year: 2022, hours: 8735, calendarHours: 8760 }]);
  });

  it('names the median, P10 and P90 years of mechanical hours by nearest rank', () => {
    // Ordered: 80 (2017), 80 (2019), 120 (2016), 150 (2020), 200 (2018); ties ordered by year.
    // N = 5: P10 rank 1 → 2017; median rank 3 → 2016; P90 rank 5 → 2018.
    const m = stats.metrics!.mechanical;
    expect(m.p10).toEqual({ year: 2017, value: 80 });
    expect(m.median).toEqual({ year: 2016, value: 120 });
    expect(m.p90).toEqual({ year: 2018, value: 200 });
    expect(m.min).toEqual({ year: 2017, value: 80 });
    expect(m.max).toEqual({ year: 2018, value: 200 });
    expect(m.range).toBe(120);
    // Mean 630 / 5 = 126; squared deviations 36 + 2116 + 5476 + 2116 + 576 = 10320; / 4 = 2580; √2580 = 50.793…
    expect(m.mean).toBe(126);
    expect(m.standardDeviation).toBeCloseTo(50.7937, 4);
  });

  it('summarises free hours, energy and water the same way', () => {
    // Free hours = calendar hours − 100 − mechanical: 2016 and 2020 are leap years (8784 h).
    // 2016: 8564, 2017: 8580, 2018: 8460, 2019: 8580, 2020: 8534 → ordered 8460, 8534, 8564, 8580, 8580.
    const f = stats.metrics!.free;
    expect(f.median).toEqual({ year: 2016, value: 8564 });
    expect(f.p10).toEqual({ year: 2018, value: 8460 });
    expect(f.p90).toEqual({ year: 2019, value: 8580 });
    expect(stats.metrics!.coolingKwh.range).toBe(120);
    expect(stats.metrics!.waterL.standardDeviation).toBe(0);
  });

  it('calls the year with most mechanical hours the worst, and explains ties', () => {
    expect(stats.worst).toEqual({ year: 2018, mechanical: 200, tiedWith: [] });
    // 2017 and 2019 tie on 80 h; 2019 used more cooling energy so it is the worse one.
    const tied = yearStatistics([year(2017, 80), year(2019, 80, { coolingKwh: 5000 })]);
    expect(tied.worst).toEqual({ year: 2019, mechanical: 80, tiedWith: [2017] });
    // Equal on both: the earlier year.
    const even = yearStatistics([year(2017, 80, { coolingKwh: 10 }), year(2019, 80, { coolingKwh: 10 })]);
    expect(even.worst).toEqual({ year: 2017, mechanical: 80, tiedWith: [2019] });
  });

  it('gives no statistics without a full year, and no standard deviation with one', () => {
    const none = yearStatistics([year(2021, 10, { total: 100 })]);
    expect(none.metrics).toBeNull();
    expect(none.worst).toBeNull();
    const one = yearStatistics([year(2019, 10)]);
    expect(one.metrics!.mechanical.standardDeviation).toBeNull();
    expect(one.metrics!.mechanical.median).toEqual({ year: 2019, value: 10 });
  });
});
