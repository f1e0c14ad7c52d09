/**
 * Each layout and unit of the fixture corpus: the mapping the importer proposes and the values it
 * converts, checked against hand conversions whose factors are named beside each check.
 *
 * Conversion factors (NIST Special Publication 811, 2008 edition, appendix B):
 *  - °F → °C: t_C = (t_F − 32) / 1.8, exact (§B.9)
 *  - K → °C: t_C = T − 273.15, exact (§4.2.1.1)
 *  - inch of mercury, conventional: 1 inHg = 3.386 389 E+03 Pa (§B.8)
 *  - pound-force per square inch: 1 psi = 6.894 757 E+03 Pa (§B.8)
 *  - millibar: 1 mbar = 1.0 E+02 Pa (§B.8); hPa by SI prefix
 *  - grain = 6.479 891 E−05 kg and pound (avoirdupois) = 4.535 924 37 E−01 kg (§B.8): 7000 gr/lb
 */
// @ts-nocheck

import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { importClimateText, type ImportOptions, type ImportResult } from '../../../shared/climate';

const fixtures = fileURLToPath(new URL('../../fixtures/climate', import.meta.url));
function load(name: string, options?: ImportOptions): ImportResult {
  return importClimateText(readFileSync(path.join(fixtures, name), 'utf8'), options);
}
const iso = (ms: number) => new Date(ms).toISOString();
const values = (a: Float64Array | null | undefined) => Array.from(a ?? []);

// NIST SP 811 factors, written out here rather than imported so the product's constants are checked
const NIST_PA_PER_INHG = 3386.389;
const NIST_PA_PER_PSI = 6894.757;
const fToC = (f: number) => (f - 32) / 1.8;

describe('canonical command-line CSV', () => {
  it('is recognised with confidence 1 for every humidity column it allows', () => {
    for (const [file, quantity, unit] of [
      ['canonical-rh.csv', 'relative-humidity', '%'],
      ['canonical-dew-point.csv', 'dew-point', 'C'],
      ['canonical-wet-bulb.csv', 'wet-bulb', 'C'],
      ['canonical-humidity-ratio.csv', 'humidity-ratio', 'g/kg'],
    ] as const) {
      const { ok, mapping } = load(file);
      expect(ok, file).toBe(true);
      expect(mapping.confidence, file).toBe(1);
      expect(mapping.time, file).toMatchObject({ layout: 'iso', column: 0, confidence: 1 });
      expect(mapping.dryBulb, file).toMatchObject({ quantity: 'dry-bulb', unit: 'C', column: 1, confidence: 1 });
      expect(mapping.humidity, file).toMatchObject({ quantity, unit, column: 2, confidence: 1 });
    }
  });

  it('keeps SI values, converts kPa and g/kg, and fills a 2-hour gap linearly', () => {
    const { series, report, mapping } = load('canonical-rh.csv');
    expect(mapping.headerLine).toBe(2); // line 1 is a comment
    expect(mapping.pressure).toMatchObject({ quantity: 'pressure', unit: 'kPa', confidence: 1 });
    expect(values(series?.timestampsMs).map(iso)).toEqual([
      '2021-07-01T00:00:00.000Z',
      '2021-07-01T01:00:00.000Z',
      '2021-07-01T02:00:00.000Z',
      '2021-07-01T03:00:00.000Z',
      '2021-07-01T04:00:00.000Z',
      '2021-07-01T05:00:00.000Z',
    ]);
    expect(values(series?.dryBulbC)).toEqual([20, 21, 22, 23, 24, 25]);
    expect(series?.humidity.kind).toBe('relative-humidity-pct');
    expect(values(series?.humidity.values)).toEqual([60, 58, 56, 54, 52, 50]);
    // 101.325 kPa = 101 325 Pa (SI prefix); interpolated thirds between 101 300 and 101 200 Pa
    expect(series?.pressurePa?.[0]).toBeCloseTo(101325, 6);
    expect(series?.pressurePa?.[2]).toBeCloseTo(101266.6667, 3);
    expect(Array.from(series?.flags ?? [])).toEqual([0, 0, 1, 1, 0, 0]);
    expect(report.counts).toMatchObject({ rows: 4, hours: 6, measuredHours: 4, filledHours: 2, missingHours: 0, gaps: 1 });
    expect(report.issues).toContainEqual(expect.objectContaining({ kind: 'gap-filled', line: 4 }));
  });

  it('stores humidity ratio in kg/kg (12.5 g/kg = 0.0125 kg/kg by SI prefix)', () => {
    const { series } = load('canonical-humidity-ratio.csv');
    expect(series?.humidity.kind).toBe('humidity-ratio-kgkg');
    expect(series?.humidity.values[0]).toBeCloseTo(0.0125, 12);
  });

  it('reads dew point and wet-bulb as °C kinds', () => {
    expect(load('canonical-dew-point.csv').series?.humidity.kind).toBe('dew-point-c');
    const wet = load('canonical-wet-bulb.csv');
    expect(wet.series?.humidity.kind).toBe('wet-bulb-c');
    expect(values(wet.series?.humidity.values)).toEqual([22, 22.5]);
    expect(wet.series?.pressurePa?.[0]).toBe(100000);
  });
});

