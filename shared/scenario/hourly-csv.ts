/**
 * The hourly results as CSV, one row per hour in series order, written straight into byte
 * buffers: a 30-year series is 262,800 rows, and building a string per row through a stream is
 * several times slower than filling a Uint8Array with digits.
 * Cells are numbers, fixed mode words and ISO timestamps only, so nothing can be read as a
 * spreadsheet formula.
 */
import { civilFromDays, MS_PER_DAY, MS_PER_HOUR } from '../calendar';
import { MODE, MODE_NAMES } from './classify';
import type { ScenarioRun, ScenarioSeries } from './run';

export const HOURLY_CSV_COLUMNS = [
  'timestamp',
  'mode',
  'dry_bulb_c',
  'wet_bulb_c',
  'dew_point_c',
  'relative_humidity_pct',
  'humidity_ratio_gkg',
  'enthalpy_kjkg',
  'mechanical_fraction',
  'humidified',
  'local_standard_time',
] as const;

/** Columns a hybrid run's hourly file adds after HOURLY_CSV_COLUMNS: each loop's mode and the liquid loop's compressor share. */
export const HYBRID_HOURLY_CSV_COLUMNS = ['liquid_mode', 'air_mode', 'liquid_mechanical_fraction'] as const;

/** A hybrid run's per-loop hours, for the columns HYBRID_HOURLY_CSV_COLUMNS. */
export interface HybridHourlyColumns {
  liquidModes: Uint8Array;
  airModes: Uint8Array;
  liquidMechanicalFraction: Float64Array;
}

export interface HourlyCsvInput {
  timestampsMs: Float64Array;
  modes: Uint8Array;
  dryBulbC: Float64Array;
  wetBulbC: Float64Array;
  dewPointC: Float64Array;
  rhPct: Float64Array;
  /** kg/kg; written as g/kg. */
  humidityRatio: Float64Array;
  enthalpyKJPerKg: Float64Array;
  mechanicalFraction: Float64Array;
  /** 1 for a free-cooling hour with humidification; null for runs made before engine 2.0.0 (empty cells). */
  humidified: Uint8Array | null;
  /** The site's standard-time offset from UTC, minutes: local_standard_time is the hour's start on that clock. */
  utcOffsetMinutes: number;
  /** A hybrid run's loops (their columns follow the others); absent or null for a single system. */
  loops?: HybridHourlyColumns | null;
}

/** The hourly CSV's columns from the series a run was given and the run itself (its states and per-hour outcome). */
export function hourlyCsvInput(
  series: ScenarioSeries,
  run: Pick<ScenarioRun, 'states'> & {
    classification: Pick<ScenarioRun['classification'], 'modes' | 'mechanicalFraction'> & { humidified: Uint8Array | null };
  },
  utcOffsetMinutes = 0,
  loops: HybridHourlyColumns | null = null,
): HourlyCsvInput {
  return {
    timestampsMs: series.timestampsMs,
    modes: run.classification.modes,
    dryBulbC: series.dryBulbC,
    wetBulbC: run.states.wetBulbC,
    dewPointC: run.states.dewPointC,
    rhPct: run.states.rhPct,
    humidityRatio: run.states.humidityRatio,
    enthalpyKJPerKg: run.states.enthalpyKJPerKg,
    mechanicalFraction: run.classification.mechanicalFraction,
    humidified: run.classification.humidified,
    utcOffsetMinutes,
    loops,
  };
}

/** A run's loop columns for the hourly file: from a hybrid run's loops; null for a single system. */
export function hybridHourlyColumns(run: Pick<ScenarioRun, 'loops'>): HybridHourlyColumns | null {
  if (!run.loops) return null;
  return {
    liquidModes: run.loops.liquid.classification.modes,
    airModes: run.loops.air.classification.modes,
    liquidMechanicalFraction: run.loops.liquid.classification.mechanicalFraction,
  };
}

const ROWS_PER_CHUNK = 8192;
// Longest row: 17 (timestamp) + 10 (mode) + 7 numbers of at most 24 bytes + 1 flag + 16 (local standard time) + 11 separators.
const MAX_ROW_BYTES = 17 + 10 + 7 * 24 + 1 + 16 + 11;
// A hybrid row adds two modes, a number and three separators.
const MAX_HYBRID_EXTRA_BYTES = 2 * 10 + 24 + 3;
const COMMA = 44;
const NEWLINE = 10;
const MINUS = 45;
const DOT = 46;
const ZERO = 48;
const ONE = 49;
const POW10 = [1, 10, 100, 1000, 10_000];
/** 10^k for k = 0…9, the thresholds of a 32-bit integer's digit count. */
const POW10_INT = [1, 10, 100, 1000, 10_000, 100_000, 1_000_000, 10_000_000, 100_000_000, 1_000_000_000];
const encoder = new TextEncoder();
const MODE_BYTES = MODE_NAMES.map((name) => encoder.encode(name));

