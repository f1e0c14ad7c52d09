/**
 * Calendar fields of epoch milliseconds without a Date object per hour: the days-to-civil
 * algorithm of H. Hinnant, "chrono-Compatible Low-Level Date Algorithms" (proleptic Gregorian).
 */
// @ts-nocheck


export const MS_PER_HOUR = 3_600_000;
export const MS_PER_DAY = 86_400_000;

/** Short English month names, January first: month m (1–12) is MONTH_SHORT[m - 1]. */
export const MONTH_SHORT = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'] as const;

/** Year, month 1–12 and day 1–31 of a count of days since 1970-01-01. Writes into `into` to avoid allocation. */
export function civilFromDays(days: number, into: { year: number; month: number; day: number }): void {
  const z = days + 719_468;
  const era = Math.floor(z / 146_097);
  const doe = z - era * 146_097;
  const yoe = Math.floor((doe - Math.floor(doe / 1460) + Math.floor(doe / 36_524) - Math.floor(doe / 146_096)) / 365);
  const doy = doe - (365 * yoe + Math.floor(yoe / 4) - Math.floor(yoe / 100));
  const mp = Math.floor((5 * doy + 2) / 153);
  into.day = doy - Math.floor((153 * mp + 2) / 5) + 1;
  into.month = mp < 10 ? mp + 3 : mp - 9;
  into.year = yoe + era * 400 + (into.month <= 2 ? 1 : 0);
}
