/** Date and time cells read by character codes, checked against Date.UTC (ECMAScript's proleptic Gregorian calendar). */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { daysFromCivil, lastParse, MS_PER_DAY, parseDateCell, parseDateTimeCell, parseIntegerCell, parseTimeCell } from '../../../shared/climate/time-cells';
import { createLocalToUtc } from '../../../shared/climate/local-time';
import { fixedOffsetMs } from '../../../shared/time-zone';

describe('daysFromCivil', () => {
  it('agrees with Date.UTC on every day from 1600 to 2400', () => {
    let mismatches = 0;
    for (let ms = Date.UTC(1600, 0, 1); ms <= Date.UTC(2400, 11, 31); ms += MS_PER_DAY) {
      const d = new Date(ms);
      if (daysFromCivil(d.getUTCFullYear(), d.getUTCMonth() + 1, d.getUTCDate()) * MS_PER_DAY !== ms) mismatches++;
    }
    expect(mismatches).toBe(0);
  });
});

describe('parseDateTimeCell', () => {
  it.each([
    ['2021-03-01T13:00', Date.UTC(2021, 2, 1, 13), NaN],
    ['2021-03-01T13:00:00Z', Date.UTC(2021, 2, 1, 13), 0],
    ['2021-03-01 13:30:15.250+01:00', Date.UTC(2021, 2, 1, 13, 30, 15, 250), 60],
    ['2021-03-01T13:00-0330', Date.UTC(2021, 2, 1, 13), -210],
    ['2021/03/01 13:00', Date.UTC(2021, 2, 1, 13), NaN],
    ['20210301T1300', NaN, NaN], // compact times only in a time-only cell
    ['2021-02-29T00:00', NaN, NaN], // 2021 is not a leap year
    ['2020-02-29T24:00', Date.UTC(2020, 2, 1, 0), NaN], // 24:00 = midnight at the end of the day
    ['2020-02-29T24:30', NaN, NaN],
    ['2021-03-01T13:00 UTC', Date.UTC(2021, 2, 1, 13), 0],
    ['  2021-03-01T13:00Z  ', Date.UTC(2021, 2, 1, 13), 0],
    ['2021-03-01T13:00Zjunk', NaN, NaN],
  ])('%s', (cell, expected, offset) => {
    const ms = parseDateTimeCell(cell, 'YMD');
    expect(ms).toBe(expected);
    if (!Number.isNaN(expected)) expect(lastParse.offsetMinutes).toBe(offset);
  });

  it('reads day-first and month-first dates by the given order', () => {
    expect(parseDateTimeCell('02.03.2021 06:00', 'DMY')).toBe(Date.UTC(2021, 2, 2, 6));
    expect(parseDateTimeCell('02/03/2021 06:00', 'MDY')).toBe(Date.UTC(2021, 1, 3, 6));
    expect(parseDateTimeCell('31/12/2021 06:00', 'MDY')).toBeNaN();
  });
});

describe('date-only, time-only and integer cells', () => {
  it('parseDateCell accepts a bare date and a spreadsheet-style midnight, nothing else', () => {
    expect(parseDateCell('2021-03-01', 'YMD')).toBe(Date.UTC(2021, 2, 1));
    expect(parseDateCell('20210301', 'YMD')).toBe(Date.UTC(2021, 2, 1));
    expect(parseDateCell('01.03.2021 00:00', 'DMY')).toBe(Date.UTC(2021, 2, 1));
    expect(parseDateCell('01.03.2021 01:00', 'DMY')).toBeNaN();
    expect(parseDateCell('12.5', 'DMY')).toBeNaN();
  });
  it('parseTimeCell reads hh:mm, hh:mm:ss, hhmm and whole hours', () => {
    expect(parseTimeCell('13:00')).toBe(13 * 3_600_000);
    expect(parseTimeCell('7:05:30')).toBe(7 * 3_600_000 + 5 * 60_000 + 30_000);
    expect(parseTimeCell('1300')).toBe(13 * 3_600_000);
    expect(parseTimeCell('24')).toBe(MS_PER_DAY);
    expect(parseTimeCell('25:00')).toBeNaN();
    expect(parseTimeCell('12:60')).toBeNaN();
  });
  it('parseIntegerCell reads whole numbers only', () => {
    expect(parseIntegerCell(' 24 ')).toBe(24);
    expect(parseIntegerCell('60.0')).toBe(60);
    expect(parseIntegerCell('6.5')).toBeNaN();
    expect(parseIntegerCell('-1')).toBeNaN();
  });
});

