// @ts-nocheck
import { describe, expect, it } from 'vitest';
import {
  fixedOffsetZone,
  intlTimeZoneName,
  isKnownTimeZone,
  standardDay,
  standardOffsetMinutes,
  standardTimeIso,
  standardYear,
  utcOffsetLabel,
  wallClockReader,
  wallClockText,
} from '../../shared/time-zone';

// Offsets as published in the IANA time-zone database (Etc/GMT zones carry the POSIX inverted sign:
// "Etc/GMT+7" is seven hours WEST of Greenwich, i.e. UTC−07:00; tz database file `etcetera`).
describe('one time-zone helper for IANA names and fixed offsets', () => {
  it('accepts fixed offsets that Intl refuses', () => {
    expect(() => new Intl.DateTimeFormat('en', { timeZone: 'UTC-07:00' })).toThrow(RangeError);
    for (const zone of ['UTC-07:00', 'UTC+05:30', 'UTC+00:00', 'Europe/Oslo', 'America/Phoenix']) expect(isKnownTimeZone(zone)).toBe(true);
    for (const zone of ['UTC+15:00', 'Mars/Olympus', '', 'UTC+05:75']) expect(isKnownTimeZone(zone)).toBe(false);
  });

  it('maps a whole-hour offset to the Etc/GMT name with the sign inverted', () => {
    expect(intlTimeZoneName('UTC-07:00')).toBe('Etc/GMT+7');
    expect(intlTimeZoneName('UTC+03:00')).toBe('Etc/GMT-3');
    expect(intlTimeZoneName('UTC+00:00')).toBe('UTC');
    expect(intlTimeZoneName('Europe/Oslo')).toBe('Europe/Oslo');
    // Half-hour offsets have no Etc/GMT zone.
    expect(intlTimeZoneName('UTC+05:30')).toBeNull();
    // The mapped name really is seven hours behind UTC: 12:00 UTC is 05:00 on its clock.
    const phoenixStandard = new Intl.DateTimeFormat('en-GB', {
      timeZone: intlTimeZoneName('UTC-07:00')!,
      hour: '2-digit',
      minute: '2-digit',
      hourCycle: 'h23',
    });
    expect(phoenixStandard.format(Date.UTC(2021, 0, 1, 12))).toBe('05:00');
  });

  it('reads wall clocks of fixed offsets, half hours included, as Intl does for the matching IANA zones', () => {
    const at = Date.UTC(2021, 0, 1, 0, 0);
    expect(wallClockText(wallClockReader('UTC-07:00')(at))).toBe('2020-12-31 17:00');
    // Asia/Kolkata keeps UTC+05:30 all year (IANA tz database).
    expect(wallClockText(wallClockReader('UTC+05:30')(at))).toBe('2021-01-01 05:30');
    expect(wallClockText(wallClockReader('Asia/Kolkata')(at))).toBe('2021-01-01 05:30');
    expect(wallClockText(wallClockReader('America/Phoenix')(at))).toBe(wallClockText(wallClockReader('UTC-07:00')(at)));
    // Oslo in July: summer time, UTC+02:00 (EU summer-time directive 2000/84/EC).
    expect(wallClockText(wallClockReader('Europe/Oslo')(Date.UTC(2021, 6, 1, 12)))).toBe('2021-07-01 14:00');
  });

  it('gives standard offsets, labels and standard-time days and years', () => {
    expect(standardOffsetMinutes('UTC+05:30')).toBe(330);
    expect(standardOffsetMinutes('Europe/Oslo')).toBe(60);
    expect(utcOffsetLabel(-420)).toBe('UTC−07:00');
    expect(utcOffsetLabel(0)).toBe('UTC');
    expect(fixedOffsetZone(330)).toBe('UTC+05:30');
    expect(fixedOffsetZone(-420)).toBe('UTC-07:00');
    // 2022-01-01 05:00 UTC is 2021-12-31 22:00 at UTC−07:00: still the old year on the site's clock.
    const t = Date.UTC(2022, 0, 1, 5);
    expect(standardTimeIso(t, -420)).toBe('2021-12-31T22:00');
    expect(standardDay(t, -420)).toBe('2021-12-31');
    expect(standardYear(t, -420)).toBe(2021);
    expect(standardTimeIso(Date.UTC(2021, 0, 1, 0), 330)).toBe('2021-01-01T05:30');
  });
});