describe('semicolon, decimal comma, BOM, CRLF, date and time columns', () => {
  const { ok, series, mapping, report } = load('semicolon-decimal-comma.csv');
  it('detects the delimiter, the decimal comma and the day.month.year date', () => {
    expect(ok).toBe(true);
    expect(mapping.delimiter).toBe(';');
    expect(mapping.decimalSeparator).toBe(',');
    expect(mapping.time).toMatchObject({ layout: 'date-time', dateColumn: 0, timeColumn: 1, dateOrder: 'DMY' });
    expect(report.timeLayout).toContain('date column "Date"');
    expect(mapping.headers[0]).toBe('Date'); // the BOM is not part of the first header
    expect(mapping.dryBulb).toMatchObject({ header: 'Air temperature [°C]', unit: 'C' });
    expect(mapping.humidity).toMatchObject({ header: 'RH %', quantity: 'relative-humidity', unit: '%' });
    expect(mapping.pressure).toMatchObject({ header: 'pressure [hPa]', unit: 'hPa' });
  });
  it('converts the values (1 hPa = 100 Pa by SI prefix)', () => {
    expect(iso(series!.timestampsMs[0])).toBe('2021-01-13T00:00:00.000Z');
    expect(values(series?.dryBulbC)).toEqual([-3.5, -3.9, -4.2]);
    expect(values(series?.humidity.values)).toEqual([85.2, 86, 87.5]);
    expect(series?.pressurePa?.[0]).toBeCloseTo(101325, 6);
  });
});

describe('year, month, day, hour 1–24 as hour ending, °F, dew point °F, inHg', () => {
  const { series, mapping, report } = load('fahrenheit-inhg-ymdh.csv');
  it('detects the layout and stores each hour by its start (hour 24 is the hour before midnight)', () => {
    expect(mapping.time).toMatchObject({ layout: 'ymdh', year: 0, month: 1, day: 2, hour: 3, hourConvention: 'ending-1-24' });
    expect(report.timeLayout).toContain('hour ending (24 = midnight at the end of the day)');
    // rows stamped 22, 23, 24 (2021-03-01) and 1 (2021-03-02), each the hour ending then
    expect(values(series?.timestampsMs).map(iso)).toEqual([
      '2021-03-01T21:00:00.000Z',
      '2021-03-01T22:00:00.000Z',
      '2021-03-01T23:00:00.000Z', // 2021-03-01 hour 24: 23:00–24:00
      '2021-03-02T00:00:00.000Z',
    ]);
    expect(report.issues).toContainEqual(expect.objectContaining({ kind: 'hour-ending-stamps', severity: 'info', line: 3 }));
  });
  it('converts °F and inHg with the NIST SP 811 factors', () => {
    expect(mapping.dryBulb).toMatchObject({ header: 'Temp (F)', unit: 'F' });
    expect(mapping.humidity).toMatchObject({ header: 'Dew Point (F)', quantity: 'dew-point', unit: 'F' });
    expect(mapping.pressure).toMatchObject({ header: 'Station Pressure (inHg)', unit: 'inHg' });
    expect(series?.dryBulbC[0]).toBeCloseTo(fToC(50), 12); // 10 °C
    expect(series?.dryBulbC[1]).toBeCloseTo(9, 12); // 48.2 °F
    expect(series?.humidity.values[0]).toBeCloseTo(fToC(40), 12); // 4.444… °C
    expect(series?.humidity.kind).toBe('dew-point-c');
    // 29.92 inHg × 3386.389 Pa/inHg = 101 320.76 Pa; NIST rounds the factor to 7 digits, hence ±0.5 Pa
    expect(series?.pressurePa?.[0]).toBeCloseTo(29.92 * NIST_PA_PER_INHG, 0);
  });
});

