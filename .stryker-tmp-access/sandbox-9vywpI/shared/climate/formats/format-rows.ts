/**
 * The part every published-format reader shares: rows whose columns the format fixes, read into
 * the importer's row columns with the same checks as any other file (ranges, saturation, missing
 * codes, reject shares), placed in one year when they are a typical year, then handed to the
 * hourly grid (hourly-series.ts) like every other import.
 */
// @ts-nocheck

import { applyMappingOverride } from '../apply-mapping';
import type { RowColumns } from '../hourly-grid';
import { moveHourEndingToStart } from '../hour-starts';
import { toHourlySeries } from '../hourly-series';
import { percent, REJECT_SHARE, round, type Context } from '../import-context';
import { parseNumberCell } from '../number-cells';
import type { Recognition } from '../recognise-columns';
import { MS_PER_DAY } from '../time-cells';
import { intoYear } from '../typical-year';
import type { ClimateSeries, ColumnMappingOverride, HumidityQuantity, QuantityAssignment, QuantityColumn, RecognisedFormat, TimeMapping } from '../types';
import { conversionToSi } from '../units';
import { checkHumidity, DRY_BULB_MAX_C, DRY_BULB_MIN_C, humidityCheck, PRESSURE_MAX_PA, PRESSURE_MIN_PA } from '../value-limits';
import { civilFromDays } from '../../calendar';

/** A column the format fixes: its header (the format's own name), what it holds and how its cells are written. */
export interface FormatColumn {
  header: string;
  /** The quantity and unit the column holds once `cellScale` is applied; absent for columns not read. */
  holds?: QuantityColumn;
  /** Multiplies each cell before the unit conversion (0.1 for tenths). Default 1. */
  cellScale?: number;
  /** Cell values the format uses for "missing". */
  missingCodes?: readonly number[];
  /** Set for a column that must not be taken as station pressure, with the reason. */
  notStationPressure?: string;
}

/** The year a typical year is placed in: a fixed common year, so every typical-year file shares one calendar (a leap year when the file holds 29 February). */
export const TYPICAL_YEAR_PLACEMENT = 2001;
export const TYPICAL_LEAP_YEAR_PLACEMENT = 2000;

interface ValueReader {
  assignment: QuantityAssignment;
  scale: number;
  offset: number;
  missing: readonly number[];
  min: number;
  max: number;
  bad: number;
}

/** Appends one warning-level row rejection (the row is left out) with the line and field named. */
export function rejectRow(ctx: Context, line: number, message: string, at: { column?: string; value?: string } = {}): void {
  ctx.counts.rowsRejected++;
  ctx.log.warning('unparsable-time', message, { line, ...at });
}

/**
 * The recognition a format implies, with the caller's overrides of the value columns laid over it
 * (the time columns and the delimiter are the format's own: an override of them is reported, not used),
 * written into the import's mapping as well.
 */
export function formatRecognition(
  format: RecognisedFormat,
  columns: FormatColumn[],
  layout: { delimiter: ',' | ';' | '\t'; headerLine: number | null; time: TimeMapping },
  chosen: { dryBulb: number; humidity: number; pressure: number | null },
  override: Partial<ColumnMappingOverride>,
  ctx: Context,
): Recognition {
  const { time } = layout;
  const headers = columns.map((c) => c.header);
  const m = ctx.mapping;
  m.delimiter = layout.delimiter;
  m.decimalSeparator = '.';
  m.headerLine = layout.headerLine;
  m.headers = headers;
  const assign = (column: number, reason: string): QuantityAssignment => ({
    ...(columns[column].holds as QuantityColumn),
    column,
    header: headers[column],
    confidence: 1,
    reason,
  });
  const why = `fixed by the ${format.name} format`;
  const recognition: Recognition = {
    time,
    dryBulb: assign(chosen.dryBulb, why),
    humidity: assign(chosen.humidity, why),
    pressure: chosen.pressure === null ? null : assign(chosen.pressure, why),
    assumedUnits: [],
    otherHumidity: [],
  };
  const { time: timeOverride, delimiter, decimalSeparator, ...values } = override;
  if (timeOverride && !sameTime(timeOverride, time, headers)) {
    ctx.log.info(
      'mapping-override-invalid',
      `The time of a ${format.name} file is fixed by the format (${time.description}); the time columns chosen are not used.`,
    );
  }
  if ((delimiter && delimiter !== ctx.mapping.delimiter) || (decimalSeparator && decimalSeparator !== '.')) {
    ctx.log.info(
      'mapping-override-invalid',
      `A ${format.name} file is read with the format's own separators; the delimiter and decimal separator chosen are not used.`,
    );
  }
  applyMappingOverride(recognition, values, headers, ctx.log);
  const p = recognition.pressure;
  if (p && columns[p.column].notStationPressure) {
    ctx.log.error('mapping-override-invalid', `Column "${p.header}" cannot be used as station pressure: ${columns[p.column].notStationPressure}`, {
      column: p.header,
    });
  }
  m.time = recognition.time;
  m.dryBulb = recognition.dryBulb;
  m.humidity = recognition.humidity;
  m.pressure = recognition.pressure;
  m.confidence = 1;
  return recognition;
}

