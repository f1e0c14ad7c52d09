// @ts-nocheck
import { describe, expect, it } from 'vitest';
import type { ImportReport } from '../../../shared/climate';
import {
  comparisonCsv,
  comparisonRows,
  hourlyJson,
  inUnits,
  runSummaryRows,
  shapeReportRun,
  summaryCsv,
  summaryRowsIn,
  type ReportRunSource,
} from '../../../shared/report';
import { importClimateText } from '../../../shared/climate';
import { MODE, runScenario, type HourlyCsvInput } from '../../../shared/scenario';
import { makeScenario } from '../scenario/fixtures';

/** 48 synthetic hours (demo data, not a station): a mild day then a hot one, RH 50 %, sea level. */
function syntheticSeries() {
  const n = 48;
  const t0 = Date.UTC(2024, 6, 1);
  return {
    timestampsMs: Float64Array.from({ length: n }, (_, i) => t0 + i * 3_600_000),
    dryBulbC: Float64Array.from({ length: n }, (_, i) => (i < 24 ? 12 : 34)),
    humidity: { kind: 'relative-humidity-pct' as const, values: new Float64Array(n).fill(50) },
    pressurePa: null,
    flags: new Uint8Array(n),
  };
}

const importReport = {
  ok: true,
  summary: '48 hours read; no gaps.',
  timeLayout: 'one ISO 8601 column',
  stepMinutes: 60,
  firstTimestamp: '2024-07-01T00:00Z',
  lastTimestamp: '2024-07-02T23:00Z',
  years: [2024],
  maxGapHours: 6,
  timeZone: 'UTC',
  counts: {
    lines: 50,
    rows: 48,
    rowsRejected: 0,
    cellsUnreadable: 1,
    impossibleValues: 0,
    clampedValues: 0,
    duplicateTimestamps: 0,
    rowsAveraged: 0,
    nonHourlySteps: 0,
    daylightSavingJumps: 0,
    hours: 48,
    measuredHours: 44,
    filledHours: 2,
    missingHours: 2,
    gaps: 2,
    longestGapHours: 2,
    issuesNotListed: 0,
  },
  issues: [{ kind: 'gap-filled', severity: 'warning', message: 'gap filled' }],
} as unknown as ImportReport;

function source(id: number, supplyAirC: number, overrides: Partial<ReportRunSource> = {}): ReportRunSource {
  const scenario = { ...makeScenario('direct-air', { system: { supplyAirC, evaporativeEffectiveness: 0 } }), name: `Supply ${supplyAirC} °C` };
  scenario.envelope = { ...scenario.envelope, presetId: 'ashrae-2021-a1' };
  return {
    id,
    engineVersion: 'test',
    createdAt: new Date(Date.UTC(2026, 0, 5, 9)),
    finishedAt: new Date(Date.UTC(2026, 0, 5, 9, 1)),
    scenario,
    sweepPoint: null,
    climate: {
      name: 'Synthetic two days',
      sha256: 'ab'.repeat(32),
      hours: 48,
      firstHourMs: Date.UTC(2024, 6, 1),
      lastHourMs: Date.UTC(2024, 6, 2, 23),
      site: { name: 'Invented quay', elevationM: 0, timeZone: 'Europe/Lisbon' },
      elevationM: 0,
      utcOffsetMinutes: 0,
    },
    results: runScenario(scenario, syntheticSeries()).results,
    file: { originalFileName: 'two-days.csv', hasPressure: false, humidityKind: 'relative-humidity-pct', report: importReport, derivationJson: null },
    siteNow: { latitude: 38.7, longitude: -9.1 },
    ...overrides,
  };
}

