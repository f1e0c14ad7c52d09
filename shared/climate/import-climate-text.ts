/**
 * importClimateText: delimited hourly (or finer) weather text → a strictly hourly SI series,
 * the mapping used and a report. It never throws: every failure is a report with ok = false.
 *
 * Rule for ok (the API answers 422 when false): the import is refused when
 *  - the text is empty, binary, header-only, or an option or mapping override is invalid;
 *  - no time layout, no dry-bulb column or no humidity column is known;
 *  - more than 10 % of data rows have an unreadable time, or more than 10 % of the dry-bulb or
 *    humidity cells are unreadable or impossible (a wrong column or unit, not a few bad readings);
 *  - the series spans more than 100 years (a garbled date, not weather);
 *  - fewer than half of the hours of the series hold measured values.
 * Anything less is repaired where the report says so, and imported.
 */
import { applyMappingOverride } from './apply-mapping';
import {
  countLines,
  firstLines,
  looksBinary,
  parseRows,
  skipLeadingComments,
  sniffDelimiter,
  stripBom,
  type ParsedRows,
} from './delimited-text';
import { averageToHours, fillGaps, hourRange, timeOrder, trimToCompleteHours, type RowColumns } from './hourly-grid';
import { IssueLog } from './issue-log';
import { detectTypicalYear, intoYear } from './typical-year';
import { createLocalToUtc, isKnownTimeZone, type LocalToUtc } from './local-time';
import { classifyUnreadableCell, parseNumberCell, sniffDecimalSeparator } from './number-cells';
import { describeYmdh, recogniseColumns, unitOf, type Recognition } from './recognise-columns';
import {
  civilDays,
  formatUtc,
  lastParse,
  MS_PER_DAY,
  MS_PER_HOUR,
  MS_PER_MINUTE,
  parseDateCell,
  parseDateTimeCell,
  parseIntegerCell,
  parseTimeCell,
} from './time-cells';
import type {
  ClimateSeries,
  DetectedMapping,
  HumidityQuantity,
  ImportCounts,
  ImportOptions,
  ImportReport,
  ImportResult,
  QuantityAssignment,
  TimeMapping,
} from './types';
import { conversionToSi, humidityKindOf, type AffineConversion } from './units';
import {
  checkHumidity,
  DRY_BULB_MAX_C,
  DRY_BULB_MIN_C,
  humidityCheck,
  PRESSURE_MAX_PA,
  PRESSURE_MIN_PA,
} from './value-limits';

export const DEFAULT_MAX_GAP_HOURS = 6;
/** 100 years of hours: anything longer is a garbled date rather than weather. */
export const MAX_SERIES_HOURS = 876_600;
const REJECT_SHARE = 0.1;
const MIN_MEASURED_SHARE = 0.5;
const SAMPLE_ROWS = 400;

function emptyCounts(): ImportCounts {
  return {
    lines: 0,
    rows: 0,
    rowsRejected: 0,
    cellsUnreadable: 0,
    impossibleValues: 0,
    clampedValues: 0,
    duplicateTimestamps: 0,
    rowsAveraged: 0,
    nonHourlySteps: 0,
    daylightSavingJumps: 0,
    hours: 0,
    measuredHours: 0,
    filledHours: 0,
    missingHours: 0,
    gaps: 0,
    longestGapHours: 0,
    issuesNotListed: 0,
  };
}

function emptyMapping(): DetectedMapping {
  return {
    delimiter: ',',
    decimalSeparator: '.',
    headerLine: null,
    headers: [],
    time: null,
    dryBulb: null,
    humidity: null,
    pressure: null,
    confidence: 0,
  };
}

interface Context {
  log: IssueLog;
  counts: ImportCounts;
  mapping: DetectedMapping;
  maxGapHours: number;
  timeZone: string;
  stepMinutes: number | null;
}

function finish(ctx: Context, series: ClimateSeries | null): ImportResult {
  const ok = series !== null && !ctx.log.hasErrors();
  ctx.counts.issuesNotListed = ctx.log.notListed;
  const first = series && series.timestampsMs.length > 0 ? series.timestampsMs[0] : NaN;
  const last = series && series.timestampsMs.length > 0 ? series.timestampsMs[series.timestampsMs.length - 1] : NaN;
  const years: number[] = [];
  if (ok && Number.isFinite(first)) {
    for (let y = new Date(first).getUTCFullYear(); y <= new Date(last).getUTCFullYear(); y++) years.push(y);
  }
  const c = ctx.counts;
  const summary = ok
    ? `Imported ${c.hours} hours from ${formatUtc(first)} to ${formatUtc(last)}: ${c.measuredHours} measured, ${c.filledHours} filled, ${c.missingHours} missing.`
    : `Not imported: ${ctx.log.firstError()?.message ?? 'no usable data.'}`;
  const report: ImportReport = {
    ok,
    summary,
    timeLayout: ctx.mapping.time?.description ?? null,
    stepMinutes: ctx.stepMinutes,
    firstTimestamp: ok ? new Date(first).toISOString() : null,
    lastTimestamp: ok ? new Date(last).toISOString() : null,
    years,
    maxGapHours: ctx.maxGapHours,
    timeZone: ctx.timeZone,
    counts: c,
    issues: ctx.log.issues,
  };
  return { ok, series: ok ? series : null, report, mapping: ctx.mapping };
}

