// @ts-nocheck
import { civilFromDays, MS_PER_DAY } from '../calendar';

export interface LocalCalendar {
  /** Calendar month of each hour on the site's clock, 0 = January … 11 = December. */
  monthOfHour: Uint8Array;
  /** Day of each hour on the site's clock, as whole days since 1970-01-01. */
  dayOfHour: Int32Array;
}

/**
 * Month and day of every hour on the site's clock: the UTC instant plus the site's standard-time offset
 * (the same clock the run engine bins months and hours of day on, server/runs/new-run.ts), so a projection's
 * months and days are the months and days its runs report.
 * @param timestampsMs UTC epoch milliseconds, one per hour
 * @param utcOffsetMinutes the site's standard-time offset from UTC, minutes (e.g. 60 for UTC+01:00)
 */
export function localCalendar(timestampsMs: Float64Array, utcOffsetMinutes: number): LocalCalendar {
  if (!Number.isFinite(utcOffsetMinutes) || Math.abs(utcOffsetMinutes) > 18 * 60) {
    throw new RangeError(`utcOffsetMinutes must be between -1080 and 1080 minutes (got ${utcOffsetMinutes})`);
  }
  const n = timestampsMs.length;
  const offsetMs = utcOffsetMinutes * 60_000;
  const monthOfHour = new Uint8Array(n);
  const dayOfHour = new Int32Array(n);
  const civil = { year: 0, month: 0, day: 0 };
  let currentDay = Number.NaN;
  for (let i = 0; i < n; i++) {
    const day = Math.floor((timestampsMs[i] + offsetMs) / MS_PER_DAY);
    // Hours come in order, so the calendar is worked out once a day.
    if (day !== currentDay) {
      currentDay = day;
      civilFromDays(day, civil);
    }
    monthOfHour[i] = civil.month - 1;
    dayOfHour[i] = day;
  }
  return { monthOfHour, dayOfHour };
}
