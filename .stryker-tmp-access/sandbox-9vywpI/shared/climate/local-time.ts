/**
 * Local wall-clock time in an IANA zone or a fixed offset to UTC, through Intl (no time-zone data of our own;
 * zones and offsets are read by shared/time-zone.ts).
 * Intl is slow (some 10 µs a call), so offsets come from a per-year table of the zone's changes.
 */
// @ts-nocheck

import { fixedOffsetMs, wallClockReader } from '../time-zone';
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