/**
 * Imports delimited climate text (see the module comment for the acceptance rule).
 * Timestamps in the series are the instants the file states, in UTC; sub-hourly rows are averaged
 * into the hour they fall in (hour starting at the stamp's floor).
 */
export function importClimateText(text: string, options: ImportOptions = {}): ImportResult {
  const ctx: Context = {
    log: new IssueLog(),
    counts: emptyCounts(),
    mapping: emptyMapping(),
    maxGapHours: DEFAULT_MAX_GAP_HOURS,
    timeZone: 'UTC',
    stepMinutes: null,
  };
  try {
    return finish(ctx, runImport(text, options ?? {}, ctx));
  } catch (error) {
    ctx.log.error('unexpected-failure', `The importer failed unexpectedly (${error instanceof Error ? error.message : String(error)}); nothing was imported.`);
    return finish(ctx, null);
  }
}

function checkOptions(options: ImportOptions, ctx: Context): boolean {
  const { log } = ctx;
  if (options.maxGapHours !== undefined) {
    const m = options.maxGapHours;
    if (typeof m !== 'number' || !Number.isInteger(m) || m < 0 || m > 8784) {
      log.error('invalid-option', `maxGapHours must be a whole number of hours from 0 to 8784, not ${String(m)}.`, { value: String(m) });
      return false;
    }
    ctx.maxGapHours = m;
  }
  if (options.timeZone !== undefined) {
    if (typeof options.timeZone !== 'string' || !isKnownTimeZone(options.timeZone)) {
      log.error('invalid-option', `Unknown time zone "${String(options.timeZone)}"; give an IANA name such as Europe/Paris, or a fixed offset such as UTC-07:00 for local standard time.`, {
        value: String(options.timeZone),
      });
      return false;
    }
    ctx.timeZone = options.timeZone;
  }
  return true;
}

function isBlankRow(row: string[]): boolean {
  return row.length === 0 || (row.length === 1 && row[0].trim() === '');
}

function isCommentRow(row: string[]): boolean {
  if (row.length === 0) return false;
  const first = row[0];
  const c = first.charCodeAt(0);
  if (c === 35 /* # */) return true;
  // only cells starting with white space need the slower look
  return (c === 32 || c === 9) && first.trimStart().startsWith('#');
}

function isTextCell(cell: string): boolean {
  const t = cell.trim();
  if (t === '') return false;
  if (!Number.isNaN(parseNumberCell(t, true)) || !Number.isNaN(parseNumberCell(t, false))) return false;
  if (!Number.isNaN(parseDateTimeCell(t, 'YMD')) || !Number.isNaN(parseTimeCell(t))) return false;
  return true;
}

/** Fields up to the last non-empty one: a trailing delimiter on some lines does not change the shape. */
function width(row: string[]): number {
  let n = row.length;
  while (n > 0 && row[n - 1].trim() === '') n--;
  return n;
}

interface Layout {
  headerIndex: number;
  dataStart: number;
  headers: string[];
  hasHeader: boolean;
}

