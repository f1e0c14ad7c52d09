/**
 * Issue 17, defects 2–4: the summary CSV states the one elevation used and where the pressure came from, carries the
 * year-to-year statistics the run page shows, and names each fan group apart.
 */
import { describe, expect, it } from 'vitest';
import { differingInputs, runSummaryRows, shapeReportRun, type ReportRunSource } from '../../../shared/report';
import { runScenario, type Scenario } from '../../../shared/scenario';
import { standardPressurePa } from '../../../shared/psychrometrics';
import { makeScenario } from '../scenario/fixtures';

/** Two whole synthetic years (2021, 2022; demo data, not a station): a sine of dry-bulb, RH 50 %, no pressure column. */
function twoYears() {
  const t0 = Date.UTC(2021, 0, 1);
  const n = 2 * 8760;
  return {
    timestampsMs: Float64Array.from({ length: n }, (_, i) => t0 + i * 3_600_000),
    // Year 2 runs 3 K warmer than year 1, so the years differ in mechanical hours.
    dryBulbC: Float64Array.from({ length: n }, (_, i) => 14 + 14 * Math.sin((2 * Math.PI * i) / 8760 - Math.PI / 2) + (i >= 8760 ? 3 : 0)),
    humidity: { kind: 'relative-humidity-pct' as const, values: new Float64Array(n).fill(50) },
    pressurePa: null,
    flags: new Uint8Array(n),
  };
}

function source(scenario: Scenario, siteElevationM: number): ReportRunSource {
  const series = twoYears();
  return {
    id: 3,
    engineVersion: 'test',
    createdAt: new Date(Date.UTC(2026, 0, 5, 9)),
    finishedAt: new Date(Date.UTC(2026, 0, 5, 9, 1)),
    scenario,
    sweepPoint: null,
    climate: {
      name: 'Synthetic two years',
      sha256: 'cd'.repeat(32),
      hours: series.dryBulbC.length,
      firstHourMs: series.timestampsMs[0],
      lastHourMs: series.timestampsMs[series.timestampsMs.length - 1],
      site: { name: 'Invented ridge', elevationM: siteElevationM, timeZone: 'UTC' },
      elevationM: siteElevationM,
      utcOffsetMinutes: 0,
    },
    results: runScenario(scenario, series, { elevationM: siteElevationM }).results,
    file: null,
    siteNow: null,
  };
}

const value = (rows: ReturnType<typeof runSummaryRows>, figure: string) => rows.find((r) => r.figure === figure)?.value;

describe('the summary CSV of a run', () => {
  // An old saved scenario with its own 120 m, run on a 1,690 m site (the case).
  const scenario = { ...makeScenario('indirect-air', { elevationM: 120 }), name: 'Indirect, old scenario' };
  const rows = runSummaryRows(shapeReportRun(source(scenario, 1690)));

  it("states the elevation used (the site's) and the pressure source, and not the scenario's own elevation", () => {
    expect(value(rows, 'Site elevation used')).toBe(1690);
    expect(value(rows, 'Air pressure used')).toBe('standard atmosphere at the site elevation (the climate file has no station pressure)');
    expect(value(rows, 'Hours with pressure from the standard atmosphere')).toBe(2 * 8760);
    expect(rows.some((r) => r.section === 'inputs' && r.figure === 'elevationM')).toBe(false);
    // Standard atmosphere at 1,690 m (ASHRAE Handbook—Fundamentals 2017 ch. 1 eq. 3): about 82.9 kPa.
    expect(standardPressurePa(1690) / 1000).toBeCloseTo(82.9, 0);
  });

  it('carries the year-to-year statistics the page shows: median, P10, P90, spread, standard deviation and the worst year', () => {
    const mechanical = rows.filter((r) => r.section === 'by year' && / Mechanical$/.test(r.figure)).map((r) => r.value) as number[];
    expect(mechanical).toHaveLength(2);
    // Two full years: nearest rank gives the lower year as median and P10, the higher as P90 (Hyndman & Fan 1996, definition 1).
    const [lo, hi] = [...mechanical].sort((a, b) => a - b);
    expect(value(rows, 'Full calendar years')).toBe(2);
    expect(value(rows, 'Median year: Mechanical')).toBe(lo);
    expect(value(rows, 'P10 year: Mechanical')).toBe(lo);
    expect(value(rows, 'P90 year: Mechanical')).toBe(hi);
    expect(value(rows, 'Spread (max − min): Mechanical')).toBe(hi - lo);
    // Sample standard deviation of two values is |a − b| / √2.
    expect(value(rows, 'Standard deviation: Mechanical')).toBe(Math.round((hi - lo) / Math.SQRT2));
    expect(value(rows, 'Worst year')).toBe(2022);
    expect(value(rows, 'Median year: Water total, year')).toBeTypeOf('number');
  });

  it('names the hall fans and the scavenger fans apart, and together they are the fan energy', () => {
    const run = shapeReportRun(source(scenario, 1690));
    const hall = value(rows, 'Hall fans') as number;
    const scavenger = value(rows, 'Scavenger fans') as number;
    expect(hall).toBeGreaterThan(0);
    expect(scavenger).toBeGreaterThan(0);
    expect(hall + scavenger).toBeCloseTo(run.results.energy.fanKwh, 0);
    // At full design load all hour, hall fans use fanPowerFraction × IT energy; both groups run below it at part load.
    expect(hall).toBeLessThanOrEqual(scenario.energy.fanPowerFraction * run.results.energy.itKwh + 1);
  });

  it('says fans are together for a run stored before the split', () => {
    const old = shapeReportRun(source(scenario, 1690));
    delete old.results.energy.rejectionFanKwh;
    expect(value(runSummaryRows(old), 'Fans (hall and scavenger fans together)')).toBeCloseTo(old.results.energy.fanKwh, 0);
  });
});

describe('the inputs that differ between compared runs', () => {
  it("lists only the inputs whose values differ, never the name or an old scenario's own elevation", () => {
    const a = makeScenario('direct-air', { system: { supplyAirC: 24 }, elevationM: 0 });
    const b = { ...makeScenario('direct-air', { system: { supplyAirC: 27 }, elevationM: 120 }), name: 'Another name' };
    const differing = differingInputs([a, b]);
    expect(differing.map((d) => d.path)).toEqual(['system.supplyAirC']);
    expect(differing[0].rows.map((r) => r?.value)).toEqual([24, 27]);
    expect(differingInputs([a, a])).toEqual([]);
  });
});
