// @ts-nocheck
import type { LocalCalendar } from './local-days';

/** A local day counts towards the monthly means of daily maxima and minima when it has at least this many hours of data. */
export const MIN_HOURS_PER_DAY = 18;

export interface MonthlyDayStatistics {
  /** <x0>_m: mean of every hour with data in month m (index 0 = January); NaN for a month without data. */
  mean: Float64Array;
  /** <x0max>_m: mean over the month's days of each day's maximum. */
  meanDailyMax: Float64Array;
  /** <x0min>_m: mean over the month's days of each day's minimum. */
  meanDailyMin: Float64Array;
  /** Hours with data per month. */
  hours: Float64Array;
  /** Days whose maxima and minima entered the means, per month. */
  days: Float64Array;
}

/**
 * The monthly statistics the morphing equations of Belcher, Hacker and Powell (2005) use: the monthly
 * mean <x0>_m and the monthly means of the daily maxima <x0max>_m and minima <x0min>_m, over every year
 * of the series. Days are the site's local days (localCalendar). A day enters the daily-extreme means
 * only if it has MIN_HOURS_PER_DAY hours of data (our rule, so a day cut by a gap or the file's ends
 * does not pull the mean maximum down); a month where no day reaches that uses every day with data.
 * Missing hours (NaN) are skipped. Hours must be in time order.
 */
export function monthlyDayStatistics(values: Float64Array, calendar: LocalCalendar, minHoursPerDay = MIN_HOURS_PER_DAY): MonthlyDayStatistics {
  const { monthOfHour, dayOfHour } = calendar;
  if (monthOfHour.length !== values.length) {
    throw new RangeError(`values has ${values.length} hours but the calendar has ${monthOfHour.length}`);
  }
  const hours = new Float64Array(12);
  const sum = new Float64Array(12);
  // Sums over complete days [0..11] and over every day with data [12..23].
  const maxSum = new Float64Array(24);
  const minSum = new Float64Array(24);
  const dayCount = new Float64Array(24);

  let day = Number.NaN;
  let month = 0;
  let dayHours = 0;
  let dayMax = -Infinity;
  let dayMin = Infinity;
  const closeDay = () => {
    if (dayHours === 0) return;
    if (dayHours >= minHoursPerDay) {
      maxSum[month] += dayMax;
      minSum[month] += dayMin;
      dayCount[month]++;
    }
    maxSum[month + 12] += dayMax;
    minSum[month + 12] += dayMin;
    dayCount[month + 12]++;
  };
  for (let i = 0; i < values.length; i++) {
    if (dayOfHour[i] !== day) {
      closeDay();
      day = dayOfHour[i];
      month = monthOfHour[i];
      dayHours = 0;
      dayMax = -Infinity;
      dayMin = Infinity;
    }
    const v = values[i];
    if (v !== v) continue;
    hours[month]++;
    sum[month] += v;
    dayHours++;
    if (v > dayMax) dayMax = v;
    if (v < dayMin) dayMin = v;
  }
  closeDay();

  const mean = new Float64Array(12);
  const meanDailyMax = new Float64Array(12);
  const meanDailyMin = new Float64Array(12);
  const days = new Float64Array(12);
  for (let m = 0; m < 12; m++) {
    mean[m] = hours[m] ? sum[m] / hours[m] : Number.NaN;
    const s = dayCount[m] ? m : m + 12;
    days[m] = dayCount[s];
    meanDailyMax[m] = dayCount[s] ? maxSum[s] / dayCount[s] : Number.NaN;
    meanDailyMin[m] = dayCount[s] ? minSum[s] / dayCount[s] : Number.NaN;
  }
  return { mean, meanDailyMax, meanDailyMin, hours, days };
}