/** The two ASCII digits of 0…99: PAIRS[2k] and PAIRS[2k + 1] are those of k. */
const PAIRS = new Uint8Array(200);
for (let k = 0; k < 100; k++) {
  PAIRS[2 * k] = ZERO + ((k / 10) | 0);
  PAIRS[2 * k + 1] = ZERO + (k % 10);
}

/**
 * Writes x with `decimals` (0–4) digits after the point into buf at pos and returns the new position.
 * NaN writes nothing (an empty cell). Half-way cases round away from zero.
 */
export function writeFixed(buf: Uint8Array, pos: number, x: number, decimals: number): number {
  if (x - x !== 0) return pos; // NaN or ±Infinity: empty cell
  const negative = x < 0;
  const rounded = Math.round(negative ? -x * POW10[decimals] : x * POW10[decimals]);
  if (rounded > 2_147_483_647) {
    // Beyond 32-bit integer digits; rare enough to go through the string formatter.
    const bytes = encoder.encode(x.toFixed(decimals));
    buf.set(bytes, pos);
    return pos + bytes.length;
  }
  // a 32-bit integer from here, so the divisions below are integer ones
  let scaled = rounded | 0;
  if (negative && scaled !== 0) buf[pos++] = MINUS;
  // The digits of `scaled`, at least decimals + 1 of them (a leading 0 before the point), written from the right,
  // two at a time.
  let digits = decimals + 1;
  while (digits < 10 && scaled >= POW10_INT[digits]) digits++;
  const end = decimals > 0 ? pos + digits + 1 : pos + digits;
  let at = end;
  let fraction = decimals;
  for (; fraction >= 2; fraction -= 2) {
    const hundredth = (scaled / 100) | 0;
    const pair = (scaled - hundredth * 100) << 1;
    buf[--at] = PAIRS[pair + 1];
    buf[--at] = PAIRS[pair];
    scaled = hundredth;
  }
  if (fraction === 1) {
    const tenth = (scaled / 10) | 0;
    buf[--at] = ZERO + scaled - tenth * 10;
    scaled = tenth;
  }
  if (decimals > 0) buf[--at] = DOT;
  while (at - pos >= 2) {
    const hundredth = (scaled / 100) | 0;
    const pair = (scaled - hundredth * 100) << 1;
    buf[--at] = PAIRS[pair + 1];
    buf[--at] = PAIRS[pair];
    scaled = hundredth;
  }
  if (at > pos) buf[pos] = ZERO + scaled; // the one digit left, at pos
  return end;
}

const twoDigits = (buf: Uint8Array, pos: number, value: number): void => {
  const tens = (value / 10) | 0;
  buf[pos] = ZERO + tens;
  buf[pos + 1] = ZERO + value - tens * 10;
};

/** "YYYY-MM-DDT" of the last day written, reused while the day does not change. */
interface DayPrefix {
  days: number;
  bytes: Uint8Array;
  civil: { year: number; month: number; day: number };
}

/** Writes "YYYY-MM-DDTHH:MMZ" (UTC) for epoch ms; 17 bytes. Years 0–9999. */
function writeTimestamp(buf: Uint8Array, pos: number, ms: number, prefix: DayPrefix): number {
  const days = Math.floor(ms / MS_PER_DAY);
  const p = prefix.bytes;
  if (days !== prefix.days) {
    prefix.days = days;
    const civil = prefix.civil;
    civilFromDays(days, civil);
    twoDigits(p, 0, (civil.year / 100) | 0);
    twoDigits(p, 2, civil.year % 100);
    p[4] = MINUS;
    twoDigits(p, 5, civil.month);
    p[7] = MINUS;
    twoDigits(p, 8, civil.day);
    p[10] = 84; // T
  }
  for (let k = 0; k < 11; k++) buf[pos + k] = p[k];
  const withinDayMs = ms - days * MS_PER_DAY;
  const hour = (withinDayMs / MS_PER_HOUR) | 0;
  const minute = ((withinDayMs - hour * MS_PER_HOUR) / 60_000) | 0;
  twoDigits(buf, pos + 11, hour);
  buf[pos + 13] = 58; // :
  twoDigits(buf, pos + 14, minute);
  buf[pos + 16] = 90; // Z
  return pos + 17;
}

/**
 * Formats the hourly CSV (header first) and hands it over in chunks of bytes. One buffer is reused
 * for every chunk, so the receiver must write or copy the bytes before it returns.
 */