/** Finds the header row (the first row with the modal field count) and an optional units row below it. */
function findLayout(parsed: ParsedRows, ctx: Context): Layout | null {
  const candidates: number[] = [];
  for (let i = 0; i < parsed.rows.length && candidates.length < 60; i++) {
    const row = parsed.rows[i];
    if (!isBlankRow(row) && !isCommentRow(row)) candidates.push(i);
  }
  if (candidates.length === 0) return null;
  const tally = new Map<number, number>();
  for (const i of candidates) tally.set(width(parsed.rows[i]), (tally.get(width(parsed.rows[i])) ?? 0) + 1);
  let modal = width(parsed.rows[candidates[0]]);
  for (const [n, times] of tally) if (times > (tally.get(modal) ?? 0)) modal = n;
  const headerIndex = candidates.find((i) => width(parsed.rows[i]) === modal) ?? candidates[0];
  for (const i of candidates) {
    if (i >= headerIndex) break;
    ctx.log.info('preamble-skipped', 'A line before the header was skipped as a note.', {
      line: parsed.lineOf(i),
      value: parsed.rows[i].join(' ').slice(0, 80),
    });
  }
  const headerRow = parsed.rows[headerIndex];
  const textCells = headerRow.filter(isTextCell).length;
  const nonEmpty = headerRow.filter((c) => c.trim() !== '').length;
  const hasHeader = textCells > 0 && textCells * 2 >= nonEmpty;
  if (!hasHeader) {
    ctx.log.warning('no-header', 'The file has no header row; columns are numbered and must be mapped by hand.', {
      line: parsed.lineOf(headerIndex),
    });
    return {
      headerIndex,
      dataStart: headerIndex,
      headers: headerRow.map((_, i) => `column ${i + 1}`),
      hasHeader: false,
    };
  }
  const headers = headerRow.map((h) => h.trim());
  let dataStart = headerIndex + 1;
  while (dataStart < parsed.rows.length && (isBlankRow(parsed.rows[dataStart]) || isCommentRow(parsed.rows[dataStart]))) dataStart++;
  const next = parsed.rows[dataStart];
  if (next && width(next) === width(headerRow) && next.some((c) => c.trim() !== '') && next.every((c) => c.trim() === '' || isTextCell(c))) {
    // a second header row holding the units, as spreadsheets often have
    for (let i = 0; i < headers.length; i++) if ((next[i] ?? '').trim() !== '') headers[i] = `${headers[i]} (${next[i].trim()})`;
    dataStart++;
  }
  return { headerIndex, dataStart, headers, hasHeader: true };
}

function spreadSample(parsed: ParsedRows, dataStart: number): string[][] {
  const sample: string[][] = [];
  const total = parsed.rows.length - dataStart;
  const stride = Math.max(1, Math.floor(total / SAMPLE_ROWS));
  for (let i = dataStart; i < parsed.rows.length; i += i < dataStart + 48 ? 1 : stride) {
    const row = parsed.rows[i];
    if (!isBlankRow(row) && !isCommentRow(row)) sample.push(row);
  }
  return sample;
}

function buildMapping(parsed: ParsedRows, layout: Layout, recognition: Recognition, ctx: Context): void {
  const m = ctx.mapping;
  m.headerLine = layout.hasHeader ? parsed.lineOf(layout.headerIndex) : null;
  m.headers = layout.headers;
  m.time = recognition.time;
  m.dryBulb = recognition.dryBulb;
  m.humidity = recognition.humidity;
  m.pressure = recognition.pressure;
  m.confidence = Math.min(m.time?.confidence ?? 0, m.dryBulb?.confidence ?? 0, m.humidity?.confidence ?? 0);
}

function reportMapping(recognition: Recognition, layout: Layout, ctx: Context): void {
  const { log } = ctx;
  if (!recognition.time) {
    log.error(
      'missing-time',
      'No time columns were recognised: expected one date-time column, a date and a time column, or year, month, day and hour columns.',
    );
  }
  if (!recognition.dryBulb) log.error('missing-dry-bulb', 'No dry-bulb temperature column was recognised.');
  if (!recognition.humidity) {
    log.error('missing-humidity', 'No humidity column was recognised (relative humidity, dew point, wet-bulb or humidity ratio).');
  }
  for (const a of recognition.assumedUnits) {
    log.warning('unit-assumed', `Column "${a.header}" has no unit in its header: ${a.reason.split('; ').pop()}.`, {
      column: a.header,
      value: a.unit,
    });
  }
  for (const a of recognition.otherHumidity) {
    if (recognition.humidity && a.column !== recognition.humidity.column) {
      log.info('other-humidity-ignored', `Column "${a.header}" (${a.quantity}) is not used: one humidity measure is kept, "${recognition.humidity.header}".`, {
        column: a.header,
      });
    }
  }
  const used = new Set<number>();
  const t = recognition.time;
  if (t?.layout === 'iso') used.add(t.column);
  if (t?.layout === 'date-time') [t.dateColumn, t.timeColumn].forEach((c) => used.add(c));
  if (t?.layout === 'ymdh') [t.year, t.month, t.day, t.hour, t.minute ?? -1].forEach((c) => used.add(c));
  for (const a of [recognition.dryBulb, recognition.humidity, recognition.pressure, ...recognition.otherHumidity]) if (a) used.add(a.column);
  if (layout.hasHeader) {
    layout.headers.forEach((h, i) => {
      if (!used.has(i) && h !== '') log.info('unrecognised-column', `Column "${h}" is not used.`, { column: h });
    });
  }
}

interface ValueReader {
  assignment: QuantityAssignment;
  conversion: AffineConversion;
  bad: number;
}