describe('the report of a run', () => {
  it('carries the validation summary, the envelope edition, and no database ids but the run number', () => {
    const run = shapeReportRun(source(7, 24));
    expect(run.climate.validation).toMatchObject({ measuredHours: 44, filledHours: 2, missingHours: 2, warnings: 1, timeZone: 'UTC' });
    // 46 of 48 hours have data (measured or filled): 95.83 %.
    expect(run.climate.validation!.completenessPct).toBeCloseTo((100 * 46) / 48, 10);
    expect(run.envelope.edition).toBe('ASHRAE TC 9.9 Thermal Guidelines for Data Processing Environments, 5th edition (2021)');
    expect(run.envelope.recalledFromMemory).toBe(true);
    expect(run.site).toMatchObject({ name: 'Invented quay', latitude: 38.7, utcOffsetMinutes: 0 });
    expect(JSON.stringify(run)).not.toMatch(/"(projectId|climateFileId|scenarioId|siteId|createdBy)"/);
  });

  it('says when the climate file is gone, or is a projection', () => {
    expect(shapeReportRun(source(7, 24, { file: null })).climate).toMatchObject({ fileName: null, validation: null, projection: null });
    const derived = shapeReportRun(source(7, 24, { file: { ...source(7, 24).file!, derivationJson: '{"method":"shift","note":"2050s"}' } }));
    expect(derived.climate.projection).toEqual({ method: 'shift', note: '2050s' });
    expect(
      shapeReportRun(source(7, 24, { scenario: { ...source(7, 24).scenario, envelope: { ...source(7, 24).scenario.envelope, presetId: undefined } } }))
        .envelope,
    ).toEqual({
      label: 'Custom envelope',
      edition: null,
      recalledFromMemory: false,
      note: null,
    });
  });

  it('summarises the run with figures that add up', () => {
    const run = shapeReportRun(source(7, 24));
    const rows = runSummaryRows(run);
    const value = (figure: string) => rows.find((r) => r.figure === figure)!.value;
    // 24 mild hours (12 °C + 1 K fan heat ≤ 24 °C) are free; 24 hot hours (34 °C) need compressors, no evaporative stage.
    expect(value('Free cooling')).toBe(24);
    expect(value('Mechanical')).toBe(24);
    expect(value('All hours')).toBe(48);
    expect(value('Free cooling share')).toBe(50);
    const byMonth = rows.filter((r) => r.section === 'by month' && r.figure.startsWith('Jul:') && !r.figure.includes('of which'));
    expect(byMonth.map((r) => r.value)).toEqual([24, 0, 24, 0]);
    // pPUE = (IT + cooling) / IT energy (ISO/IEC 30134-2 partial form), from the totals in the same rows.
    const it_ = value('IT energy') as number;
    expect(value('Partial PUE (cooling)')).toBeCloseTo((it_ + (value('Cooling total') as number)) / it_, 3);
    expect(rows.find((r) => r.figure === 'system.supplyAirC')).toEqual({ section: 'inputs', figure: 'system.supplyAirC', unit: '°C', value: 24 });
    const csv = summaryCsv(rows).split('\n');
    expect(csv[0]).toBe('section,figure,unit,value');
    expect(csv).toContain('hours,Free cooling,h,24');
    expect(csv).toContain('run,Scenario,,Supply 24 °C');
  });

  it('compares runs against the baseline, with differences of the rounded figures', () => {
    const a = shapeReportRun(source(1, 24));
    const b = shapeReportRun(source(2, 10));
    const rows = comparisonRows([a, b], 1);
    const free = rows.find((r) => r.key === 'free')!;
    // At a 10 °C supply the 12 °C hours need compressors too (12 + 1 K fan heat > 10): 0 h against the baseline's 24 h.
    expect(free.cells).toEqual([
      { runId: 1, value: 24, difference: null },
      { runId: 2, value: 0, difference: -24 },
    ]);
    const csv = comparisonCsv([a, b], 1).split('\n');
    expect(csv[0]).toBe(
      'figure,unit,run 1 (baseline): Supply 24 °C / Synthetic two days,run 1 difference,run 2: Supply 10 °C / Synthetic two days,run 2 difference',
    );
    expect(csv[1]).toBe('Engine version,,test,,test,');
    expect(csv[2]).toBe('Free cooling,h,24,,0,-24');
  });
});

describe('summaries in IP units', () => {
  it('converts temperatures, differences, lengths and water by the exact factors', () => {
    // NIST SP 811 (2008), App. B: °F = 1.8·°C + 32; 1 K = 1.8 °F as a difference; 1 ft = 0.3048 m; 1 US gal = 3.785 411 784 L (exact).
    expect(inUnits('°C', 25, 'IP')).toEqual({ unit: '°F', value: 77 });
    expect(inUnits('K', 12, 'IP')).toEqual({ unit: '°F difference', value: 21.6 });
    expect(inUnits('m', 14, 'IP')).toEqual({ unit: 'ft', value: 45.9 });
    expect(inUnits('L', 3785.411784, 'IP')).toEqual({ unit: 'US gal', value: 1000 });
    // WUE keeps L/kWh (ISO/IEC 30134-9 defines it so); hours and energy are the same in both systems.
    expect(inUnits('L/kWh', 0.5, 'IP')).toEqual({ unit: 'L/kWh', value: 0.5 });
    expect(inUnits('kWh', 10, 'IP')).toEqual({ unit: 'kWh', value: 10 });
    expect(inUnits('°C', 25, 'SI')).toEqual({ unit: '°C', value: 25 });
  });

  it('converts the run summary and the comparison, differences included', () => {
    const a = shapeReportRun(source(1, 24));
    const rows = summaryRowsIn(runSummaryRows(a), 'IP');
    expect(rows.find((r) => r.figure === 'system.supplyAirC')).toEqual({ section: 'inputs', figure: 'system.supplyAirC', unit: '°F', value: 75.2 });
    expect(rows.find((r) => r.figure === 'Scenario')!.value).toBe('Supply 24 °C');
    const b = shapeReportRun(source(2, 10));
    const water = comparisonRows([a, b], 1, 'IP').find((r) => r.key === 'water')!;
    expect(water.unit).toBe('US gal');
    const [base, other] = water.cells;
    expect(other.difference).toBeCloseTo(other.value! - base.value!, 0);
  });
});