describe('tab-delimited, ISO 8601 with offset, RH as a fraction', () => {
  const { series, mapping } = load('tab-rh-fraction-offset.tsv');
  it('converts local times with +08:00 to UTC and the fraction to %', () => {
    expect(mapping.delimiter).toBe('\t');
    expect(mapping.humidity).toMatchObject({ quantity: 'relative-humidity', unit: 'fraction' });
    expect(iso(series!.timestampsMs[0])).toBe('2021-05-01T00:00:00.000Z'); // 08:00+08:00
    expect(series?.humidity.values[0]).toBeCloseTo(82.5, 10);
    expect(series?.pressurePa).toBeNull();
  });
});

describe('quoted fields, kelvin, wet-bulb in kelvin, psi', () => {
  const { series, mapping } = load('quoted-kelvin-psi.csv');
  it('reads quoted cells, including a remark spanning two lines', () => {
    expect(mapping.time).toMatchObject({ layout: 'iso', column: 0 });
    expect(mapping.dryBulb).toMatchObject({ header: 'DryBulb_K', unit: 'K' });
    expect(mapping.humidity).toMatchObject({ header: 'Wet Bulb (K)', quantity: 'wet-bulb', unit: 'K' });
    expect(series?.timestampsMs.length).toBe(3);
  });
  it('converts K (− 273.15, exact) and psi (6894.757 Pa, NIST SP 811)', () => {
    expect(series?.dryBulbC[0]).toBeCloseTo(20, 10); // 293.15 K
    expect(series?.humidity.values[0]).toBeCloseTo(15, 10); // 288.15 K
    expect(series?.pressurePa?.[0]).toBeCloseTo(14.7 * NIST_PA_PER_PSI, 1); // 101 352.93 Pa
  });
});

describe('month/day/year dates, grains per pound, mbar', () => {
  const { series, mapping } = load('us-dates-grains-mbar.csv');
  it('tells month/day/year from a day above 12 and crosses the new year', () => {
    expect(mapping.time).toMatchObject({ layout: 'date-time', dateOrder: 'MDY' });
    expect(values(series?.timestampsMs).map(iso)).toEqual(['2021-12-31T22:00:00.000Z', '2021-12-31T23:00:00.000Z', '2022-01-01T00:00:00.000Z']);
  });
  it('converts 70 gr/lb to 0.01 kg/kg (7000 gr = 1 lb) and 1013.25 mbar to 101 325 Pa', () => {
    expect(mapping.humidity).toMatchObject({ quantity: 'humidity-ratio', unit: 'gr/lb' });
    expect(series?.humidity.values[0]).toBeCloseTo(0.01, 14);
    expect(series?.pressurePa?.[0]).toBeCloseTo(101325, 8);
    expect(series?.dryBulbC[0]).toBeCloseTo(fToC(68), 12); // 20 °C
  });
});

