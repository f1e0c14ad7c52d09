/**
 * Rows (UTC ms plus SI values) onto a strictly hourly grid: rows sharing an hour are averaged
 * (sub-hourly data), short runs of incomplete hours are filled by linear interpolation, longer
 * runs are left missing. Typed arrays throughout, one pass each.
 */
import { HOUR_FLAG } from './types';
import { MS_PER_HOUR } from './time-cells';

export interface RowColumns {
  count: number;
  timeMs: Float64Array;
  dryBulbC: Float64Array;
  humidity: Float64Array;
  pressurePa: Float64Array | null;
  line: Int32Array;
  /** 1 for rows left out (duplicates). */
  dropped: Uint8Array;
}

export interface HourGrid {
  /** Epoch hour (UTC ms / 3 600 000) of the first grid hour. */
  startHour: number;
  hours: number;
  dryBulbC: Float64Array;
  humidity: Float64Array;
  pressurePa: Float64Array | null;
  /** Rows that fell in each hour (saturating at 65 535). */
  rowsInHour: Uint16Array;
  /** Line of the last row in each hour, 0 when none. */
  lastLine: Int32Array;
}

/** Row indices in time order, or null when the rows already are in order. */
export function timeOrder(rows: RowColumns): Uint32Array | null {
  const t = rows.timeMs;
  let sorted = true;
  for (let i = 1; i < rows.count; i++) {
    if (t[i] < t[i - 1]) {
      sorted = false;
      break;
    }
  }
  if (sorted) return null;
  const order = new Uint32Array(rows.count);
  for (let i = 0; i < rows.count; i++) order[i] = i;
  // stable on ties so the first of two duplicates in the file stays first
  return order.sort((a, b) => t[a] - t[b] || a - b);
}

/** First and last hour (UTC ms / 1 h, after shiftMs) holding a row; NaN when there is none. */
export function hourRange(rows: RowColumns, shiftMs: number): { first: number; last: number } {
  let first = Infinity;
  let last = -Infinity;
  for (let i = 0; i < rows.count; i++) {
    if (rows.dropped[i]) continue;
    const hour = Math.floor((rows.timeMs[i] + shiftMs) / MS_PER_HOUR);
    if (hour < first) first = hour;
    if (hour > last) last = hour;
  }
  return Number.isFinite(first) ? { first, last } : { first: NaN, last: NaN };
}

/**
 * Averages the rows into hours [floor((t + shiftMs) / 1 h)] over the range from hourRange (the
 * caller checks its length first: the grid is allocated whole). NaN cells do not count in an
 * hour's mean; an hour with none stays NaN.
 */
export function averageToHours(rows: RowColumns, shiftMs: number, range: { first: number; last: number }): HourGrid {
  const first = range.first;
  const hours = Number.isFinite(first) ? range.last - first + 1 : 0;
  if (hours === rows.count && isOneRowPerHour(rows, shiftMs, first)) return rowsAsHours(rows, first);
  const sumDry = new Float64Array(hours);
  const sumHum = new Float64Array(hours);
  const sumPres = rows.pressurePa ? new Float64Array(hours) : null;
  const nDry = new Uint32Array(hours);
  const nHum = new Uint32Array(hours);
  const nPres = new Uint32Array(rows.pressurePa ? hours : 0);
  const rowsInHour = new Uint16Array(hours);
  const lastLine = new Int32Array(hours);
  for (let i = 0; i < rows.count; i++) {
    if (rows.dropped[i]) continue;
    const h = Math.floor((rows.timeMs[i] + shiftMs) / MS_PER_HOUR) - first;
    if (rowsInHour[h] < 65535) rowsInHour[h]++;
    if (rows.line[i] > lastLine[h]) lastLine[h] = rows.line[i];
    const d = rows.dryBulbC[i];
    if (d === d) {
      sumDry[h] += d;
      nDry[h]++;
    }
    const w = rows.humidity[i];
    if (w === w) {
      sumHum[h] += w;
      nHum[h]++;
    }
    if (sumPres && rows.pressurePa) {
      const p = rows.pressurePa[i];
      if (p === p) {
        sumPres[h] += p;
        nPres[h]++;
      }
    }
  }
  for (let h = 0; h < hours; h++) {
    sumDry[h] = nDry[h] > 0 ? sumDry[h] / nDry[h] : NaN;
    sumHum[h] = nHum[h] > 0 ? sumHum[h] / nHum[h] : NaN;
    if (sumPres) sumPres[h] = nPres[h] > 0 ? sumPres[h] / nPres[h] : NaN;
  }
  return { startHour: first, hours, dryBulbC: sumDry, humidity: sumHum, pressurePa: sumPres, rowsInHour, lastLine };
}

/** Whether row i falls in hour first + i for every row (none left out): an hourly file with no gap, repeat or disorder. */
function isOneRowPerHour(rows: RowColumns, shiftMs: number, first: number): boolean {
  const { timeMs, dropped } = rows;
  for (let i = 0; i < rows.count; i++) {
    if (dropped[i] !== 0 || Math.floor((timeMs[i] + shiftMs) / MS_PER_HOUR) - first !== i) return false;
  }
  return true;
}