function reader(a: QuantityAssignment): ValueReader {
  return { assignment: a, conversion: conversionToSi(unitOf(a)), bad: 0 };
}

/** The heart of the import: rows → time and SI values, with per-row checks. */
function runImport(rawText: string, options: ImportOptions, ctx: Context): ClimateSeries | null {
  const { log, counts } = ctx;
  if (!checkOptions(options, ctx)) return null;
  if (typeof rawText !== 'string') {
    log.error('binary-input', 'The input is not text.');
    return null;
  }
  let text = stripBom(rawText);
  // old Mac line ends (CR only): the line scanning below looks for LF
  if (text.indexOf('\n') === -1 && text.indexOf('\r') !== -1) text = text.replace(/\r/g, '\n');
  counts.lines = countLines(text);
  if (text.trim() === '') {
    log.error('empty-input', 'The file is empty.');
    return null;
  }
  if (looksBinary(text)) {
    log.error('binary-input', 'The file looks binary (for example a spreadsheet workbook or an archive), not delimited text; save it as CSV.');
    return null;
  }
  const body = skipLeadingComments(text);
  if (body.text.trim() === '') {
    log.error('empty-input', `The file holds only comment lines (${body.commentLines}) and no data.`);
    return null;
  }
  const override = options.mapping ?? {};
  const delimiter = override.delimiter ?? sniffDelimiter(firstLines(body.text, 60));
  ctx.mapping.delimiter = delimiter;
  const parsed = parseRows(body, delimiter);
  for (const e of parsed.errors.slice(0, 5)) {
    log.warning('malformed-row', `Quoting is broken: ${e.message}.`, { line: parsed.lineOf(e.row) });
  }
  const layout = findLayout(parsed, ctx);
  if (!layout) {
    log.error('empty-input', 'The file holds no rows.');
    return null;
  }
  let dataRows = 0;
  for (let i = layout.dataStart; i < parsed.rows.length; i++) {
    if (!isBlankRow(parsed.rows[i]) && !isCommentRow(parsed.rows[i])) dataRows++;
  }
  const sampleRows = spreadSample(parsed, layout.dataStart);
  ctx.mapping.decimalSeparator = override.decimalSeparator ?? sniffDecimalSeparator(sampleRows);
  ctx.mapping.headers = layout.headers;
  if (dataRows === 0) {
    ctx.mapping.headerLine = parsed.lineOf(layout.headerIndex);
    log.error('header-only', 'The file has a header but no data rows.', { line: parsed.lineOf(layout.headerIndex) });
    return null;
  }
  const recognition = recogniseColumns({
    headers: layout.headers,
    rows: sampleRows,
    decimalComma: ctx.mapping.decimalSeparator === ',',
  });
  applyMappingOverride(recognition, override, layout.headers, log);
  reportMapping(recognition, layout, ctx);
  buildMapping(parsed, layout, recognition, ctx);
  if (log.hasErrors() || !recognition.time || !recognition.dryBulb || !recognition.humidity) return null;
  return readRows(parsed, layout, recognition.time, recognition.dryBulb, recognition.humidity, recognition.pressure, ctx, dataRows);
}

