// @ts-nocheck
import { civilFromDays, MS_PER_DAY } from '../calendar';

export interface MonthlyStat {
  /** 1..12 */
  month: number;
  hours: number;
  min: number;
  mean: number;
  max: number;
}

/**
 * Min, mean and max of a column per calendar month (UTC month of each hour's timestamp, shifted by
 * `offsetMs` for the site's standard time), over every year in the file. Missing hours are skipped.
 */
export function monthlyStats(timestampsMs: Float64Array, values: Float64Array, offsetMs = 0): MonthlyStat[] {
  const n = new Float64Array(12);
  const sum = new Float64Array(12);
  const min = new Float64Array(12).fill(Infinity);
  const max = new Float64Array(12).fill(-Infinity);
  const civil = { year: 0, month: 0, day: 0 };
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (v !== v) continue;
    civilFromDays(Math.floor((timestampsMs[i] + offsetMs) / MS_PER_DAY), civil);
    const m = civil.month - 1;
    n[m]++;
    sum[m] += v;
    if (v < min[m]) min[m] = v;
    if (v > max[m]) max[m] = v;
  }
  return Array.from({ length: 12 }, (_, m) => ({
    month: m + 1,
    hours: n[m],
    min: n[m] ? min[m] : NaN,
    mean: n[m] ? sum[m] / n[m] : NaN,
    max: n[m] ? max[m] : NaN,
  }));
}