/**
 * The grid of rows that are already one per hour (isOneRowPerHour), in the rows' own columns: the mean of one value
 * is 0 + the value, as averageToHours computes it (−0 becomes 0), so the grid is the same number for number, without
 * a second set of columns to fill (each 30-year column is 2 MB of fresh memory).
 */
function rowsAsHours(rows: RowColumns, first: number): HourGrid {
  const hours = rows.count;
  const dryBulbC = rows.dryBulbC.subarray(0, hours);
  const humidity = rows.humidity.subarray(0, hours);
  const pressurePa = rows.pressurePa ? rows.pressurePa.subarray(0, hours) : null;
  for (let h = 0; h < hours; h++) {
    dryBulbC[h] = 0 + dryBulbC[h];
    humidity[h] = 0 + humidity[h];
  }
  if (pressurePa) for (let h = 0; h < hours; h++) pressurePa[h] = 0 + pressurePa[h];
  return { startHour: first, hours, dryBulbC, humidity, pressurePa, rowsInHour: new Uint16Array(hours).fill(1), lastLine: rows.line.subarray(0, hours) };
}

function complete(grid: HourGrid, h: number): boolean {
  const d = grid.dryBulbC[h];
  const w = grid.humidity[h];
  if (d !== d || w !== w) return false;
  if (grid.pressurePa) {
    const p = grid.pressurePa[h];
    if (p !== p) return false;
  }
  return true;
}

/** The grid cut to its first and last complete hours; null when no hour is complete. */
export function trimToCompleteHours(grid: HourGrid): HourGrid | null {
  let a = 0;
  while (a < grid.hours && !complete(grid, a)) a++;
  if (a === grid.hours) return null;
  let b = grid.hours - 1;
  while (b > a && !complete(grid, b)) b--;
  if (a === 0 && b === grid.hours - 1) return grid;
  return {
    startHour: grid.startHour + a,
    hours: b - a + 1,
    dryBulbC: grid.dryBulbC.slice(a, b + 1),
    humidity: grid.humidity.slice(a, b + 1),
    pressurePa: grid.pressurePa ? grid.pressurePa.slice(a, b + 1) : null,
    rowsInHour: grid.rowsInHour.slice(a, b + 1),
    lastLine: grid.lastLine.slice(a, b + 1),
  };
}

export interface GapRun {
  /** First and last incomplete hour index of the run. */
  from: number;
  to: number;
  filled: boolean;
}

export interface GapSummary {
  flags: Uint8Array;
  filledHours: number;
  missingHours: number;
  runs: GapRun[];
  gaps: number;
  longestGapHours: number;
}

/** Fills NaN cells strictly between `before` and `after` linearly between their nearest finite neighbours. */
export function interpolate(values: Float64Array, before: number, after: number): void {
  let known = before;
  for (let h = before + 1; h <= after; h++) {
    if (values[h] !== values[h]) continue;
    if (h - known > 1) {
      const a = values[known];
      const slope = (values[h] - a) / (h - known);
      for (let k = known + 1; k < h; k++) values[k] = a + slope * (k - known);
    }
    known = h;
  }
}

/**
 * Flags each hour and repairs runs of incomplete hours: a run of at most maxGapHours between
 * two complete hours is filled by linear interpolation in time, each quantity between its nearest
 * measured values (measured cells inside the run are kept), a longer run is set missing with every value NaN. The grid must start and end on a
 * complete hour (trimToCompleteHours). Runs are returned for the report (at most `listRuns`).
 */
export function fillGaps(grid: HourGrid, maxGapHours: number, listRuns = 200): GapSummary {
  const flags = new Uint8Array(grid.hours);
  const runs: GapRun[] = [];
  let filledHours = 0;
  let missingHours = 0;
  let gaps = 0;
  let longest = 0;
  let h = 0;
  while (h < grid.hours) {
    if (complete(grid, h)) {
      h++;
      continue;
    }
    const from = h;
    while (h < grid.hours && !complete(grid, h)) h++;
    const to = h - 1;
    const length = to - from + 1;
    gaps++;
    if (length > longest) longest = length;
    const fill = length <= maxGapHours;
    if (fill) {
      interpolate(grid.dryBulbC, from - 1, to + 1);
      interpolate(grid.humidity, from - 1, to + 1);
      if (grid.pressurePa) interpolate(grid.pressurePa, from - 1, to + 1);
      flags.fill(HOUR_FLAG.filled, from, to + 1);
      filledHours += length;
    } else {
      grid.dryBulbC.fill(NaN, from, to + 1);
      grid.humidity.fill(NaN, from, to + 1);
      grid.pressurePa?.fill(NaN, from, to + 1);
      flags.fill(HOUR_FLAG.missing, from, to + 1);
      missingHours += length;
    }
    if (runs.length < listRuns) runs.push({ from, to, filled: fill });
  }
  return { flags, filledHours, missingHours, runs, gaps, longestGapHours: longest };
}