/** Time in the first four columns (year, month, day, hour), as EPW and the station records write it. */
export function yearMonthDayHour(hourConvention: 'ending-1-24' | 'beginning-0-23', description: string): TimeMapping {
  return { layout: 'ymdh', year: 0, month: 1, day: 2, hour: 3, minute: null, hourConvention, confidence: 1, description };
}

function sameTime(o: NonNullable<ColumnMappingOverride['time']>, t: TimeMapping, headers: string[]): boolean {
  const at = (ref: string | number | null | undefined): number =>
    typeof ref === 'number' ? ref : typeof ref === 'string' ? headers.findIndex((h) => h.toLowerCase() === ref.trim().toLowerCase()) : -1;
  if (o.layout !== t.layout) return false;
  if (o.layout === 'iso' && t.layout === 'iso') return at(o.column) === t.column;
  if (o.layout === 'ymdh' && t.layout === 'ymdh') return at(o.year) === t.year && at(o.month) === t.month && at(o.day) === t.day && at(o.hour) === t.hour;
  return false;
}

/**
 * Collects the rows of a published-format file: each row's local and UTC time and its values in SI.
 * One per import; `add` does no allocation beyond what the row columns hold.
 */
export class FormatRows {
  readonly rows: RowColumns;
  private readonly localMs: Float64Array;
  private readonly dry: ValueReader;
  private readonly hum: ValueReader;
  private readonly pres: ValueReader | null;
  private readonly humidityQuantity: HumidityQuantity;

  constructor(
    capacity: number,
    columns: FormatColumn[],
    recognition: Recognition,
    private readonly ctx: Context,
  ) {
    const reader = (a: QuantityAssignment, min: number, max: number): ValueReader => {
      const c = conversionToSi(a as QuantityColumn);
      const column = columns[a.column];
      const cellScale = column?.cellScale ?? 1;
      return { assignment: a, scale: c.scale * cellScale, offset: c.offset, missing: column?.missingCodes ?? [], min, max, bad: 0 };
    };
    this.dry = reader(recognition.dryBulb!, DRY_BULB_MIN_C, DRY_BULB_MAX_C);
    this.hum = reader(recognition.humidity!, -Infinity, Infinity);
    this.pres = recognition.pressure ? reader(recognition.pressure, PRESSURE_MIN_PA, PRESSURE_MAX_PA) : null;
    this.humidityQuantity = recognition.humidity!.quantity as HumidityQuantity;
    this.localMs = new Float64Array(capacity);
    this.rows = {
      count: 0,
      timeMs: new Float64Array(capacity),
      dryBulbC: new Float64Array(capacity),
      humidity: new Float64Array(capacity),
      pressurePa: this.pres ? new Float64Array(capacity) : null,
      line: new Int32Array(capacity),
      dropped: new Uint8Array(capacity),
    };
  }

  /** The columns the readers need in a row (one past the highest). */
  neededFields(): number {
    return Math.max(this.dry.assignment.column, this.hum.assignment.column, this.pres?.assignment.column ?? 0) + 1;
  }

  private value(r: ValueReader, cell: string | undefined, line: number): number {
    const raw = cell === undefined ? NaN : parseNumberCell(cell, false);
    if (raw === raw && !r.missing.includes(raw)) {
      const si = raw * r.scale + r.offset;
      if (si >= r.min && si <= r.max) return si;
    }
    return this.oddValue(r, cell, raw, line);
  }

