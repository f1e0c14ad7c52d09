/**
 * EPW files through the one importer, recognised without flags. Field positions, the hour-ending
 * 1–24 convention, local standard time at the LOCATION offset and the missing codes (99.9, 999,
 * 999999) follow the EPW data dictionary (EnergyPlus "Auxiliary Programs", weather file format;
 * recalled from memory). The fixture is synthetic (tests/fixtures/weather/README.md).
 */
// @ts-nocheck

import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { importClimateText } from '../../../shared/climate';
import { headerMismatches } from '../../../shared/climate/formats/site-check';

const FIXTURE = readFileSync(path.resolve(import.meta.dirname, '../../fixtures/weather/synthetic-typical-year.epw'), 'utf8');
const LINES = FIXTURE.split('\r\n');
const HEADER = LINES.slice(0, 8);
const HOUR_MS = 3_600_000;
/** The fixture's LOCATION offset, UTC+1. */
const OFFSET_MS = HOUR_MS;

/** An EPW text of whole days from `days` ([year, month, day] each), the same synthetic values every hour. */
function epwText(days: [number, number, number][], header = HEADER): string {
  const records: string[] = [];
  for (const [y, m, d] of days) {
    for (let h = 1; h <= 24; h++) records.push(`${y},${m},${d},${h},60,flags,${(5 + h / 10).toFixed(1)},1.0,70,98500,0,0,0`);
  }
  return [...header, ...records].join('\n');
}

/** Every day of a year, taking each month's days from `yearOfMonth(month)`. */
function yearOfDays(yearOfMonth: (month: number) => number): [number, number, number][] {
  const days: [number, number, number][] = [];
  for (let m = 1; m <= 12; m++) {
    const year = yearOfMonth(m);
    const length = new Date(Date.UTC(2001, m, 0)).getUTCDate();
    for (let d = 1; d <= length; d++) days.push([year, m, d]);
  }
  return days;
}

const issues = (text: string, kind?: string) => importClimateText(text).report.issues.filter((i) => !kind || i.kind === kind);

