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
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (v !== v) continue;
    const m = monthOfEpochDay(Math.floor((timestampsMs[i] + offsetMs) / 86_400_000)) - 1;
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

/**
 * Calendar month (1..12) of a day counted from 1970-01-01, without a Date object
 * (H. Hinnant, "chrono-compatible low-level date algorithms", civil_from_days).
 */
export function monthOfEpochDay(epochDay: number): number {
  const z = epochDay + 719_468;
  const era = Math.floor(z / 146_097);
  const doe = z - era * 146_097;
  const yoe = Math.floor((doe - Math.floor(doe / 1460) + Math.floor(doe / 36_524) - Math.floor(doe / 146_096)) / 365);
  const doy = doe - (365 * yoe + Math.floor(yoe / 4) - Math.floor(yoe / 100));
  const mp = Math.floor((5 * doy + 2) / 153);
  return mp < 10 ? mp + 3 : mp - 9;
}
