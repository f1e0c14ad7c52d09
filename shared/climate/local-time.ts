/**
 * Local wall-clock time in an IANA zone to UTC, through Intl (no time-zone data of our own).
 * Offsets are cached per local day; only the days holding a daylight-saving change are
 * resolved hour by hour, so a 30-year file costs some 22,000 Intl calls, not 262,800.
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

/** Whether Intl knows the zone; false for anything else. */
export function isKnownTimeZone(timeZone: string): boolean {
  try {
    new Intl.DateTimeFormat('en-US', { timeZone });
    return true;
  } catch {
    return false;
  }
}

function offsetReader(timeZone: string): (utcMs: number) => number {
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
    let year = 0;
    let month = 0;
    let day = 0;
    let hour = 0;
    let minute = 0;
    let second = 0;
    for (const part of format.formatToParts(utcMs)) {
      const value = Number(part.value);
      if (part.type === 'year') year = value;
      else if (part.type === 'month') month = value;
      else if (part.type === 'day') day = value;
      else if (part.type === 'hour') hour = value;
      else if (part.type === 'minute') minute = value;
      else if (part.type === 'second') second = value;
    }
    const wall = Date.UTC(year, month - 1, day, hour, minute, second);
    return wall - Math.floor(utcMs / 1000) * 1000;
  };
}

/** A converter for one zone (must be known: check with isKnownTimeZone first). */
export function createLocalToUtc(timeZone: string): LocalToUtc {
  const offsetAt = offsetReader(timeZone);
  // local day number → offset ms for the whole day, or NaN when the offset changes within it
  const dayOffsets = new Map<number, number>();
  const ambiguousSeen = new Set<number>();

  const converter: LocalToUtc = {
    lastEvent: null,
    toUtc(localMs: number): number {
      converter.lastEvent = null;
      const day = Math.floor(localMs / MS_PER_DAY);
      let dayOffset = dayOffsets.get(day);
      if (dayOffset === undefined) {
        const startOffset = offsetAt(day * MS_PER_DAY - offsetAt(day * MS_PER_DAY));
        const endLocal = (day + 1) * MS_PER_DAY;
        const endOffset = offsetAt(endLocal - offsetAt(endLocal));
        dayOffset = startOffset === endOffset ? startOffset : NaN;
        dayOffsets.set(day, dayOffset);
      }
      if (!Number.isNaN(dayOffset)) return localMs - dayOffset;
      return resolveOnChangeDay(localMs);
    },
  };

  function resolveOnChangeDay(localMs: number): number {
    const before = offsetAt(localMs - MS_PER_DAY);
    const after = offsetAt(localMs + MS_PER_DAY);
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