describe('createLocalToUtc', () => {
  // transition instants from the IANA tz database rules for the EU (last Sunday of March and October, 01:00 UTC)
  const warsaw = () => createLocalToUtc('Europe/Warsaw');
  it('converts ordinary winter and summer hours', () => {
    const z = warsaw();
    expect(z.toUtc(Date.UTC(2021, 0, 15, 12))).toBe(Date.UTC(2021, 0, 15, 11));
    expect(z.toUtc(Date.UTC(2021, 6, 15, 12))).toBe(Date.UTC(2021, 6, 15, 10));
  });
  it('reads a nonexistent spring hour with the offset before the change and says so', () => {
    const z = warsaw();
    expect(z.toUtc(Date.UTC(2021, 2, 28, 2, 30))).toBe(Date.UTC(2021, 2, 28, 1, 30));
    expect(z.lastEvent?.kind).toBe('nonexistent');
  });
  it('gives a repeated autumn hour its first, then its second instant', () => {
    const z = warsaw();
    const local = Date.UTC(2021, 9, 31, 2, 30);
    expect(z.toUtc(local)).toBe(Date.UTC(2021, 9, 31, 0, 30));
    expect(z.lastEvent?.kind).toBe('ambiguous');
    expect(z.toUtc(local)).toBe(Date.UTC(2021, 9, 31, 1, 30));
  });
  it('handles zones without daylight saving and with half-hour offsets', () => {
    expect(createLocalToUtc('America/Phoenix').toUtc(Date.UTC(2021, 6, 1, 12))).toBe(Date.UTC(2021, 6, 1, 19));
    expect(createLocalToUtc('Asia/Kolkata').toUtc(Date.UTC(2021, 6, 1, 12))).toBe(Date.UTC(2021, 6, 1, 6, 30));
  });
});

describe('fixed offsets for files in local standard time', () => {
  it.each([
    ['UTC-07:00', Date.UTC(2021, 6, 1, 19)],
    ['UTC+5', Date.UTC(2021, 6, 1, 7)],
    ['+0530', Date.UTC(2021, 6, 1, 6, 30)],
    ['GMT−03:00', Date.UTC(2021, 6, 1, 15)],
  ])('%s', (zone, utc) => {
    expect(createLocalToUtc(zone).toUtc(Date.UTC(2021, 6, 1, 12))).toBe(utc);
  });
});

describe('fixedOffsetMs', () => {
  it('refuses what is not an offset', () => {
    for (const text of ['UTC05', 'A5', 'UTC+15', 'Europe/Paris', '']) expect(fixedOffsetMs(text)).toBeNaN();
  });
});

describe('12-hour clock', () => {
  it.each([
    ['1/2/2021 12:00 AM', Date.UTC(2021, 0, 2, 0)],
    ['1/2/2021 12:30:00 PM', Date.UTC(2021, 0, 2, 12, 30)],
    ['1/2/2021 1:00 p.m.', Date.UTC(2021, 0, 2, 13)],
    ['1/2/2021 11:00am', Date.UTC(2021, 0, 2, 11)],
    ['1/2/2021 13:00 PM', NaN],
  ])('%s', (cell, expected) => {
    expect(parseDateTimeCell(cell, 'MDY')).toBe(expected);
  });
  it('in a time-only cell', () => {
    expect(parseTimeCell('7:00 PM')).toBe(19 * 3_600_000);
  });
});
