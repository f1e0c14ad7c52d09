/**
 * Data shaping for the carpet plot: hours binned into a 366-day × 24-hour grid on a leap-year
 * calendar (so 1 March is always day 61 and dates line up across years), averaged over the years
 * for temperatures or reduced to the most frequent mode for mode codes.
 */
import { civilFromDays, MS_PER_DAY, MS_PER_HOUR } from '../../../shared/calendar';

export const CARPET_DAYS = 366;
export const HOURS_PER_DAY = 24;
/** Mode codes as stored per hour: 0 free cooling, 1 adiabatic assist, 2 mechanical, 3 no data. */
export const MODE_CODES = 4;
export const NO_DATA_MODE = 3;
/** 0-based index of 29 February on the leap-year calendar. */
export const LEAP_DAY_INDEX = 59;

// Day of a leap year on which each month starts (0-based): Jan 0, Feb 31, Mar 60 …
const leapMonthStart = [0, 31, 60, 91, 121, 152, 182, 213, 244, 274, 305, 335];

export interface CarpetGrid {
  kind: 'temperature' | 'mode';
  /** Per cell (day × 24 + hour): the mean value over the years, or the dominant mode code; NaN when empty. */
  cells: Float64Array;
  /** Hours that fell in each cell. */
  counts: Uint32Array;
  /** Distinct calendar years in the series. */
  years: number;
  /** Whether any hour fell on 29 February; without one, the chart leaves that day's column out. */
  leapDay: boolean;
}

/**
 * Cell of one timestamp: day of the leap-year calendar × 24 + hour of day, after shifting by the
 * site's offset from UTC. Returns -1 for a non-finite timestamp. Writes the civil year to `civil`.
 */
export function carpetCell(timestampMs: number, offsetMs: number, civil: { year: number; month: number; day: number }): number {
  if (!Number.isFinite(timestampMs)) return -1;
  const local = timestampMs + offsetMs;
  const days = Math.floor(local / MS_PER_DAY);
  const hour = Math.floor((local - days * MS_PER_DAY) / MS_PER_HOUR);
  civilFromDays(days, civil);
  const dayOfYear = leapMonthStart[civil.month - 1] + civil.day - 1;
  return dayOfYear * HOURS_PER_DAY + hour;
}

/**
 * Bins an hourly series into the carpet grid. Temperatures: mean of finite values per cell.
 * Modes: the most frequent of the codes 0–2 per cell, or 3 (no data) when a cell has only 3 or NaN.
 * One pass over the hours, no object per hour.
 */
export function carpetBins(timestampsMs: ArrayLike<number>, values: ArrayLike<number>, kind: 'temperature' | 'mode', utcOffsetMinutes = 0): CarpetGrid {
  if (timestampsMs.length !== values.length) {
    throw new RangeError(`values has ${values.length} hours but timestampsMs has ${timestampsMs.length}`);
  }
  const size = CARPET_DAYS * HOURS_PER_DAY;
  const offsetMs = utcOffsetMinutes * 60_000;
  const counts = new Uint32Array(size);
  const sums = new Float64Array(size);
  const modeCounts = kind === 'mode' ? new Uint32Array(size * MODE_CODES) : null;
  const seenYears = new Set<number>();
  const civil = { year: 0, month: 0, day: 0 };
  for (let i = 0; i < timestampsMs.length; i++) {
    const cell = carpetCell(timestampsMs[i], offsetMs, civil);
    if (cell < 0) continue;
    seenYears.add(civil.year);
    const v = values[i];
    if (modeCounts) {
      const code = v >= 0 && v < NO_DATA_MODE && v === Math.floor(v) ? v : NO_DATA_MODE;
      modeCounts[cell * MODE_CODES + code]++;
      counts[cell]++;
    } else if (v === v) {
      sums[cell] += v;
      counts[cell]++;
    }
  }
  const cells = new Float64Array(size).fill(Number.NaN);
  for (let c = 0; c < size; c++) {
    if (!counts[c]) continue;
    if (!modeCounts) {
      cells[c] = sums[c] / counts[c];
      continue;
    }
    let best = NO_DATA_MODE;
    let bestCount = 0;
    for (let m = 0; m < NO_DATA_MODE; m++) {
      const n = modeCounts[c * MODE_CODES + m];
      if (n > bestCount) {
        best = m;
        bestCount = n;
      }
    }
    cells[c] = best;
  }
  let leapDay = false;
  for (let h = 0; h < HOURS_PER_DAY; h++) leapDay ||= counts[LEAP_DAY_INDEX * HOURS_PER_DAY + h] > 0;
  return { kind, cells, counts, years: seenYears.size, leapDay };
}

export interface CarpetSummaryRow {
  /** 1–12 */
  month: number;
  /** Temperatures: mean per 4-hour band (6 bands). Modes: hours per mode code (4 entries). */
  values: number[];
}

/** The text alternative of the carpet: per month, means in 4-hour bands, or hours per mode. */
export function carpetSummary(
  timestampsMs: ArrayLike<number>,
  values: ArrayLike<number>,
  kind: 'temperature' | 'mode',
  utcOffsetMinutes = 0,
): CarpetSummaryRow[] {
  const columns = kind === 'mode' ? MODE_CODES : 6;
  const sums = new Float64Array(12 * columns);
  const counts = new Uint32Array(12 * columns);
  const offsetMs = utcOffsetMinutes * 60_000;
  const civil = { year: 0, month: 0, day: 0 };
  for (let i = 0; i < timestampsMs.length; i++) {
    const cell = carpetCell(timestampsMs[i], offsetMs, civil);
    if (cell < 0) continue;
    const m = civil.month - 1;
    const v = values[i];
    if (kind === 'mode') {
      const code = v >= 0 && v < NO_DATA_MODE && v === Math.floor(v) ? v : NO_DATA_MODE;
      counts[m * columns + code]++;
    } else if (v === v) {
      const band = Math.floor((cell % HOURS_PER_DAY) / 4);
      sums[m * columns + band] += v;
      counts[m * columns + band]++;
    }
  }
  const rows: CarpetSummaryRow[] = [];
  for (let m = 0; m < 12; m++) {
    const row: number[] = [];
    for (let c = 0; c < columns; c++) {
      const n = counts[m * columns + c];
      row.push(kind === 'mode' ? n : n ? sums[m * columns + c] / n : Number.NaN);
    }
    if (row.some((v) => v === v && (kind !== 'mode' || v > 0))) rows.push({ month: m + 1, values: row });
  }
  return rows;
}
