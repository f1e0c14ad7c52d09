/**
 * Typical-year files: one year of hours whose months come from different calendar years
 * (each month picked as the most typical of a long record). Read at their real dates they
 * scatter over decades; re-dated into one year they are the continuous year they stand for.
 */
// @ts-nocheck

import { civilFromDays as civilInto } from '../calendar';
import { daysFromCivil, MS_PER_DAY } from './time-cells';

/** Calendar parts of a day number (one object per call: this runs once per row of a one-year file). */
function civilFromDays(days: number): { year: number; month: number; day: number } {
  const civil = { year: 0, month: 0, day: 0 };
  civilInto(days, civil);
  return civil;
}

function isLeap(year: number): boolean {
  return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
}

export interface TypicalYear {
  /** The calendar years the rows come from, ascending. */
  sourceYears: number[];
  /** The year every row is placed in. */
  year: number;
}

/**
 * Whether local wall times (ms, as if UTC) look like a typical year: about one year of rows
 * (8,000–8,800), from two or more calendar years, spread over more than 400 days or going back
 * in time, and with each (month, day, hour) at most once (≤ 1 % repeats). Returns the years and
 * the year to place the rows in (the first row's year, or 2000/2001 when 29 February says otherwise).
 */
export function detectTypicalYear(localMs: Float64Array, count: number): TypicalYear | null {
  if (count < 8000 || count > 8800) return null;
  const years = new Map<number, number>();
  const seen = new Uint8Array(13 * 32 * 25);
  let repeats = 0;
  let backwards = false;
  let hasLeapDay = false;
  let min = Infinity;
  let max = -Infinity;
  for (let i = 0; i < count; i++) {
    const t = localMs[i];
    if (i > 0 && t < localMs[i - 1]) backwards = true;
    if (t < min) min = t;
    if (t > max) max = t;
    const days = Math.floor(t / MS_PER_DAY);
    const { year, month, day } = civilFromDays(days);
    const hour = Math.floor((t - days * MS_PER_DAY) / 3_600_000);
    years.set(year, (years.get(year) ?? 0) + 1);
    // 29 February 00:00 alone is hour 24 of the 28th in an hour-ending file, not a leap day
    if (month === 2 && day === 29 && hour > 0) hasLeapDay = true;
    const key = (month * 32 + day) * 25 + hour;
    if (seen[key]) repeats++;
    else seen[key] = 1;
  }
  if (years.size < 2 || repeats > count * 0.01) return null;
  if (!backwards && max - min <= 400 * MS_PER_DAY) return null;
  const first = civilFromDays(Math.floor(localMs[0] / MS_PER_DAY)).year;
  const year = isLeap(first) === hasLeapDay ? first : hasLeapDay ? 2000 : 2001;
  return { sourceYears: [...years.keys()].sort((a, b) => a - b), year };
}

/** Local ms of the same wall time in another year (29 February only into a leap year). */
export function intoYear(localMs: number, year: number): number {
  const days = Math.floor(localMs / MS_PER_DAY);
  const { month, day } = civilFromDays(days);
  return daysFromCivil(year, month, day) * MS_PER_DAY + (localMs - days * MS_PER_DAY);
}

/**
 * The year each month's rows come from (January first; null for a month with no rows; the most
 * frequent year where a month has rows from several), for local wall times (ms as if UTC).
 * `hourEnding` counts a stamp in the hour it ends (24:00 on 31 January is still January).
 */
export function sourceYearByMonth(localMs: Float64Array, count: number, hourEnding: boolean): (number | null)[] {
  const tally = Array.from({ length: 12 }, () => new Map<number, number>());
  const shift = hourEnding ? 1 : 0;
  for (let i = 0; i < count; i++) {
    const { year, month } = civilFromDays(Math.floor((localMs[i] - shift) / MS_PER_DAY));
    tally[month - 1].set(year, (tally[month - 1].get(year) ?? 0) + 1);
  }
  return tally.map((years) => {
    let best: number | null = null;
    for (const [year, n] of years) if (best === null || n > (years.get(best) ?? 0)) best = year;
    return best;
  });
}
