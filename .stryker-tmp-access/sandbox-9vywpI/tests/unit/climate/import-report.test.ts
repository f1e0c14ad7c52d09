/**
 * The validation report: each error kind of the fixture corpus, with the line numbers, columns and
 * cells it names, the counts, and the acceptance rule (ok) documented in import-climate-text.ts.
 */
// @ts-nocheck

import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { decodeClimateBytes, importClimateText, type ImportIssue, type ImportResult } from '../../../shared/climate';

const fixtures = fileURLToPath(new URL('../../fixtures/climate', import.meta.url));
const load = (name: string): ImportResult => importClimateText(decodeClimateBytes(readFileSync(path.join(fixtures, name))));
const ofKind = (result: ImportResult, kind: ImportIssue['kind']) => result.report.issues.filter((i) => i.kind === kind);

describe('a file with one row problem of each kind (tests/fixtures/climate/bad-rows.csv)', () => {
  const result = load('bad-rows.csv');
  const { report, series } = result;

  it('is still imported: the problems are repairable and reported', () => {
    expect(result.ok).toBe(true);
    expect(report.ok).toBe(true);
  });

  it('names the line, column and cell of each bad row', () => {
    expect(ofKind(result, 'unparsable-time')).toEqual([expect.objectContaining({ line: 6, column: 'timestamp', value: 'not a time', severity: 'warning' })]);
    expect(ofKind(result, 'unparsable-value')).toEqual([expect.objectContaining({ line: 7, column: 'dry_bulb_c', value: 'eleven' })]);
    expect(ofKind(result, 'impossible-value').map((i) => [i.line, i.column, i.value])).toEqual([
      [8, 'dry_bulb_c', '75.0'], // above 60 °C
      [9, 'dew_point_c', '15.0'], // 3 K above the dry-bulb of 12 °C
      [11, 'pressure_kpa', '30.0'], // below 50 kPa
    ]);
    expect(ofKind(result, 'clamped-value')).toEqual([expect.objectContaining({ line: 10, column: 'dew_point_c', value: '12.8' })]);
    expect(ofKind(result, 'missing-value-marker')).toEqual([expect.objectContaining({ line: 13, value: 'NA' })]);
    expect(ofKind(result, 'duplicate-timestamp')).toEqual([expect.objectContaining({ line: 12 })]);
    expect(ofKind(result, 'duplicate-timestamp')[0].message).toContain('first on line 11');
    expect(ofKind(result, 'non-hourly-step').map((i) => i.line)).toEqual([14, 15]);
    expect(ofKind(result, 'out-of-order')).toEqual([expect.objectContaining({ line: 20 })]);
  });

  it('fills gaps up to 6 h and leaves the 9-hour gap missing', () => {
    expect(ofKind(result, 'gap-filled').map((i) => i.message.slice(0, 8))).toEqual(['3 hours ', '2 hours ', '1 hour w']);
    expect(ofKind(result, 'gap-missing')).toEqual([expect.objectContaining({ line: 16, severity: 'warning' })]);
    expect(report.counts).toMatchObject({
      rows: 40,
      rowsRejected: 1,
      cellsUnreadable: 2,
      impossibleValues: 3,
      clampedValues: 1,
      duplicateTimestamps: 1,
      nonHourlySteps: 2,
      hours: 48,
      measuredHours: 33,
      filledHours: 6,
      missingHours: 9,
      gaps: 4,
      longestGapHours: 9,
    });
  });

  it('interpolates each quantity between its nearest measured values and flags the hours', () => {
    const s = series!;
    // hours 03 and 04 lost their dry-bulb; neighbours 11.0 (02 h) and 12.0 (05 h)
    expect(s.dryBulbC[3]).toBeCloseTo(11 + 1 / 3, 12);
    expect(s.dryBulbC[4]).toBeCloseTo(11 + 2 / 3, 12);
    // their dew points were measured and are kept
    expect(s.humidity.values[3]).toBe(5.6);
    expect(s.humidity.values[4]).toBe(5.8);
    // hour 05 lost its dew point; neighbours 5.8 (04 h) and 12.5 (06 h, clamped to the dry-bulb)
    expect(s.humidity.values[5]).toBeCloseTo((5.8 + 12.5) / 2, 12);
    expect(s.humidity.values[6]).toBe(12.5);
    // the duplicate row (line 12) is left out, so 07 h keeps line 11's impossible pressure as missing, then filled
    expect(s.pressurePa![7]).toBeCloseTo(100000, 6);
    expect(Array.from(s.flags.slice(0, 24))).toEqual([0, 0, 0, 1, 1, 1, 0, 1, 1, 0, 1, 0, 0, 2, 2, 2, 2, 2, 2, 2, 2, 2, 0, 0]);
    expect(Number.isNaN(s.dryBulbC[13]) && Number.isNaN(s.humidity.values[13]) && Number.isNaN(s.pressurePa![13])).toBe(true);
  });

  it('is plain JSON, so the API can send it as a 422 body', () => {
    expect(JSON.parse(JSON.stringify(report))).toEqual(report);
    expect(JSON.parse(JSON.stringify(result.mapping))).toEqual(result.mapping);
  });
});

