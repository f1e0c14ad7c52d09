/**
 * The one time-zone helper of client and server. A site's time zone is an IANA name (`Europe/Oslo`,
 * with daylight saving) or a fixed offset (`UTC-07:00`, `UTC+05:30`: standard time all year). Intl
 * knows only the first kind, so every formatting or conversion of a time goes through here rather
 * than handing a site's zone to `Intl.DateTimeFormat` directly (that threw "Invalid time zone
 * specified" for fixed offsets).
 *
 * Tramontane's date convention: an hour is stored by the UTC instant it starts at; periods, years and
 * months are given on the site's standard time (its UTC offset without daylight saving).
 */
// @ts-nocheck

import { civilFromDays, MS_PER_DAY, MS_PER_HOUR } from './calendar';

const MS_PER_MINUTE = 60_000;
const FIXED_OFFSET = /^(?:UTC|GMT)?\s*([+\-\u2212])(\d{1,2})(?::?(\d{2}))?$/;

/**
 * A fixed offset written `UTC+05:00`, `UTC-7`, `+0530` or `GMT−03:00`, in ms east of UTC; NaN otherwise.
 * Files in local standard time (no daylight saving) need this rather than their region's IANA zone.
 */
export function fixedOffsetMs(timeZone: string): number {
  const match = FIXED_OFFSET.exec(timeZone.trim());
  if (!match) return NaN;
  const hours = Number(match[2]);
  const minutes = match[3] ? Number(match[3]) : 0;
  if (hours > 14 || minutes > 59) return NaN;
  return (match[1] === '+' ? 1 : -1) * (hours * 60 + minutes) * MS_PER_MINUTE;
}

/** Whether the zone is a fixed offset or an IANA name Intl knows; false for anything else. */
export function isKnownTimeZone(timeZone: string): boolean {
  if (!Number.isNaN(fixedOffsetMs(timeZone))) return true;
  try {
    new Intl.DateTimeFormat('en-US', { timeZone });
    return true;
  } catch {
    return false;
  }
}

/**
 * The name Intl accepts for a zone: an IANA name as given; a whole-hour fixed offset as `Etc/GMT±h`,
 * whose sign is inverted by POSIX convention (UTC−07:00 is `Etc/GMT+7`, UTC+03:00 is `Etc/GMT-3`);
 * null for an offset with minutes (UTC+05:30), which no `Etc/` zone covers — use wallClockReader then.
 */
export function intlTimeZoneName(timeZone: string): string | null {
  const fixed = fixedOffsetMs(timeZone);
  if (Number.isNaN(fixed)) return timeZone;
  const minutes = fixed / MS_PER_MINUTE;
  if (minutes === 0) return 'UTC';
  if (minutes % 60 !== 0) return null;
  return `Etc/GMT${minutes > 0 ? '-' : '+'}${Math.abs(minutes / 60)}`;
}

/** `UTC+05:30`, `UTC−07:00` (true minus sign), `UTC` for zero. */
export function utcOffsetLabel(minutes: number): string {
  if (!minutes) return 'UTC';
  const sign = minutes < 0 ? '−' : '+';
  const abs = Math.abs(minutes);
  return `UTC${sign}${String(Math.floor(abs / 60)).padStart(2, '0')}:${String(abs % 60).padStart(2, '0')}`;
}

/** `UTC+05:30`, `UTC-07:00`, `UTC+00:00`: an offset written so fixedOffsetMs reads it back (ASCII minus). */
export function fixedOffsetZone(minutes: number): string {
  const abs = Math.abs(Math.round(minutes));
  return `UTC${minutes < 0 ? '-' : '+'}${String(Math.floor(abs / 60)).padStart(2, '0')}:${String(abs % 60).padStart(2, '0')}`;
}

export interface WallClock {
  year: number;
  month: number;
  day: number;
  hour: number;
  minute: number;
  second: number;
}