describe('other header wordings', () => {
  it('reads mixing ratio in kg/kg and Pressure_Pa', () => {
    const { series, mapping } = load('kgkg-pascal.csv');
    expect(mapping.humidity).toMatchObject({ quantity: 'humidity-ratio', unit: 'kg/kg' });
    expect(mapping.pressure).toMatchObject({ header: 'Pressure_Pa', unit: 'Pa' });
    expect(series?.humidity.values[0]).toBe(0.0105);
    expect(series?.pressurePa?.[0]).toBe(100500);
  });

  it('merges a units row under the header', () => {
    const { series, mapping } = load('units-row.csv');
    expect(mapping.dryBulb).toMatchObject({ header: 'temperature (degF)', unit: 'F' });
    expect(mapping.humidity).toMatchObject({ quantity: 'dew-point', unit: 'F' });
    expect(series?.dryBulbC[0]).toBeCloseTo(10, 12);
  });

  it('infers units from magnitudes when headers give none, and says so', () => {
    const { series, mapping, report } = load('no-units.csv');
    expect(mapping.dryBulb).toMatchObject({ unit: 'C' });
    expect(mapping.humidity).toMatchObject({ quantity: 'relative-humidity', unit: '%' });
    expect(mapping.pressure).toMatchObject({ unit: 'hPa' });
    expect(mapping.confidence).toBeLessThan(1);
    expect(report.issues.filter((i) => i.kind === 'unit-assumed').map((i) => i.column)).toEqual(['temperature', 'humidity', 'pressure']);
    expect(series?.pressurePa?.[0]).toBeCloseTo(101320, 8);
  });
});

describe('sub-hourly data', () => {
  it('averages 10-minute rows into the hour they fall in', () => {
    const { series, report } = load('ten-minute.csv');
    expect(report.stepMinutes).toBe(10);
    // hour 00: dry-bulb 10.0 … 12.5 in 0.5 steps, mean 11.25; RH 70 … 65, mean 67.5
    expect(values(series?.dryBulbC)).toEqual([11.25, 14.25, 17.25]);
    expect(values(series?.humidity.values)).toEqual([67.5, 61.5, 55.5]);
    expect(report.counts.rowsAveraged).toBe(15);
    expect(report.issues).toContainEqual(expect.objectContaining({ kind: 'sub-hourly-averaged' }));
  });
});

describe('local time and daylight saving', () => {
  it('places a repeated local hour (clocks going back) on its two UTC instants when the zone is given', () => {
    const { series, report } = load('local-time-warsaw-autumn.csv', { timeZone: 'Europe/Warsaw' });
    // Europe/Warsaw leaves UTC+02:00 for UTC+01:00 at 03:00 local on 31 Oct 2021 (IANA tz database)
    expect(values(series?.timestampsMs).map(iso)).toEqual([
      '2021-10-30T22:00:00.000Z',
      '2021-10-30T23:00:00.000Z',
      '2021-10-31T00:00:00.000Z',
      '2021-10-31T01:00:00.000Z',
      '2021-10-31T02:00:00.000Z',
    ]);
    expect(values(series?.dryBulbC)).toEqual([8, 7.8, 7.6, 7.4, 7.2]);
    expect(report.counts.duplicateTimestamps).toBe(0);
    expect(report.counts.daylightSavingJumps).toBe(1);
    expect(report.issues).toContainEqual(expect.objectContaining({ kind: 'daylight-saving-jump', line: 5 }));
  });

  it('without the zone, reports the same file as a duplicate that looks like a clock change', () => {
    const { report } = load('local-time-warsaw-autumn.csv');
    expect(report.counts.duplicateTimestamps).toBe(1);
    expect(report.issues).toContainEqual(expect.objectContaining({ kind: 'duplicate-timestamp', line: 5 }));
    expect(report.issues).toContainEqual(expect.objectContaining({ kind: 'daylight-saving-jump', severity: 'warning', line: 5 }));
  });

  it('hints at a spring-forward skip in naive local times read as UTC', () => {
    const { report } = load('naive-local-spring.csv');
    expect(report.issues).toContainEqual(expect.objectContaining({ kind: 'daylight-saving-jump', severity: 'warning', line: 4 }));
  });
});