  /** A cell that is missing, unreadable or out of range: counted and reported (the slow path). */
  private oddValue(r: ValueReader, cell: string | undefined, raw: number, line: number): number {
    const { log, counts } = this.ctx;
    const header = r.assignment.header;
    const text = (cell ?? '').trim();
    // the importer's own sentinels (−9999 …) read as NaN: look at the number written
    const written = raw === raw ? raw : text === '' ? NaN : Number(text);
    if (written === written && r.missing.includes(written)) {
      counts.cellsUnreadable++;
      log.info('missing-value-marker', `Column "${header}" marks a missing value with ${text}, as the format does.`, { line, column: header, value: text });
      return NaN;
    }
    if (raw !== raw) {
      counts.cellsUnreadable++;
      if (written === written) {
        log.info('missing-value-marker', `Column "${header}" marks a missing value with ${text}.`, { line, column: header, value: text });
      } else {
        r.bad++;
        log.warning('unparsable-value', `"${text}" in column "${header}" is not a number; the value is treated as missing.`, {
          line,
          column: header,
          value: text,
        });
      }
      return NaN;
    }
    r.bad++;
    counts.impossibleValues++;
    log.warning('impossible-value', `${r.assignment.quantity} ${text} in column "${header}" is outside the possible range; treated as missing.`, {
      line,
      column: header,
      value: text,
    });
    return NaN;
  }

  /** Adds one row: its wall time (ms as if UTC), its UTC instant and its cells. */
  add(line: number, localMs: number, utcMs: number, cells: string[]): void {
    const { log, counts } = this.ctx;
    counts.rows++;
    const d = this.value(this.dry, cells[this.dry.assignment.column], line);
    let w = this.value(this.hum, cells[this.hum.assignment.column], line);
    if (w === w) {
      checkHumidity(this.humidityQuantity, w, d);
      const a = this.hum.assignment;
      const text = (cells[a.column] ?? '').trim();
      if (humidityCheck.verdict === 'impossible') {
        this.hum.bad++;
        counts.impossibleValues++;
        log.warning(
          'impossible-value',
          `${a.quantity} ${text} in column "${a.header}" is outside the possible range${d === d ? ` or above the dry-bulb of ${round(d)} °C` : ''}; treated as missing.`,
          {
            line,
            column: a.header,
            value: text,
          },
        );
        w = NaN;
      } else if (humidityCheck.verdict === 'clamped') {
        counts.clampedValues++;
        log.info('clamped-value', `${a.quantity} ${text} in column "${a.header}" is just past saturation; set to ${round(humidityCheck.value)}.`, {
          line,
          column: a.header,
          value: text,
        });
        w = humidityCheck.value;
      }
    }
    const i = this.rows.count++;
    this.rows.timeMs[i] = utcMs;
    this.localMs[i] = localMs;
    this.rows.dryBulbC[i] = d;
    this.rows.humidity[i] = w;
    if (this.rows.pressurePa && this.pres) this.rows.pressurePa[i] = this.value(this.pres, cells[this.pres.assignment.column], line);
    this.rows.line[i] = line;
  }

  /**
   * Checks the shares of bad rows and cells, places a typical year in one year (rows from two or
   * more years whose month, day and hour never go back), and builds the hourly series.
   */
  finish(): ClimateSeries | null {
    const { log, counts } = this.ctx;
    const rows = this.rows;
    if (counts.rows + counts.rowsRejected > 0 && counts.rowsRejected / (counts.rows + counts.rowsRejected) > REJECT_SHARE) {
      log.error(
        'too-many-rejected',
        `${counts.rowsRejected} of ${counts.rows + counts.rowsRejected} rows (${percent(counts.rowsRejected / (counts.rows + counts.rowsRejected))}) could not be read: the file is not in the layout its format expects (see the rows listed).`,
      );
    }
    if (rows.count === 0) {
      if (!log.hasErrors()) log.error('too-little-data', 'No data row could be read.');
      return null;
    }
    for (const r of [this.dry, this.hum]) {
      if (r.bad / rows.count > REJECT_SHARE) {
        log.error(
          'too-many-rejected',
          `${r.bad} of ${rows.count} cells (${percent(r.bad / rows.count)}) in column "${r.assignment.header}" are unreadable or impossible as ${r.assignment.quantity}.`,
          {
            column: r.assignment.header,
          },
        );
      }
    }
    if (this.pres && this.pres.bad / rows.count > REJECT_SHARE) {
      log.warning(
        'pressure-ignored',
        `${percent(this.pres.bad / rows.count)} of the pressure cells in column "${this.pres.assignment.header}" are unreadable or impossible; the column is ignored and pressure will come from the site elevation.`,
        {
          column: this.pres.assignment.header,
        },
      );
      this.ctx.mapping.pressure = null;
      rows.pressurePa = null;
    }
    if (log.hasErrors()) return null;
    moveHourEndingToStart(rows.timeMs, this.localMs, rows.count, rows.line[0], this.ctx);
    this.placeTypicalYear();
    return toHourlySeries(rows, this.humidityQuantity, this.ctx, false);
  }