describe('files that are refused, each with a clear error', () => {
  it.each([
    ['empty.csv', 'empty-input', 'The file is empty.'],
    ['comments-only.csv', 'empty-input', 'only comment lines'],
    ['header-only.csv', 'header-only', 'header but no data rows'],
    ['workbook.xlsx', 'binary-input', 'looks binary'],
    ['no-humidity.csv', 'missing-humidity', 'No humidity column'],
    ['no-dry-bulb.csv', 'missing-dry-bulb', 'No dry-bulb'],
    ['no-time.csv', 'missing-time', 'No time columns'],
    ['wrong-unit.csv', 'too-many-rejected', 'check the column and its unit'],
    ['garbled-year.csv', 'span-too-long', '1000 years'],
  ] as const)('%s → %s', (file, kind, words) => {
    const result = load(file);
    expect(result.ok).toBe(false);
    expect(result.series).toBeNull();
    const errors = result.report.issues.filter((i) => i.severity === 'error');
    expect(errors[0]).toMatchObject({ kind });
    expect(errors[0].message).toContain(words);
    expect(result.report.summary).toContain('Not imported');
    expect(JSON.parse(JSON.stringify(result.report))).toEqual(result.report);
  });

  it('header-only names the header line', () => {
    expect(ofKind(load('header-only.csv'), 'header-only')[0].line).toBe(1);
  });

  it('still returns the proposed mapping when a required column is missing, so the user can fix it', () => {
    const { mapping } = load('no-humidity.csv');
    expect(mapping.dryBulb).toMatchObject({ header: 'dry_bulb_c' });
    expect(mapping.time).toMatchObject({ layout: 'iso' });
    expect(mapping.confidence).toBe(0);
  });
});

describe('the acceptance rule', () => {
  const header = 'timestamp,dry_bulb_c,relative_humidity_pct\n';
  const row = (h: number, db: string) => `2021-01-01T${String(h).padStart(2, '0')}:00Z,${db},80\n`;

  it('accepts 10 % unreadable dry-bulb cells and refuses more', () => {
    const body = (bad: number) => Array.from({ length: 20 }, (_, h) => row(h, h >= 5 && h < 5 + bad ? 'abc' : '10')).join('');
    expect(importClimateText(header + body(2)).ok).toBe(true);
    expect(importClimateText(header + body(3)).ok).toBe(false);
  });

  it('refuses a series with fewer than half of its hours measured', () => {
    const text = `${header}${row(0, '10')}${row(1, '10')}2021-01-01T23:00Z,10,80\n`;
    const result = importClimateText(text);
    expect(result.ok).toBe(false);
    expect(ofKind(result, 'too-little-data')[0].message).toContain('3 of 24 hours');
  });

  it('honours maxGapHours: 0 leaves every gap missing', () => {
    const text = `${header}${row(0, '10')}${row(2, '10')}${row(3, '10')}`;
    expect(importClimateText(text, { maxGapHours: 0 }).report.counts).toMatchObject({ filledHours: 0, missingHours: 1 });
    expect(importClimateText(text).report.counts).toMatchObject({ filledHours: 1, missingHours: 0 });
  });

  it('refuses bad options with invalid-option', () => {
    expect(ofKind(importClimateText(header + row(0, '1'), { maxGapHours: -1 }), 'invalid-option')).toHaveLength(1);
    expect(ofKind(importClimateText(header + row(0, '1'), { timeZone: 'Mars/Olympus' }), 'invalid-option')[0].value).toBe('Mars/Olympus');
  });
});

