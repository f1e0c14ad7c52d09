/**
 * Local wall-clock time in an IANA zone to UTC, through Intl (no time-zone data of our own).
 * Intl is slow (some 10 µs a call), so offsets come from a per-year table of the zone's changes.
 */
import { MS_PER_DAY } from './time-cells';

export interface LocalTimeEvent {
  kind: 'nonexistent' | 'ambiguous';
  /** Local ms of the wall time concerned. */
  localMs: number;
}

export interface LocalToUtc {
  /**
   * UTC ms of a wall time. A wall time that occurs twice (clocks going back) maps to its first
   * instant the first time it is seen and to the second instant the next time, as a file in local
   * civil time lists that hour twice. A wall time that never occurs (clocks going forward) is read
   * with the offset in force before the change.
   */
  toUtc(localMs: number): number;
  /** Set by the last toUtc call when the wall time was nonexistent or ambiguous; null otherwise. */
  lastEvent: LocalTimeEvent | null;
}

const MINUTE_MS = 60_000;
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
  return (match[1] === '+' ? 1 : -1) * (hours * 60 + minutes) * 60_000;
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

export interface WallClock {
  year: number;
  month: number;
  day: number;
  hour: number;
  minute: number;
  second: number;
}

/** Wall-clock reading of UTC instants in a zone (Intl, hours 0–23). */
export function wallClockReader(timeZone: string): (utcMs: number) => WallClock {
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

/**
 * Offset of a zone's standard time from UTC in minutes: the smaller of its offsets on 1 January and
 * 1 July of `year`, since daylight saving only ever adds. A fixed offset is its own standard time.
 */
export function standardOffsetMinutes(timeZone: string, year = 2023): number {
  const fixed = fixedOffsetMs(timeZone);
  if (!Number.isNaN(fixed)) return fixed / MINUTE_MS;
  const offsetAt = offsetReader(timeZone);
  return Math.min(offsetAt(Date.UTC(year, 0, 1)), offsetAt(Date.UTC(year, 6, 1))) / MINUTE_MS;
}

function offsetReader(timeZone: string): (utcMs: number) => number {
  const read = wallClockReader(timeZone);
  return (utcMs: number) => {
    const c = read(utcMs);
    return Date.UTC(c.year, c.month - 1, c.day, c.hour, c.minute, c.second) - Math.floor(utcMs / 1000) * 1000;
  };
}

const WEEK_MS = 7 * MS_PER_DAY;

interface YearOffsets {
  startOffset: number;
  /** Instants (UTC ms, to the minute) where the offset changes, and the offset from then on. */
  changes: { atMs: number; offset: number }[];
}

/**
 * Offsets of a zone through a table of its changes, built per UTC year from weekly samples and a
 * bisection to the minute where two samples differ: some 70 Intl calls a year instead of one per
 * hour. Changes less than a week apart (none in current rules) would be missed.
 */
function offsetTable(timeZone: string): (utcMs: number) => number {
  const exact = offsetReader(timeZone);
  const years = new Map<number, YearOffsets>();
  const build = (year: number): YearOffsets => {
    const start = Date.UTC(year, 0, 1);
    const end = Date.UTC(year + 1, 0, 1);
    const startOffset = exact(start);
    const changes: { atMs: number; offset: number }[] = [];
    let previousMs = start;
    let previousOffset = startOffset;
    for (let t = start + WEEK_MS; previousMs < end; t += WEEK_MS) {
      const at = Math.min(t, end);
      const offset = exact(at);
      if (offset !== previousOffset) {
        let low = previousMs;
        let high = at;
        while (high - low > MINUTE_MS) {
          const mid = low + Math.floor((high - low) / 2 / MINUTE_MS) * MINUTE_MS;
          if (exact(mid) === previousOffset) low = mid;
          else high = mid;
        }
        changes.push({ atMs: high, offset });
      }
      previousMs = at;
      previousOffset = offset;
    }
    return { startOffset, changes };
  };
  return (utcMs: number) => {
    const year = new Date(utcMs).getUTCFullYear();
    let table = years.get(year);
    if (!table) {
      table = build(year);
      years.set(year, table);
    }
    let offset = table.startOffset;
    for (const change of table.changes) {
      if (utcMs >= change.atMs) offset = change.offset;
      else break;
    }
    return offset;
  };
}

/** A converter for one zone or fixed offset (must be known: check with isKnownTimeZone first). */
export function createLocalToUtc(timeZone: string): LocalToUtc {
  const fixed = fixedOffsetMs(timeZone);
  if (!Number.isNaN(fixed)) return { lastEvent: null, toUtc: (localMs) => localMs - fixed };
  const offsetAt = offsetTable(timeZone);
  const ambiguousSeen = new Set<number>();

  const converter: LocalToUtc = {
    lastEvent: null,
    toUtc(localMs: number): number {
      converter.lastEvent = null;
      const before = offsetAt(localMs - MS_PER_DAY);
      const after = offsetAt(localMs + MS_PER_DAY);
      if (before === after) return localMs - before;
      return resolveNearChange(localMs, before, after);
    },
  };

  function resolveNearChange(localMs: number, before: number, after: number): number {
    const early = localMs - before;
    const late = localMs - after;
    const earlyValid = offsetAt(early) === before;
    const lateValid = offsetAt(late) === after;
    if (earlyValid && lateValid && early !== late) {
      converter.lastEvent = { kind: 'ambiguous', localMs };
      if (ambiguousSeen.has(localMs)) return Math.max(early, late);
      ambiguousSeen.add(localMs);
      return Math.min(early, late);
    }
    if (earlyValid) return early;
    if (lateValid) return late;
    converter.lastEvent = { kind: 'nonexistent', localMs };
    return early;
  }

  return converter;
}