function readRows(
  parsed: ParsedRows,
  layout: Layout,
  time: TimeMapping,
  dryBulb: QuantityAssignment,
  humidity: QuantityAssignment,
  pressure: QuantityAssignment | null,
  ctx: Context,
  dataRows: number,
): ClimateSeries | null {
  const { log, counts } = ctx;
  const decimalComma = ctx.mapping.decimalSeparator === ',';
  const headers = layout.headers;
  const dry = reader(dryBulb);
  const hum = reader(humidity);
  const pres = pressure ? reader(pressure) : null;
  const humidityQuantity = humidity.quantity as HumidityQuantity;
  const rows: RowColumns = {
    count: 0,
    timeMs: new Float64Array(dataRows),
    dryBulbC: new Float64Array(dataRows),
    humidity: new Float64Array(dataRows),
    pressurePa: pres ? new Float64Array(dataRows) : null,
    line: new Int32Array(dataRows),
    dropped: new Uint8Array(dataRows),
  };
  const localTimes = new Float64Array(dataRows);
  const zone: LocalToUtc | null = ctx.timeZone === 'UTC' ? null : createLocalToUtc(ctx.timeZone);
  const timeColumns =
    time.layout === 'iso' ? [time.column] : time.layout === 'date-time' ? [time.dateColumn, time.timeColumn] : [time.year, time.month, time.day, time.hour];
  const needed = Math.max(...timeColumns, dryBulb.column, humidity.column, pressure?.column ?? 0) + 1;
  const timeHeader = timeColumns.map((c) => headers[c]).join(' + ');
  let hourZero = false;
  let hour24 = false;
  let anyOffset = false;
  let previousOffset = NaN;
  let previousLine = 0;

  const readValue = (r: ValueReader, cell: string | undefined, line: number, min: number, max: number): number => {
    const raw = cell === undefined ? NaN : parseNumberCell(cell, decimalComma);
    const header = r.assignment.header;
    if (raw !== raw) {
      counts.cellsUnreadable++;
      if (cell === undefined || classifyUnreadableCell(cell, decimalComma) === 'unreadable') {
        r.bad++;
        log.warning('unparsable-value', `"${cell ?? ''}" in column "${header}" is not a number; the value is treated as missing.`, {
          line,
          column: header,
          value: cell ?? '',
        });
      } else {
        log.info('missing-value-marker', `Column "${header}" marks a missing value with "${cell.trim()}".`, { line, column: header, value: cell });
      }
      return NaN;
    }
    const si = raw * r.conversion.scale + r.conversion.offset;
    if (si < min || si > max) {
      r.bad++;
      counts.impossibleValues++;
      log.warning('impossible-value', `${r.assignment.quantity} ${cell?.trim()} ${r.assignment.unit} in column "${header}" is outside the possible range; treated as missing.`, {
        line,
        column: header,
        value: cell,
      });
      return NaN;
    }
    return si;
  };

  for (let r = layout.dataStart; r < parsed.rows.length; r++) {
    const row = parsed.rows[r];
    if (isBlankRow(row) || isCommentRow(row)) continue;
    counts.rows++;
    const line = parsed.lineOf(r);
    if (row.length < needed) {
      log.warning('wrong-field-count', `The row has ${row.length} fields where ${headers.length} were expected.`, {
        line,
        value: row.join(ctx.mapping.delimiter).slice(0, 120),
      });
    }

    // time of the row, in local ms, with the offset when the cell gives one
    let localMs = NaN;
    let offsetMinutes = NaN;
    if (time.layout === 'iso') {
      localMs = parseDateTimeCell(row[time.column] ?? '', time.dateOrder ?? 'YMD');
      offsetMinutes = lastParse.offsetMinutes;
    } else if (time.layout === 'date-time') {
      const day = parseDateCell(row[time.dateColumn] ?? '', time.dateOrder);
      const clock = parseTimeCell(row[time.timeColumn] ?? '');
      localMs = day + clock;
      if (clock === 0) hourZero = true;
      else if (clock === MS_PER_DAY) hour24 = true;
    } else {
      const days = civilDays(parseIntegerCell(row[time.year] ?? ''), parseIntegerCell(row[time.month] ?? ''), parseIntegerCell(row[time.day] ?? ''));
      const hour = parseIntegerCell(row[time.hour] ?? '');
      let minute = time.minute === null ? 0 : parseIntegerCell(row[time.minute] ?? '');
      if (minute === 60) minute = 0; // some exports write minute 60 beside an hour-ending hour
      if (hour >= 0 && hour <= 24 && minute >= 0 && minute < 60) {
        localMs = days * MS_PER_DAY + hour * MS_PER_HOUR + minute * MS_PER_MINUTE;
        if (hour === 0) hourZero = true;
        else if (hour === 24) hour24 = true;
      }
    }
    if (localMs !== localMs) {
      counts.rowsRejected++;
      const cells = timeColumns.map((c) => row[c] ?? '').join(' ');
      log.warning('unparsable-time', `The time "${cells}" could not be read; the row is left out.`, { line, column: timeHeader, value: cells });
      continue;
    }
    let utcMs: number;
    if (offsetMinutes === offsetMinutes) {
      anyOffset = true;
      utcMs = localMs - offsetMinutes * MS_PER_MINUTE;
    } else if (zone) {
      utcMs = zone.toUtc(localMs);
      if (zone.lastEvent?.kind === 'nonexistent') {
        log.warning('daylight-saving-jump', `Local time ${formatUtc(localMs).slice(0, 16).replace('T', ' ')} does not exist in ${ctx.timeZone} (clocks go forward); read with the offset before the change.`, {
          line,
          column: timeHeader,
        });
      }
    } else {
      utcMs = localMs;
    }
    const offsetNow = localMs - utcMs;
    if (previousOffset === previousOffset && offsetNow !== previousOffset) {
      counts.daylightSavingJumps++;
      log.info('daylight-saving-jump', `The UTC offset changes from ${offsetText(previousOffset)} to ${offsetText(offsetNow)} between lines ${previousLine} and ${line}; times are converted to UTC, so the series stays continuous.`, {
        line,
        column: timeHeader,
      });
    }
    previousOffset = offsetNow;
    previousLine = line;

    // values
    const d = readValue(dry, row[dryBulb.column], line, DRY_BULB_MIN_C, DRY_BULB_MAX_C);
    let w = readValue(hum, row[humidity.column], line, -Infinity, Infinity);
    if (w === w) {
      checkHumidity(humidityQuantity, w, d);
      if (humidityCheck.verdict === 'impossible') {
        hum.bad++;
        counts.impossibleValues++;
        log.warning('impossible-value', impossibleHumidityMessage(humidity, row[humidity.column], d), {
          line,
          column: humidity.header,
          value: row[humidity.column],
        });
        w = NaN;
      } else if (humidityCheck.verdict === 'clamped') {
        counts.clampedValues++;
        log.info('clamped-value', `${humidity.quantity} ${row[humidity.column].trim()} in column "${humidity.header}" is just past saturation; set to ${round(humidityCheck.value)} ${humidityQuantity === 'relative-humidity' ? '%' : '°C'}.`, {
          line,
          column: humidity.header,
          value: row[humidity.column],
        });
        w = humidityCheck.value;
      }
    }
    const i = rows.count++;
    rows.timeMs[i] = utcMs;
    localTimes[i] = localMs;
    rows.dryBulbC[i] = d;
    rows.humidity[i] = w;
    if (rows.pressurePa && pres && pressure) rows.pressurePa[i] = readValue(pres, row[pressure.column], line, PRESSURE_MIN_PA, PRESSURE_MAX_PA);
    rows.line[i] = line;
  }

  if (time.layout === 'ymdh') {
    const convention = hour24 || !hourZero ? 'ending-1-24' : 'beginning-0-23';
    if (time.confidence < 1 || convention === time.hourConvention) {
      time.hourConvention = convention;
      time.description = describeYmdh(headers[time.hour], convention);
    }
    if (hourZero && hour24) log.warning('non-hourly-step', 'Hours run both 0 and 24: check whether the hour column is hour ending (1–24) or hour beginning (0–23).', { column: headers[time.hour] });
  } else if (time.layout === 'date-time' && hour24) {
    time.description += hourZero ? ' (times 00:00 and 24:00 both occur)' : ', 24:00 read as midnight at the end of the day';
  }

  checkRejectShares(dry, hum, pres, rows, ctx);
  if (pres && ctx.mapping.pressure === null) rows.pressurePa = null;
  const typical = detectTypicalYear(localTimes, rows.count);
  if (typical) {
    // same offset as read, so a zone's daylight saving is not re-applied in the new year
    for (let i = 0; i < rows.count; i++) rows.timeMs[i] = intoYear(localTimes[i], typical.year) - (localTimes[i] - rows.timeMs[i]);
    const from = typical.sourceYears[0];
    const to = typical.sourceYears[typical.sourceYears.length - 1];
    log.warning(
      'typical-year-restamped',
      `The file looks like a typical year: ${rows.count} hours taken from ${typical.sourceYears.length} different years (${from}–${to}), each calendar hour once. Every row is placed in ${typical.year} at its month, day and hour, so the series is one continuous year.`,
    );
  }
  if (log.hasErrors()) return null;
  return toHourlySeries(rows, humidityQuantity, ctx, !anyOffset && !zone);
}

