/**
 * The other published layouts through the one importer, without flags: header-block CSVs
 * (time(UTC), T2m, RH, SP), fixed-width hourly station records (tenths, −9999) and typical-year
 * CSVs with a station line. All fixtures are synthetic (tests/fixtures/weather/README.md). Unit
 * factors: 0.1 °C and 0.1 hPa per count as the layouts define them; the standard atmosphere is
 * ASHRAE Handbook—Fundamentals 2017 ch. 1 eq. 3.
 */
// @ts-nocheck

import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { importClimateText } from '../../../shared/climate';

const fixture = (name: string) => readFileSync(path.resolve(import.meta.dirname, '../../fixtures/weather', name), 'utf8');
const BLOCK = fixture('synthetic-header-block.csv');
const STATION = fixture('synthetic-station-records.txt');
const STATION_LINE = fixture('synthetic-station-line.csv');

describe('header-block CSVs', () => {
  it('reads the header block, the UTC times, T2m, RH and SP, and stops at the legend', () => {
    const { ok, series, report, mapping } = importClimateText(BLOCK);
    expect(ok).toBe(true);
    expect(mapping.format?.id).toBe('header-block-csv');
    expect(report.fileHeader).toMatchObject({ line: 2, latitude: 46.125, longitude: 9.875, elevationM: 412, utcOffsetHours: null });
    expect(report.timeZone).toBe('UTC');
    const s = series!;
    expect(s.timestampsMs.length).toBe(72);
    // line 20: 20110130:0000,-4.03,85.10,…,96200 → the first hour of the typical year's 30 January, UTC
    expect(s.timestampsMs[0]).toBe(Date.UTC(2001, 0, 30, 0));
    expect(s.dryBulbC[0]).toBe(-4.03);
    expect(s.humidity.kind).toBe('relative-humidity-pct');
    expect(s.humidity.values[0]).toBe(85.1);
    expect(s.pressurePa![0]).toBe(96200);
    expect(report.typicalYear).toEqual({ year: 2001, sourceYearByMonth: [2011, 2007, null, null, null, null, null, null, null, null, null, null] });
    expect(report.issues).toContainEqual(expect.objectContaining({ kind: 'legend-skipped', line: 92 }));
  });

  it('reads an hourly (non-typical) series stamped ten minutes past the hour onto whole hours', () => {
    const text = BLOCK.replace(/^2011(\d{4}):(\d{2})00/gm, '2011$1:$210').replace(/^2007(\d{4}):(\d{2})00,.*\r?\n/gm, '');
    const { ok, series, report } = importClimateText(text);
    expect(ok).toBe(true);
    expect(report.typicalYear).toBeNull();
    expect(series!.timestampsMs[0]).toBe(Date.UTC(2011, 0, 30, 0));
    expect(series!.timestampsMs.length).toBe(48);
  });

  it('names a time that is not yyyymmdd:hhmm, an hour 25 and a row with too few fields', () => {
    const lines = BLOCK.split('\r\n');
    lines[20] = '2011013:0100,-3.9,84,0,0,0,250,2.1,180,96215';
    lines[21] = '20110130:2500,-3.9,84,0,0,0,250,2.1,180,96215';
    lines[22] = '20110130:0300,-3.9';
    const { ok, report } = importClimateText(lines.join('\r\n'));
    expect(ok).toBe(true);
    const messages = report.issues.filter((i) => i.kind === 'unparsable-time').map((i) => i.message);
    expect(messages).toEqual([
      'time "2011013:0100" on line 21 is not written yyyymmdd:hhmm; the row is left out.',
      'hour 25 on line 22: times run 00:00–23:59 (UTC); the row is left out.',
      'Line 23: 2 fields, expected 10 as in the column header; the row is left out.',
    ]);
  });

  it('refuses a header block without a time(UTC) header, and a header without T2m, naming what is missing', () => {
    const noHeader = importClimateText(BLOCK.replace('time(UTC),', 'timestamp,'));
    expect(noHeader.ok).toBe(false);
    expect(noHeader.report.summary).toContain('no column header starting "time(UTC)"');
    const noT2m = importClimateText(BLOCK.replace('time(UTC),T2m,', 'time(UTC),T10m,'));
    expect(noT2m.ok).toBe(false);
    expect(noT2m.report.summary).toContain('has no T2m (dry-bulb °C) column');
  });

  it('warns about data rows after the legend started instead of reading them silently', () => {
    const text = BLOCK.replace('T2m: 2-m air temperature', '20110205:0000,1,80,0,0,0,250,2,180,96000\r\nT2m: 2-m air temperature');
    const { report } = importClimateText(text);
    expect(report.issues).toContainEqual(expect.objectContaining({ kind: 'legend-skipped', severity: 'warning', line: 93 }));
  });
});