/** Wall-clock reading of UTC instants in a zone or fixed offset (hours 0–23). */
export function wallClockReader(timeZone: string): (utcMs: number) => WallClock {
  const fixed = fixedOffsetMs(timeZone);
  if (!Number.isNaN(fixed)) return (utcMs) => clockOf(utcMs + fixed);
  const format = new Intl.DateTimeFormat('en-US', {
    timeZone,
    hourCycle: 'h23',
    year: 'numeric',
    month: 'numeric',
    day: 'numeric',
    hour: 'numeric',
    minute: 'numeric',
    second: 'numeric',
  });
  return (utcMs: number) => {
    const clock: WallClock = { year: 0, month: 0, day: 0, hour: 0, minute: 0, second: 0 };
    for (const part of format.formatToParts(utcMs)) {
      if (part.type in clock) clock[part.type as keyof WallClock] = Number(part.value);
    }
    return clock;
  };
}

/** Calendar fields of ms read as if UTC (a local time already shifted by its offset). */
function clockOf(ms: number): WallClock {
  const days = Math.floor(ms / MS_PER_DAY);
  const civil = { year: 0, month: 0, day: 0 };
  civilFromDays(days, civil);
  const withinDay = ms - days * MS_PER_DAY;
  const hour = Math.floor(withinDay / MS_PER_HOUR);
  const minute = Math.floor((withinDay - hour * MS_PER_HOUR) / MS_PER_MINUTE);
  const second = Math.floor((withinDay - hour * MS_PER_HOUR - minute * MS_PER_MINUTE) / 1000);
  return { ...civil, hour, minute, second };
}

const two = (n: number) => String(n).padStart(2, '0');

/** `YYYY-MM-DD hh:mm` of a wall clock. */
export function wallClockText(c: WallClock): string {
  return `${String(c.year).padStart(4, '0')}-${two(c.month)}-${two(c.day)} ${two(c.hour)}:${two(c.minute)}`;
}

/**
 * Offset of a zone's standard time from UTC in minutes: the smaller of its offsets on 1 January and
 * 1 July of `year`, since daylight saving only ever adds. A fixed offset is its own standard time.
 */
export function standardOffsetMinutes(timeZone: string, year = 2023): number {
  const fixed = fixedOffsetMs(timeZone);
  if (!Number.isNaN(fixed)) return fixed / MS_PER_MINUTE;
  const read = wallClockReader(timeZone);
  const offsetAt = (utcMs: number) => {
    const c = read(utcMs);
    return Date.UTC(c.year, c.month - 1, c.day, c.hour, c.minute, c.second) - utcMs;
  };
  return Math.min(offsetAt(Date.UTC(year, 0, 1)), offsetAt(Date.UTC(year, 6, 1))) / MS_PER_MINUTE;
}

/** `YYYY-MM-DDThh:mm` of a UTC instant on the site's standard time (no offset suffix): the hourly files' local_standard_time. */
export function standardTimeIso(utcMs: number, utcOffsetMinutes: number): string {
  return wallClockText(clockOf(utcMs + utcOffsetMinutes * MS_PER_MINUTE)).replace(' ', 'T');
}

/** `YYYY-MM-DD`: the day of a UTC instant on the site's standard time. */
export function standardDay(utcMs: number, utcOffsetMinutes: number): string {
  return standardTimeIso(utcMs, utcOffsetMinutes).slice(0, 10);
}

/** Calendar year of a UTC instant on the site's standard time. */
export function standardYear(utcMs: number, utcOffsetMinutes: number): number {
  return clockOf(utcMs + utcOffsetMinutes * MS_PER_MINUTE).year;
}

/** `2021-01-01 to 2023-12-31`: the days of a series' first and last hours on the site's standard time. */
export function standardPeriod(firstHourMs: number, lastHourMs: number, utcOffsetMinutes: number): string {
  return `${standardDay(firstHourMs, utcOffsetMinutes)} to ${standardDay(lastHourMs, utcOffsetMinutes)}`;
}