function offsetText(offsetMs: number): string {
  const minutes = Math.round(offsetMs / MS_PER_MINUTE);
  const sign = minutes < 0 ? '−' : '+';
  const abs = Math.abs(minutes);
  return `UTC${sign}${String(Math.floor(abs / 60)).padStart(2, '0')}:${String(abs % 60).padStart(2, '0')}`;
}

function round(value: number): string {
  return String(Math.round(value * 100) / 100);
}

function impossibleHumidityMessage(humidity: QuantityAssignment, cell: string, dryBulbC: number): string {
  const where = `${humidity.quantity} ${cell.trim()} ${humidity.unit} in column "${humidity.header}"`;
  if ((humidity.quantity === 'dew-point' || humidity.quantity === 'wet-bulb') && dryBulbC === dryBulbC) {
    return `${where} is above the dry-bulb of ${round(dryBulbC)} °C (or outside the possible range); treated as missing.`;
  }
  return `${where} is outside the possible range; treated as missing.`;
}

function checkRejectShares(dry: ValueReader, hum: ValueReader, pres: ValueReader | null, rows: RowColumns, ctx: Context): void {
  const { log, counts } = ctx;
  if (counts.rows > 0 && counts.rowsRejected / counts.rows > REJECT_SHARE) {
    log.error(
      'too-many-rejected',
      `${counts.rowsRejected} of ${counts.rows} rows (${percent(counts.rowsRejected / counts.rows)}) have a time that cannot be read: check the time columns and date order.`,
    );
  }
  if (rows.count === 0) {
    if (counts.rowsRejected === 0) log.error('too-little-data', 'No data row could be read.');
    return;
  }
  for (const r of [dry, hum]) {
    if (r.bad / rows.count > REJECT_SHARE) {
      log.error(
        'too-many-rejected',
        `${r.bad} of ${rows.count} cells (${percent(r.bad / rows.count)}) in column "${r.assignment.header}" are unreadable or impossible as ${r.assignment.quantity} in ${r.assignment.unit}: check the column and its unit.`,
        { column: r.assignment.header },
      );
    }
  }
  if (pres && pres.bad / rows.count > REJECT_SHARE) {
    log.warning(
      'pressure-ignored',
      `${percent(pres.bad / rows.count)} of the pressure cells in column "${pres.assignment.header}" are unreadable or impossible in ${pres.assignment.unit}; the column is ignored and pressure will come from the site elevation.`,
      { column: pres.assignment.header },
    );
    ctx.mapping.pressure = null;
  }
}