export function writeHourlyCsv(input: HourlyCsvInput, onChunk: (bytes: Uint8Array) => void): void {
  const n = input.modes.length;
  for (const key of Object.keys(input) as (keyof HourlyCsvInput)[]) {
    if (key === 'loops') continue;
    const column = input[key] as ArrayLike<number> | number | null;
    if (column === null || typeof column === 'number') continue;
    if (column.length !== n) throw new RangeError(`${key} has ${column.length} hours, modes has ${n}`);
  }
  const loops = input.loops ?? null;
  if (loops) {
    for (const [key, column] of Object.entries(loops) as [string, ArrayLike<number>][]) {
      if (column.length !== n) throw new RangeError(`loops.${key} has ${column.length} hours, modes has ${n}`);
    }
  }
  const offsetMs = input.utcOffsetMinutes * 60_000;
  if (!Number.isFinite(offsetMs) || Math.abs(input.utcOffsetMinutes) > 18 * 60)
    throw new RangeError(`utcOffsetMinutes must be within ±1080, got ${input.utcOffsetMinutes}`);
  const header = loops ? [...HOURLY_CSV_COLUMNS, ...HYBRID_HOURLY_CSV_COLUMNS] : HOURLY_CSV_COLUMNS;
  onChunk(encoder.encode(`${header.join(',')}\n`));
  const buf = new Uint8Array(Math.min(n, ROWS_PER_CHUNK) * (MAX_ROW_BYTES + (loops ? MAX_HYBRID_EXTRA_BYTES : 0)));
  const clocks: RowClocks = { offsetMs, utc: newDayPrefix(), local: newDayPrefix() };
  for (let start = 0; start < n; start += ROWS_PER_CHUNK) {
    const end = Math.min(n, start + ROWS_PER_CHUNK);
    onChunk(buf.subarray(0, writeRows(buf, input, start, end, clocks)));
  }
}

/** The site's clock offset and the day prefixes of both timestamp columns, carried from one chunk to the next. */
interface RowClocks {
  offsetMs: number;
  utc: DayPrefix;
  local: DayPrefix;
}

const newDayPrefix = (): DayPrefix => ({ days: Number.NaN, bytes: new Uint8Array(11), civil: { year: 0, month: 0, day: 0 } });

/**
 * Rows start…end − 1 into buf from position 0; returns the bytes written. The row loop alone, apart from the chunk
 * hand-over: its optimised code is made once, while the first chunk is written, and serves every later chunk.
 */
function writeRows(buf: Uint8Array, input: HourlyCsvInput, start: number, end: number, clocks: RowClocks): number {
  // the columns as locals: the row loop reads them 262,800 times for 30 years
  const { timestampsMs, modes, dryBulbC, wetBulbC, dewPointC, rhPct, humidityRatio, enthalpyKJPerKg, mechanicalFraction, humidified } = input;
  const loops = input.loops ?? null;
  const { offsetMs, utc, local } = clocks;
  let pos = 0;
  for (let i = start; i < end; i++) {
    const ms = timestampsMs[i];
    const stampAt = pos;
    pos = writeTimestamp(buf, pos, ms, utc);
    buf[pos++] = COMMA;
    const mode = modes[i];
    const modeBytes = MODE_BYTES[mode];
    for (let k = 0; k < modeBytes.length; k++) buf[pos++] = modeBytes[k];
    buf[pos++] = COMMA;
    pos = writeFixed(buf, pos, dryBulbC[i], 2);
    buf[pos++] = COMMA;
    pos = writeFixed(buf, pos, wetBulbC[i], 2);
    buf[pos++] = COMMA;
    pos = writeFixed(buf, pos, dewPointC[i], 2);
    buf[pos++] = COMMA;
    pos = writeFixed(buf, pos, rhPct[i], 2);
    buf[pos++] = COMMA;
    pos = writeFixed(buf, pos, humidityRatio[i] * 1000, 3);
    buf[pos++] = COMMA;
    pos = writeFixed(buf, pos, enthalpyKJPerKg[i], 2);
    buf[pos++] = COMMA;
    const hasData = mode !== MODE.noData;
    if (hasData) pos = writeFixed(buf, pos, mechanicalFraction[i], 3);
    buf[pos++] = COMMA;
    if (hasData && humidified !== null) buf[pos++] = humidified[i] === 1 ? ONE : ZERO;
    buf[pos++] = COMMA;
    // the same stamp on the site's standard time, without the Z: on UTC itself a copy of the first 16 bytes
    if (offsetMs === 0) {
      for (let k = 0; k < 16; k++) buf[pos + k] = buf[stampAt + k];
      pos += 16;
    } else pos = writeTimestamp(buf, pos, ms + offsetMs, local) - 1;
    if (loops) {
      buf[pos++] = COMMA;
      const liquidBytes = MODE_BYTES[loops.liquidModes[i]];
      buf.set(liquidBytes, pos);
      pos += liquidBytes.length;
      buf[pos++] = COMMA;
      const airBytes = MODE_BYTES[loops.airModes[i]];
      buf.set(airBytes, pos);
      pos += airBytes.length;
      buf[pos++] = COMMA;
      if (hasData) pos = writeFixed(buf, pos, loops.liquidMechanicalFraction[i], 3);
    }
    buf[pos++] = NEWLINE;
  }
  return pos;
}