describe('mapping overrides', () => {
  it('take precedence with confidence 1 and are validated', () => {
    const { series, mapping } = load('no-units.csv', {
      mapping: { dryBulb: { column: 'temperature', unit: 'F' }, pressure: null },
    });
    expect(mapping.dryBulb).toMatchObject({ unit: 'F', confidence: 1, reason: 'chosen by the user' });
    expect(mapping.pressure).toBeNull();
    expect(series?.pressurePa).toBeNull();
    expect(series?.dryBulbC[0]).toBeCloseTo(fToC(12), 12);

    const wrong = load('no-units.csv', { mapping: { humidity: { column: 'nope', quantity: 'dew-point', unit: 'C' } } });
    expect(wrong.ok).toBe(false);
    expect(wrong.report.issues).toContainEqual(expect.objectContaining({ kind: 'mapping-override-invalid', value: 'nope' }));
  });

  it('map a header-less file by column index', () => {
    const text = '2021-01-01T00:00Z,10,80\n2021-01-01T01:00Z,11,81\n';
    const unmapped = importClimateText(text);
    expect(unmapped.ok).toBe(false);
    expect(unmapped.report.issues).toContainEqual(expect.objectContaining({ kind: 'no-header' }));
    const mapped = importClimateText(text, {
      mapping: {
        time: { layout: 'iso', column: 0 },
        dryBulb: { column: 1, unit: 'C' },
        humidity: { column: 2, quantity: 'relative-humidity', unit: '%' },
      },
    });
    expect(mapped.ok).toBe(true);
    expect(values(mapped.series?.dryBulbC)).toEqual([10, 11]);
  });
});

describe('details of recognition', () => {
  it('moves hourly stamps at a fixed minute (:50) to the nearest whole hour and says so', () => {
    const text = 'timestamp,dry_bulb_c,relative_humidity_pct\n2021-01-01T00:50Z,1,80\n2021-01-01T01:50Z,2,80\n2021-01-01T02:50Z,3,80\n';
    const { series, report } = importClimateText(text);
    expect(iso(series!.timestampsMs[0])).toBe('2021-01-01T01:00:00.000Z');
    expect(series?.timestampsMs.length).toBe(3);
    expect(report.issues).toContainEqual(expect.objectContaining({ kind: 'timestamps-rounded' }));
  });

  it('keeps one humidity measure, preferring dew point to RH at equal confidence, and says which was left', () => {
    const text = 'timestamp,dry_bulb_c,relative_humidity_pct,dew_point_c\n2021-01-01T00:00Z,10,80,6.7\n2021-01-01T01:00Z,10,80,6.7\n';
    const { mapping, report } = importClimateText(text);
    expect(mapping.humidity).toMatchObject({ quantity: 'dew-point', header: 'dew_point_c' });
    expect(report.issues).toContainEqual(expect.objectContaining({ kind: 'other-humidity-ignored', column: 'relative_humidity_pct' }));
  });

  it('reads a file in local standard time through a fixed offset', () => {
    const { series } = load('fahrenheit-inhg-ymdh.csv', { timeZone: 'UTC-07:00' });
    // hour ending 22:00 local is the hour from 21:00 local = 04:00 UTC next day
    expect(iso(series!.timestampsMs[0])).toBe('2021-03-02T04:00:00.000Z');
  });
});