describe('EPW files', () => {
  it('reads the synthetic fixture: header, local standard time, hour ending, values and missing codes', () => {
    const { ok, series, report, mapping } = importClimateText(FIXTURE);
    expect(ok).toBe(true);
    expect(mapping.format?.id).toBe('epw');
    expect(report.fileHeader).toEqual({
      line: 1,
      name: 'Quellmoor Synthetic Station',
      region: 'Nordmark',
      country: 'Invented Land',
      source: 'SYNTHETIC',
      stationId: '999001',
      latitude: 51.25,
      longitude: 7.125,
      elevationM: 250,
      utcOffsetHours: 1,
    });
    expect(report.timeZone).toBe('UTC+01:00');
    const s = series!;
    expect(s.timestampsMs.length).toBe(72);
    // record 1: 31 January hour 1 = the hour ending 01:00 at UTC+1, i.e. 00:00 UTC, stored by its start
    // (23:00 UTC on the 30th); placed in the typical year 2001
    expect(s.timestampsMs[0]).toBe(Date.UTC(2001, 0, 30, 23));
    expect(s.timestampsMs[71]).toBe(Date.UTC(2001, 1, 2, 22));
    expect(report.issues).toContainEqual(expect.objectContaining({ kind: 'hour-ending-stamps', line: 9 }));
    expect(s.dryBulbC[0]).toBe(-1.5);
    expect(s.humidity.kind).toBe('dew-point-c');
    expect(s.humidity.values[0]).toBe(-2.7);
    expect(s.pressurePa![0]).toBe(98300);
    // line 20 writes 99.9 for its dry-bulb, line 30 999999 for its pressure: missing, then filled between neighbours
    expect(report.issues).toContainEqual(expect.objectContaining({ kind: 'missing-value-marker', line: 20, value: '99.9' }));
    expect(report.issues).toContainEqual(expect.objectContaining({ kind: 'missing-value-marker', line: 30, value: '999999' }));
    expect(s.flags[11]).toBe(1);
    expect(s.dryBulbC[11]).toBeCloseTo((s.dryBulbC[10] + s.dryBulbC[12]) / 2, 10);
    expect(s.flags[21]).toBe(1);
    expect(report.counts.filledHours).toBe(2);
  });

  it('reads a typical year as one continuous year, says so and keeps the source year of each month', () => {
    const { report } = importClimateText(FIXTURE);
    expect(report.years).toEqual([2001]);
    expect(report.typicalYear).toEqual({ year: 2001, sourceYearByMonth: [2004, 1999, null, null, null, null, null, null, null, null, null, null] });
    const note = report.issues.find((i) => i.kind === 'typical-year-restamped');
    expect(note?.message).toContain('placed in 2001');
    expect(note?.message).toContain('1999, 2004');
  });

  it('has no hour in the next year: a whole typical year of hour-ending records is 8760 hours of 2001', () => {
    const text = epwText(yearOfDays((m) => 1990 + m));
    const { ok, series, report } = importClimateText(text);
    expect(ok).toBe(true);
    expect(series!.timestampsMs.length).toBe(8760);
    expect(report.years).toEqual([2001]);
    expect(report.typicalYear?.sourceYearByMonth).toEqual([1991, 1992, 1993, 1994, 1995, 1996, 1997, 1998, 1999, 2000, 2001, 2002]);
    // every hour begins in 2001 local standard time (UTC+1): the last one ends at midnight closing 31 December
    const localStart = (i: number) => series!.timestampsMs[i] + OFFSET_MS;
    expect(new Date(localStart(0)).getUTCFullYear()).toBe(2001);
    expect(new Date(localStart(8759)).getUTCFullYear()).toBe(2001);
  });

  it('keeps an actual-year EPW (one source year) at its own dates', () => {
    const { report, series } = importClimateText(epwText(yearOfDays(() => 2019)));
    expect(report.years).toEqual([2019]);
    expect(report.typicalYear).toBeNull();
    // hour 1 of 1 January at UTC+1 starts at 00:00 local = 23:00 UTC on 31 December 2018
    expect(series!.timestampsMs[0]).toBe(Date.UTC(2018, 11, 31, 23));
    expect(report.issues.filter((i) => i.kind === 'typical-year-restamped')).toEqual([]);
  });

  it('reads relative humidity when the dew point field is missing throughout', () => {
    const text = FIXTURE.replace(/^(\d{4},\d+,\d+,\d+,60,[^,]*,[^,]*),[^,]*,/gm, '$1,99.9,');
    const { ok, mapping, series } = importClimateText(text);
    expect(ok).toBe(true);
    expect(mapping.humidity?.quantity).toBe('relative-humidity');
    expect(series!.humidity.values[0]).toBe(92);
  });

  it('takes a person’s choice of the RH field over the dew point', () => {
    const { ok, series } = importClimateText(FIXTURE, { mapping: { humidity: { column: 8, quantity: 'relative-humidity', unit: '%' } } });
    expect(ok).toBe(true);
    expect(series!.humidity.kind).toBe('relative-humidity-pct');
  });
});

