// @ts-nocheck
import type { ClimateSeries } from '../climate';
import { monthlyStats } from '../climate-summary/monthly';
import { bulkStates, hourlyPressurePa } from '../psychrometrics';
import { localCalendar } from './local-days';
import { monthlyDayStatistics } from './monthly-day-statistics';

export interface MonthRow {
  /** 1..12 */
  month: number;
  hours: number;
  min: number | null;
  mean: number | null;
  max: number | null;
}

export interface MonthlyClimate {
  dryBulbC: MonthRow[];
  /** Monthly means of the daily maximum and minimum dry-bulb, °C, on the site's days. */
  meanDailyMaxC: (number | null)[];
  meanDailyMinC: (number | null)[];
  dewPointC: MonthRow[];
  specificHumidityGPerKg: MonthRow[];
}

const rows = (stats: ReturnType<typeof monthlyStats>): MonthRow[] =>
  stats.map((s) => ({ month: s.month, hours: s.hours, min: s.hours ? s.min : null, mean: s.hours ? s.mean : null, max: s.hours ? s.max : null }));

/**
 * Monthly min/mean/max of dry-bulb, dew point and specific humidity on the site's months, and the monthly
 * means of daily extremes of dry-bulb: what the projection page sets side by side for parent and projection.
 * Dew point and W from the engine's bulk states (ASHRAE Handbook—Fundamentals 2017 ch. 1); q = W/(1+W), eq. 9b.
 */
export function monthlyClimate(series: ClimateSeries, utcOffsetMinutes: number, elevationM: number): MonthlyClimate {
  const offsetMs = utcOffsetMinutes * 60_000;
  const state = bulkStates({ dryBulbC: series.dryBulbC, humidity: series.humidity, pressurePa: hourlyPressurePa(series, elevationM).pressurePa });
  const q = state.humidityRatio;
  for (let i = 0; i < q.length; i++) q[i] = (1000 * q[i]) / (1 + q[i]);
  const days = monthlyDayStatistics(series.dryBulbC, localCalendar(series.timestampsMs, utcOffsetMinutes));
  const orNull = (a: Float64Array) => Array.from(a, (v) => (v === v ? v : null));
  return {
    dryBulbC: rows(monthlyStats(series.timestampsMs, series.dryBulbC, offsetMs)),
    meanDailyMaxC: orNull(days.meanDailyMax),
    meanDailyMinC: orNull(days.meanDailyMin),
    dewPointC: rows(monthlyStats(series.timestampsMs, state.dewPointC, offsetMs)),
    specificHumidityGPerKg: rows(monthlyStats(series.timestampsMs, q, offsetMs)),
  };
}