  private placeTypicalYear(): void {
    const rows = this.rows;
    // hour-ending stamps were moved to their hour's start (hour-starts.ts): 24:00 on 31 December is 23:00, still December
    const civil = { year: 0, month: 0, day: 0 };
    const yearOfMonth: (number | null)[] = Array.from({ length: 12 }, () => null);
    let monthInTwoYears = false;
    let backwards = false;
    let leapDay = false;
    let previousKey = -Infinity;
    for (let i = 0; i < rows.count; i++) {
      const t = this.localMs[i];
      const days = Math.floor(t / MS_PER_DAY);
      civilFromDays(days, civil);
      const known = yearOfMonth[civil.month - 1];
      if (known === null) yearOfMonth[civil.month - 1] = civil.year;
      else if (known !== civil.year) monthInTwoYears = true;
      if (civil.month === 2 && civil.day === 29) leapDay = true;
      const key = (civil.month * 32 + civil.day) * MS_PER_DAY + (t - days * MS_PER_DAY);
      if (key < previousKey) backwards = true;
      previousKey = key;
    }
    const years = [...new Set(yearOfMonth.filter((y): y is number => y !== null))].sort((a, b) => a - b);
    if (years.length < 2 || monthInTwoYears || backwards) return;
    const year = leapDay ? TYPICAL_LEAP_YEAR_PLACEMENT : TYPICAL_YEAR_PLACEMENT;
    for (let i = 0; i < rows.count; i++) {
      const offset = this.localMs[i] - rows.timeMs[i];
      const local = intoYear(this.localMs[i], year);
      rows.timeMs[i] = local - offset;
    }
    this.ctx.typicalYear = { year, sourceYearByMonth: yearOfMonth };
    reportTypicalYear(this.ctx, year, years, rows.count);
  }
}

function reportTypicalYear(ctx: Context, year: number, years: number[], count: number): void {
  ctx.log.warning(
    'typical-year-restamped',
    `The file is a typical year: ${count} rows whose months come from ${years.length} different years (${years.join(', ')}). It is read as one continuous year, every row placed in ${year} at its month, day and hour${year === TYPICAL_YEAR_PLACEMENT ? ' (a common year, fixed for every typical-year file)' : ' (a leap year, since the file holds 29 February)'}; the year each month came from is kept with the file.`,
  );
}

/** Whole number in [min, max] from a cell (1–6 digits, optional sign, spaces around), else NaN. */
export function integerIn(cell: string | undefined, min: number, max: number): number {
  if (cell === undefined) return NaN;
  let i = 0;
  let end = cell.length;
  while (i < end && cell.charCodeAt(i) === 32) i++;
  while (end > i && (cell.charCodeAt(end - 1) === 32 || cell.charCodeAt(end - 1) === 13)) end--;
  const negative = cell.charCodeAt(i) === 45;
  if (negative || cell.charCodeAt(i) === 43) i++;
  if (end - i < 1 || end - i > 6) return NaN;
  let n = 0;
  for (; i < end; i++) {
    const d = cell.charCodeAt(i) - 48;
    if (d < 0 || d > 9) return NaN;
    n = n * 10 + d;
  }
  if (negative) n = -n;
  return n >= min && n <= max ? n : NaN;
}

/** Calls `each` for every line of text[from…] with its 1-based number; stops when `each` returns false. */
export function forEachLine(text: string, from: number, firstLine: number, each: (line: string, lineNumber: number) => boolean | void): void {
  let offset = from;
  let lineNumber = firstLine;
  while (offset < text.length) {
    let end = text.indexOf('\n', offset);
    if (end === -1) end = text.length;
    const stop = each(text.charCodeAt(end - 1) === 13 ? text.slice(offset, end - 1) : text.slice(offset, end), lineNumber) === false;
    if (stop) return;
    offset = end + 1;
    lineNumber++;
  }
}