describe('EPW files that are almost right', () => {
  it('names a record with too few fields and leaves it out', () => {
    const lines = [...LINES];
    lines[11] = '2004,1,31,4';
    const found = issues(lines.join('\r\n'), 'unparsable-time');
    expect(found.map((i) => i.message)).toContain(
      'EPW record 12: 4 fields, expected at least 10 (year, month, day, hour, minute, flags, dry-bulb, dew point, RH, station pressure); the record is left out.',
    );
  });

  it('names an hour outside 1–24 with its line', () => {
    const text = epwText(yearOfDays(() => 2019).slice(0, 20)).split('\n');
    const fields = text[309].split(',');
    fields[3] = '25';
    text[309] = fields.join(',');
    const found = issues(text.join('\n'), 'unparsable-time');
    expect(found).toContainEqual(expect.objectContaining({ line: 310, value: '25' }));
    expect(found[0].message).toMatch(/^hour 25 on line 310: EPW hours run 1–24/);
  });

  it('refuses a file whose LOCATION record has no readable UTC offset', () => {
    const text = FIXTURE.replace('7.125,1.0,250.0', '7.125,CET,250.0');
    const { ok, report } = importClimateText(text);
    expect(ok).toBe(false);
    expect(report.summary).toContain('EPW record 1 (LOCATION): the time zone field "CET" is not a UTC offset');
  });

  it('keeps the hours but drops a header value that is not a number, with a warning naming it', () => {
    const { ok, report } = importClimateText(FIXTURE.replace('51.250', 'north'));
    expect(ok).toBe(true);
    expect(report.fileHeader?.latitude).toBeNull();
    expect(report.issues).toContainEqual(expect.objectContaining({ kind: 'format-header', line: 1, value: 'north' }));
  });

  it('refuses sub-hourly EPW data periods and header-only files', () => {
    expect(importClimateText(FIXTURE.replace('DATA PERIODS,1,1,', 'DATA PERIODS,1,4,')).report.summary).toContain('4 records per hour');
    expect(importClimateText(HEADER.join('\n')).report.summary).toContain('no hourly records');
  });

  it('warns about a missing or unknown header record and still reads the hours', () => {
    const text = FIXTURE.replace('GROUND TEMPERATURES,0', 'GROUND TEMPS,0');
    const { ok, report } = importClimateText(text);
    expect(ok).toBe(true);
    const messages = report.issues.filter((i) => i.kind === 'format-header').map((i) => i.message);
    expect(messages.some((m) => m.startsWith('EPW record 4: "GROUND TEMPS" is not one of the eight header records'))).toBe(true);
    expect(messages.some((m) => m.includes('lacks the record GROUND TEMPERATURES'))).toBe(true);
  });

  it('refuses a file where most records are broken, rather than importing a few hours', () => {
    const lines = LINES.map((l, i) => (i >= 8 && i % 3 !== 0 ? l.split(',').slice(0, 6).join(',') : l));
    const { ok, report } = importClimateText(lines.join('\r\n'));
    expect(ok).toBe(false);
    expect(report.issues.some((i) => i.kind === 'too-many-rejected')).toBe(true);
  });
});

describe('the header against the chosen site', () => {
  const header = importClimateText(FIXTURE).report.fileHeader!;

  it('warns when the elevation differs by more than 50 m (the issue’s threshold), not at 50 m', () => {
    expect(headerMismatches(header, { elevationM: 300, timeZone: 'Europe/Berlin' })).toEqual([]);
    expect(headerMismatches(header, { elevationM: 301, timeZone: 'Europe/Berlin' }).map((m) => m.field)).toEqual(['elevationM']);
    expect(headerMismatches(header, { elevationM: 199, timeZone: 'UTC+01:00' }).map((m) => m.field)).toEqual(['elevationM']);
  });

  it('compares the offset with the zone’s standard offset (Europe/Berlin: UTC+1 in winter, +2 in summer; standard +1)', () => {
    expect(headerMismatches(header, { elevationM: 250, timeZone: 'Europe/Berlin' })).toEqual([]);
    expect(headerMismatches(header, { elevationM: 250, timeZone: 'UTC+01:00' })).toEqual([]);
    const [m] = headerMismatches(header, { elevationM: 250, timeZone: 'Europe/London' });
    expect(m.field).toBe('utcOffsetHours');
    expect(m.message).toContain('UTC+01:00');
    expect(m.message).toContain('UTC+00:00');
  });

  it('puts the warnings in the report when the import is given the site', () => {
    const { ok, report } = importClimateText(FIXTURE, { site: { elevationM: 420, timeZone: 'America/Denver' } });
    expect(ok).toBe(true);
    expect(report.issues.filter((i) => i.kind === 'header-site-mismatch')).toHaveLength(2);
  });
});