function percent(share: number): string {
  return `${Math.round(share * 1000) / 10} %`;
}

/** Sequence checks (order, duplicates, steps), hourly averaging and gap repair. */
function toHourlySeries(rows: RowColumns, humidity: HumidityQuantity, ctx: Context, naiveLocal: boolean): ClimateSeries | null {
  const { log, counts } = ctx;
  const t = rows.timeMs;
  // rows out of order, in file order
  for (let i = 1; i < rows.count; i++) {
    if (t[i] < t[i - 1]) {
      log.warning('out-of-order', `The time goes back from ${formatUtc(t[i - 1])} to ${formatUtc(t[i])}; rows are put in time order.`, {
        line: rows.line[i],
      });
    }
  }
  const order = timeOrder(rows);
  const at = (k: number): number => (order ? order[k] : k);

  // duplicates and steps, in time order
  // one-hour steps are counted apart: a Map update per row would cost more than the rest of the loop
  const steps = new Map<number, number>();
  let hourSteps = 0;
  let previous = -1;
  for (let k = 0; k < rows.count; k++) {
    const i = at(k);
    if (previous !== -1) {
      const step = t[i] - t[previous];
      if (step === MS_PER_HOUR) {
        hourSteps++;
        previous = i;
        continue;
      }
      if (step === 0) {
        rows.dropped[i] = 1;
        counts.duplicateTimestamps++;
        log.warning('duplicate-timestamp', `${formatUtc(t[i])} appears again (first on line ${rows.line[previous]}); the later row is left out.`, {
          line: rows.line[i],
        });
        continue;
      }
      steps.set(step, (steps.get(step) ?? 0) + 1);
    }
    previous = i;
  }
  let modalStep = MS_PER_HOUR;
  let modalCount = hourSteps;
  for (const [step, times] of steps) {
    if (times > modalCount) {
      modalStep = step;
      modalCount = times;
    }
  }
  ctx.stepMinutes = modalCount > 0 ? modalStep / MS_PER_MINUTE : null;
  const hourly = modalStep >= MS_PER_HOUR;

  // hourly data stamped at a fixed minute (e.g. :50) is moved to the nearest whole hour
  let shiftMs = 0;
  if (hourly) {
    const minuteTally = new Map<number, number>();
    let onTheHour = 0;
    for (let i = 0; i < rows.count; i++) {
      if (rows.dropped[i]) continue;
      const m = ((t[i] % MS_PER_HOUR) + MS_PER_HOUR) % MS_PER_HOUR;
      if (m === 0) onTheHour++;
      else minuteTally.set(m, (minuteTally.get(m) ?? 0) + 1);
    }
    let commonMinute = 0;
    let commonCount = onTheHour;
    for (const [m, times] of minuteTally) if (times > commonCount) [commonMinute, commonCount] = [m, times];
    if (commonMinute !== 0) {
      shiftMs = commonMinute >= MS_PER_HOUR / 2 ? MS_PER_HOUR - commonMinute : -commonMinute;
      log.info('timestamps-rounded', `Rows are stamped ${commonMinute / MS_PER_MINUTE} minutes past the hour; they are moved ${shiftMs / MS_PER_MINUTE} minutes to the nearest whole hour.`);
    }
  }

  // steps that do not fit the file's rhythm, and daylight-saving hints for naive local times
  previous = -1;
  for (let k = 0; k < rows.count; k++) {
    const i = at(k);
    if (rows.dropped[i]) continue;
    if (previous !== -1) {
      const step = t[i] - t[previous];
      const offRhythm = hourly ? step % MS_PER_HOUR !== 0 : step % modalStep !== 0;
      if (offRhythm) {
        counts.nonHourlySteps++;
        log.warning('non-hourly-step', `The step from ${formatUtc(t[previous])} to ${formatUtc(t[i])} (${round(step / MS_PER_MINUTE)} min) does not fit the file's ${round(modalStep / MS_PER_MINUTE)}-minute step.`, {
          line: rows.line[i],
        });
      }
      if (naiveLocal && hourly && modalStep === MS_PER_HOUR && step === 2 * MS_PER_HOUR && looksLikeClockChange(t[previous])) {
        counts.daylightSavingJumps++;
        log.warning('daylight-saving-jump', `The clock skips from ${formatUtc(t[previous])} to ${formatUtc(t[i])}, as local time does when clocks go forward; if the file is in local time, give its time zone.`, {
          line: rows.line[i],
        });
      }
    }
    previous = i;
  }
  if (naiveLocal && hourly) {
    for (let i = 1; i < rows.count; i++) {
      if (rows.dropped[i] && looksLikeClockChange(t[i])) {
        counts.daylightSavingJumps++;
        log.warning('daylight-saving-jump', `${formatUtc(t[i])} repeats, as local time does when clocks go back; if the file is in local time, give its time zone.`, {
          line: rows.line[i],
        });
      }
    }
  }

  const range = hourRange(rows, shiftMs);
  if (range.last - range.first + 1 > MAX_SERIES_HOURS) {
    log.error('span-too-long', `The times span ${Math.round((range.last - range.first + 1) / 8766)} years (${formatUtc(range.first * MS_PER_HOUR)} to ${formatUtc(range.last * MS_PER_HOUR)}); a garbled date is likely.`);
    return null;
  }
  const averaged = averageToHours(rows, shiftMs, range);
  for (let h = 0; h < averaged.hours; h++) if (averaged.rowsInHour[h] > 1) counts.rowsAveraged += averaged.rowsInHour[h] - 1;
  if (counts.rowsAveraged > 0) {
    log.info('sub-hourly-averaged', `${counts.rowsAveraged + countHoursWithSeveralRows(averaged.rowsInHour)} rows sharing an hour were averaged into ${countHoursWithSeveralRows(averaged.rowsInHour)} hourly values.`);
  }
  const grid = trimToCompleteHours(averaged);
  if (!grid) {
    log.error('too-little-data', 'No hour has both a dry-bulb and a humidity value.');
    return null;
  }
  const gaps = fillGaps(grid, ctx.maxGapHours);
  for (const run of gaps.runs) {
    const length = run.to - run.from + 1;
    const from = formatUtc((grid.startHour + run.from) * MS_PER_HOUR);
    const to = formatUtc((grid.startHour + run.to) * MS_PER_HOUR);
    const line = grid.lastLine[run.from - 1] || undefined;
    if (run.filled) {
      log.info('gap-filled', `${length} hour${length > 1 ? 's' : ''} without complete data (${from} to ${to}) filled by linear interpolation.`, { line });
    } else {
      log.warning('gap-missing', `${length} hours without complete data (${from} to ${to}) are longer than ${ctx.maxGapHours} h and stay missing.`, { line });
    }
  }
  counts.hours = grid.hours;
  counts.filledHours = gaps.filledHours;
  counts.missingHours = gaps.missingHours;
  counts.measuredHours = grid.hours - gaps.filledHours - gaps.missingHours;
  counts.gaps = gaps.gaps;
  counts.longestGapHours = gaps.longestGapHours;
  if (counts.measuredHours < MIN_MEASURED_SHARE * grid.hours) {
    log.error(
      'too-little-data',
      `Only ${counts.measuredHours} of ${grid.hours} hours (${percent(counts.measuredHours / grid.hours)}) hold measured values; at least half are needed.`,
    );
    return null;
  }
  const timestampsMs = new Float64Array(grid.hours);
  for (let h = 0; h < grid.hours; h++) timestampsMs[h] = (grid.startHour + h) * MS_PER_HOUR;
  return {
    timestampsMs,
    dryBulbC: grid.dryBulbC,
    humidity: { kind: humidityKindOf(humidity), values: grid.humidity },
    pressurePa: grid.pressurePa,
    flags: gaps.flags,
  };
}

function countHoursWithSeveralRows(rowsInHour: Uint16Array): number {
  let n = 0;
  for (let h = 0; h < rowsInHour.length; h++) if (rowsInHour[h] > 1) n++;
  return n;
}

/** Whether a UTC-read wall time sits where daylight-saving changes happen: 00–04 h in March, April, September, October or November. */
function looksLikeClockChange(wallMs: number): boolean {
  const date = new Date(wallMs);
  const month = date.getUTCMonth() + 1;
  const hour = date.getUTCHours();
  return hour <= 4 && (month === 3 || month === 4 || month === 9 || month === 10 || month === 11);
}