describe('typical-year files', () => {
  // months taken from different years, hour ending 1–24 as such files are usually written
  const sourceYear = [1998, 2004, 2011, 1995, 2007, 2001, 1999, 2013, 2002, 2009, 1997, 2005];
  function typicalYearText(): string {
    const lines = ['Year,Month,Day,Hour,Dry Bulb (C),Dew Point (C)'];
    for (let month = 1; month <= 12; month++) {
      const days = new Date(Date.UTC(2001, month, 0)).getUTCDate();
      for (let day = 1; day <= days; day++) {
        for (let hour = 1; hour <= 24; hour++) lines.push(`${sourceYear[month - 1]},${month},${day},${hour},${month + hour / 100},${month - 5}`);
      }
    }
    return `${lines.join('\n')}\n`;
  }

  it('re-dates the rows into one continuous year and says so', () => {
    const { ok, series, report } = importClimateText(typicalYearText());
    expect(ok).toBe(true);
    expect(report.counts.hours).toBe(8760);
    expect(report.counts.missingHours).toBe(0);
    expect(report.issues).toContainEqual(expect.objectContaining({ kind: 'typical-year-restamped', severity: 'warning' }));
    // the first row's year (1998, not leap) is kept; hour 1 of 1 January is the hour from 00:00 and
    // hour 24 of 31 December the last hour of the same year (no wrap into a phantom next year)
    expect(iso(series!.timestampsMs[0])).toBe('1998-01-01T00:00:00.000Z');
    expect(series!.dryBulbC[0]).toBeCloseTo(1.01, 10);
    expect(series!.dryBulbC[1]).toBeCloseTo(1.02, 10);
    expect(iso(series!.timestampsMs[8759])).toBe('1998-12-31T23:00:00.000Z');
    expect(series!.dryBulbC[8759]).toBeCloseTo(12.24, 10);
    expect(report.years).toEqual([1998]);
    // the year each month came from, kept for the climate-file page
    expect(report.typicalYear).toEqual({ year: 1998, sourceYearByMonth: sourceYear });
  });

  it('leaves an ordinary year that crosses a new year alone', () => {
    const lines = ['timestamp,dry_bulb_c,relative_humidity_pct'];
    for (let h = 0; h < 8760; h++) lines.push(`${new Date(Date.UTC(2020, 6, 1) + h * 3_600_000).toISOString().slice(0, 16)}Z,10,80`);
    const { report } = importClimateText(lines.join('\n'));
    expect(report.issues.filter((i) => i.kind === 'typical-year-restamped')).toEqual([]);
    expect(report.firstTimestamp).toBe('2020-07-01T00:00:00.000Z');
  });
});

describe('hour cells written as clock times', () => {
  it.each([
    ['hhmm', ['2200', '2300', '2400', '100']],
    ['hh:mm', ['22:00', '23:00', '24:00', '01:00']],
  ])('%s in the hour column', (_, hours) => {
    const days = ['1', '1', '1', '2'];
    const text = `Year,Month,Day,Hour,Temp (C),RH (%)\n${hours.map((h, i) => `2021,3,${days[i]},${h},10,80`).join('\n')}\n`;
    const { ok, series, mapping } = importClimateText(text);
    expect(ok).toBe(true);
    expect(mapping.time).toMatchObject({ layout: 'ymdh', hourConvention: 'ending-1-24' });
    expect(values(series?.timestampsMs).map(iso)).toEqual([
      '2021-03-01T21:00:00.000Z',
      '2021-03-01T22:00:00.000Z',
      '2021-03-01T23:00:00.000Z',
      '2021-03-02T00:00:00.000Z',
    ]);
  });
});

describe('a year of hour-ending stamps', () => {
  it('is that year: stored by hour starts, no phantom hour in the next year', () => {
    const lines = ['Year,Month,Day,Hour,Temp (C),RH (%)'];
    for (let h = 1; h <= 8760; h++) {
      const end = new Date(Date.UTC(2021, 0, 1) + h * 3_600_000);
      // hour 24 of a day, as such files write it, rather than hour 0 of the next
      const day = new Date(end.getTime() - 1);
      const hour = end.getUTCHours() === 0 ? 24 : end.getUTCHours();
      lines.push(`${day.getUTCFullYear()},${day.getUTCMonth() + 1},${day.getUTCDate()},${hour},10,80`);
    }
    const { ok, series, report } = importClimateText(lines.join('\n'), { timeZone: 'UTC-07:00' });
    expect(ok).toBe(true);
    expect(report.years).toEqual([2021]);
    expect(series!.timestampsMs.length).toBe(8760);
    // 2021-01-01 00:00 at UTC−07:00 is 07:00 UTC; the last hour starts 2021-12-31 23:00 local = 2022-01-01 06:00 UTC
    expect(iso(series!.timestampsMs[0])).toBe('2021-01-01T07:00:00.000Z');
    expect(iso(series!.timestampsMs[8759])).toBe('2022-01-01T06:00:00.000Z');
  });
});