describe('line numbers', () => {
  it('count comment lines, notes before the header and lines inside quoted fields', () => {
    const text = [
      '# synthetic',
      'Station: invented, elevation 10 m',
      'timestamp,dry_bulb_c,relative_humidity_pct,note',
      '2021-01-01T00:00Z,10,80,"two',
      'lines"',
      '2021-01-01T01:00Z,99,80,',
      '2021-01-01T02:00Z,10,80,',
    ].join('\r\n');
    const result = importClimateText(text);
    expect(result.mapping.headerLine).toBe(3);
    expect(ofKind(result, 'preamble-skipped')).toEqual([expect.objectContaining({ line: 2 })]);
    expect(ofKind(result, 'impossible-value')).toEqual([expect.objectContaining({ line: 6, value: '99' })]);
  });

  it('report rows with too few fields', () => {
    const result = importClimateText('timestamp,dry_bulb_c,relative_humidity_pct\n2021-01-01T00:00Z,10,80\n2021-01-01T01:00Z,10\n2021-01-01T02:00Z,10,80\n');
    expect(ofKind(result, 'wrong-field-count')).toEqual([expect.objectContaining({ line: 3 })]);
  });

  it('lists the first 200 issues and counts the rest', () => {
    const rows = (n: number, every: number) =>
      Array.from({ length: n }, (_, h) => `${new Date(Date.UTC(2021, 0, 1, h)).toISOString()},${h % every === 0 ? 'bad' : '10'},80\n`).join('');
    const few = importClimateText(`timestamp,dry_bulb_c,relative_humidity_pct\n${rows(400, 10)}`);
    expect(few.report.counts.cellsUnreadable).toBe(40);
    expect(ofKind(few, 'unparsable-value')).toHaveLength(40);
    expect(few.report.counts.issuesNotListed).toBe(0);
    // 1,000 hours, every fourth dry-bulb unreadable: 250 warnings, listed up to 200; the error that refuses the file is listed too.
    const many = importClimateText(`timestamp,dry_bulb_c,relative_humidity_pct\n${rows(1_000, 4)}`);
    expect(many.report.counts.cellsUnreadable).toBe(250);
    expect(ofKind(many, 'unparsable-value')).toHaveLength(200);
    expect(many.report.issues.filter((i) => i.severity === 'error').map((i) => i.kind)).toEqual(['too-many-rejected']);
    expect(many.report.counts.issuesNotListed).toBe(50);
    expect(many.issueList?.rows).toHaveLength(251);
  });
});

describe('shape of the rows', () => {
  it('finds the header when data rows end with a delimiter and the header does not', () => {
    const result = importClimateText('timestamp;dry_bulb_c;relative_humidity_pct\n2021-01-01T00:00Z;10;80;\n2021-01-01T01:00Z;11;81;\n');
    expect(result.ok).toBe(true);
    expect(result.mapping.headerLine).toBe(1);
    expect(result.report.issues.filter((i) => i.kind === 'preamble-skipped')).toEqual([]);
  });
});

describe('line ends', () => {
  it.each([
    ['LF', '\n'],
    ['CRLF', '\r\n'],
    ['CR', '\r'],
  ])('%s with a leading comment', (_, newline) => {
    const text = [
      '# synthetic',
      'timestamp,dry_bulb_c,relative_humidity_pct',
      '2021-01-01T00:00Z,10,80',
      '2021-01-01T01:00Z,11,101',
      '2021-01-01T02:00Z,12,80',
    ].join(newline);
    const result = importClimateText(text);
    expect(result.ok).toBe(true);
    expect(result.mapping.headerLine).toBe(2);
    expect(result.report.issues).toContainEqual(expect.objectContaining({ kind: 'clamped-value', line: 4 }));
  });
});

describe('mixed line ends', () => {
  it('reads a file whose lines end in CRLF and LF alike, time in the last column', () => {
    const text = 'dry_bulb_c,relative_humidity_pct,timestamp\r\n10,80,2021-01-01T00:00Z\n11,81,2021-01-01T01:00Z\r\n12,82,2021-01-01T02:00Z\n';
    const result = importClimateText(text);
    expect(result.ok).toBe(true);
    expect(Array.from(result.series!.dryBulbC)).toEqual([10, 11, 12]);
  });
});