describe('hourly JSON', () => {
  it('rounds as the CSV does and leaves missing values null', () => {
    const input: HourlyCsvInput = {
      timestampsMs: Float64Array.of(Date.UTC(2024, 0, 1, 0), Date.UTC(2024, 0, 1, 1)),
      modes: Uint8Array.of(MODE.free, MODE.noData),
      dryBulbC: Float64Array.of(-0.125, Number.NaN),
      wetBulbC: Float64Array.of(-1.005, Number.NaN),
      dewPointC: Float64Array.of(-3.333, Number.NaN),
      rhPct: Float64Array.of(80.004, Number.NaN),
      humidityRatio: Float64Array.of(0.0034567, Number.NaN),
      enthalpyKJPerKg: Float64Array.of(8.4449, Number.NaN),
      mechanicalFraction: Float64Array.of(0, 0.5),
      humidified: Uint8Array.of(1, 0),
      // Asia/Kolkata's UTC+05:30 (IANA tz database): a half-hour offset, which no Etc/GMT zone covers
      utcOffsetMinutes: 330,
    };
    const json = hourlyJson(input);
    expect(json.hours.local_standard_time).toEqual(['2024-01-01T05:30', '2024-01-01T06:30']);
    expect(json.hours.timestamp).toEqual(['2024-01-01T00:00Z', '2024-01-01T01:00Z']);
    expect(json.hours.mode).toEqual(['free', 'no_data']);
    // Half-way cases away from zero, as writeFixed in the CSV.
    expect(json.hours.dry_bulb_c).toEqual([-0.13, null]);
    expect(json.hours.humidity_ratio_gkg).toEqual([3.457, null]);
    expect(json.hours.mechanical_fraction).toEqual([0, null]);
    expect(json.hours.humidified).toEqual([1, null]);
  });
});

describe('years and periods on the site standard time', () => {
  /** A synthetic year 2021 stamped hour ending 1–24 in local standard time, as typical-year files write it. */
  function hourEndingYear(): string {
    const lines = ['Year,Month,Day,Hour,Temp (C),RH (%)'];
    for (let h = 1; h <= 8760; h++) {
      const end = new Date(Date.UTC(2021, 0, 1) + h * 3_600_000);
      const day = new Date(end.getTime() - 1);
      lines.push(`${day.getUTCFullYear()},${day.getUTCMonth() + 1},${day.getUTCDate()},${end.getUTCHours() === 0 ? 24 : end.getUTCHours()},15,60`);
    }
    return lines.join('\n');
  }

  it('keeps an hour-ending year in its year at a fixed-offset site: no phantom next year in the summary', () => {
    const imported = importClimateText(hourEndingYear(), { timeZone: 'UTC-07:00' });
    const series = imported.series!;
    const s = source(9, 24);
    const results = runScenario(s.scenario, series, { utcOffsetMinutes: -420 }).results;
    const run = shapeReportRun({
      ...s,
      results,
      climate: {
        ...s.climate,
        hours: 8760,
        firstHourMs: series.timestampsMs[0],
        lastHourMs: series.timestampsMs[8759],
        site: { name: 'Invented mesa', elevationM: 0, timeZone: 'UTC-07:00' },
        utcOffsetMinutes: -420,
      },
    });
    expect(results.hoursByYear.map((y) => y.year)).toEqual([2021]);
    const rows = runSummaryRows(run);
    const value = (figure: string) => rows.find((r) => r.figure === figure)?.value;
    expect(value('Period (site standard time)')).toBe('2021-01-01 to 2021-12-31');
    expect(value('Site standard time')).toBe('UTC−07:00');
    expect(value('2021: calendar year')).toBe('full');
    expect(rows.some((r) => r.figure.startsWith('2022'))).toBe(false);
  });

  it('marks a partial year in the summary as the run page does', () => {
    const rows = runSummaryRows(shapeReportRun(source(7, 24)));
    // 48 hours of July 2024 against the 8,784 hours of the leap year 2024 (Gregorian calendar).
    expect(rows.find((r) => r.figure === '2024: calendar year')?.value).toBe('partial · left out (48 of 8784 h)');
  });
});