describe('fixed-width hourly station records', () => {
  it('reads tenths of °C, UTC hours and −9999 as missing; no station pressure, so the site elevation sets it', () => {
    const { ok, series, report, mapping } = importClimateText(STATION);
    expect(ok).toBe(true);
    expect(mapping.format?.id).toBe('fixed-width-station');
    const s = series!;
    expect(s.timestampsMs.length).toBe(72);
    // line 1: "2019 12 31 00    55    20 10180 …" → 5.5 °C dry-bulb, 2.0 °C dew point at 2019-12-31 00:00 UTC
    expect(s.timestampsMs[0]).toBe(Date.UTC(2019, 11, 31, 0));
    expect(s.dryBulbC[0]).toBeCloseTo(5.5, 12);
    expect(s.humidity.kind).toBe('dew-point-c');
    expect(s.humidity.values[0]).toBeCloseTo(2.0, 12);
    // sea-level pressure (10180 = 1018.0 hPa) is not station pressure: not taken
    expect(s.pressurePa).toBeNull();
    expect(report.issues).toContainEqual(expect.objectContaining({ kind: 'pressure-from-elevation' }));
    expect(report.issues).toContainEqual(expect.objectContaining({ kind: 'missing-value-marker', line: 11, value: '-9999' }));
    expect(s.flags[10]).toBe(1);
    expect(report.years).toEqual([2019, 2020]);
    expect(report.typicalYear).toBeNull();
  });

  it('refuses sea-level pressure as station pressure even when a person picks it', () => {
    const { ok, report } = importClimateText(STATION, { mapping: { pressure: { column: 6, unit: 'hPa' } } });
    expect(ok).toBe(false);
    expect(report.summary).toContain('cannot be used as station pressure: it is sea-level pressure');
  });

  it('names an hour 25 and a line with another field count', () => {
    const lines = STATION.split('\n');
    lines[9] = '2019 12 31 25    40    10 10182   202    33     4     0 -9999';
    lines[12] = '2019 12 31 12    40    10 10182   202    33     4     0';
    const messages = importClimateText(lines.join('\n'))
      .report.issues.filter((i) => i.kind === 'unparsable-time')
      .map((i) => i.message);
    expect(messages[0]).toBe('hour 25 on line 10: hours run 0–23 (UTC); the line is left out.');
    expect(messages[1]).toMatch(/^Line 13: 11 fields, expected 12 \(year month day hour/);
  });

  it('joins several years in one text and reads them in time order', () => {
    const next = STATION.replace(/^2020 01 0([12])/gm, '2021 01 0$1').replace(/^2019 12 31/gm, '2020 12 31');
    const { ok, report } = importClimateText(next);
    expect(ok).toBe(true);
    expect(report.years).toEqual([2020, 2021]);
  });
});

describe('typical-year CSVs with a station line above the header (read as before)', () => {
  it('skips the station line as a note, reads its station data into the header and the hour-ending times', () => {
    const { ok, series, report, mapping } = importClimateText(STATION_LINE, { timeZone: 'UTC-07:00' });
    expect(ok).toBe(true);
    expect(mapping.format ?? null).toBeNull();
    expect(report.fileHeader).toMatchObject({
      line: 2,
      stationId: '999002',
      name: 'QUELLMOOR SYNTHETIC (INVENTED)',
      latitude: 39.25,
      longitude: -104.5,
      elevationM: 1650,
      utcOffsetHours: -7,
    });
    const s = series!;
    expect(s.timestampsMs.length).toBe(72);
    // 01/31/2002 01:00 at UTC−7 is the hour ending 08:00 UTC, stored by its start, 07:00 UTC
    expect(s.timestampsMs[0]).toBe(Date.UTC(2002, 0, 31, 7));
    expect(s.dryBulbC[0]).toBe(-6.2);
    expect(s.humidity.values[0]).toBe(-10.1);
    // 835 mbar = 83 500 Pa
    expect(s.pressurePa![0]).toBe(83500);
    expect(report.years).toEqual([2002]);
    expect(report.issues.filter((i) => i.kind === 'format-header')).toEqual([]);
  });

  it('warns when the file is read at another offset than its station line gives', () => {
    const { report } = importClimateText(STATION_LINE, { timeZone: 'America/Denver' });
    expect(report.issues).toContainEqual(expect.objectContaining({ kind: 'format-header', line: 2 }));
  });
});
