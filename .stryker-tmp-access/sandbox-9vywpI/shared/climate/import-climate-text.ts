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
// @ts-nocheck

import { applyMappingOverride } from './apply-mapping';
import { firstLines, looksBinary, parseRows, skipLeadingComments, scanLines, sniffDelimiter, stripBom } from './delimited-text';
import { DEFAULT_MAX_GAP_HOURS, emptyCounts, emptyMapping, type Context } from './import-context';
import { boundedMapping } from './echo-limits';
import { IssueLog } from './issue-log';
import { isKnownTimeZone } from '../time-zone';
import { buildMapping, reportMapping } from './mapping-report';
import { sniffDecimalSeparator } from './number-cells';
import { readRows } from './read-rows';
import { recogniseColumns } from './recognise-columns';
import { readPublishedFormat } from './formats/published-formats';
import { checkHeaderAgainstSite } from './formats/site-check';
import { importPeriodWords } from './import-period';
import { noteStationLine, readStationLine } from './formats/station-line';
import { findLayout, isBlankRow, isCommentRow, spreadSample } from './table-layout';
import { readHumidityOverIce } from './humidity-over-ice';
import type { ClimateSeries, ImportOptions, ImportReport, ImportResult } from './types';

export { DEFAULT_MAX_GAP_HOURS, MAX_SERIES_HOURS } from './import-context';

/** Longest line the importer reads, characters; weather files' lines are a few hundred at most. */
export const MAX_LINE_CHARS = 10_000;
/** Most columns the importer reads. */
export const MAX_COLUMNS = 200;

function finish(ctx: Context, series: ClimateSeries | null, siteTimeZone?: string): ImportResult {
  const ok = series !== null && !ctx.log.hasErrors();
  ctx.counts.issuesNotListed = ctx.log.notListed;
  const first = series && series.timestampsMs.length > 0 ? series.timestampsMs[0] : NaN;
  const last = series && series.timestampsMs.length > 0 ? series.timestampsMs[series.timestampsMs.length - 1] : NaN;
  const years: number[] = [];
  if (ok && Number.isFinite(first)) {
    // hour-ending stamps were moved to their hour's start (hour-starts.ts)
    const shift = ctx.fileOffsetMs;
    for (let y = new Date(first + shift).getUTCFullYear(); y <= new Date(last + shift).getUTCFullYear(); y++) years.push(y);
  }
  const c = ctx.counts;
  const summary = ok
    ? `Imported ${c.hours} hours from ${importPeriodWords(first, last, siteTimeZone)}: ${c.measuredHours} measured, ${c.filledHours} filled, ${c.missingHours} missing.`
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
    humidityOverIce: ctx.humidityOverIce,
    counts: c,
    issues: ctx.log.issues,
    fileHeader: ctx.fileHeader ?? null,
    typicalYear: ok ? (ctx.typicalYear ?? null) : null,
  };
  return {
    ok,
    series: ok ? series : null,
    report,
    mapping: boundedMapping(ctx.mapping),
    hourLines: ok ? ctx.hourLines : null,
    issueList: { rows: ctx.log.rows, notWritten: ctx.log.notWritten, ofSet: false },
  };
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
    humidityOverIce: false,
    stepMinutes: null,
    fileOffsetMs: 0,
    hourEnding: false,
    hourLines: null,
  };
  try {
    const series = runImport(text, options ?? {}, ctx);
    // Every reader's humidity, published formats and delimited text alike, is converted here once.
    if (series && ctx.humidityOverIce) readHumidityOverIce(series, ctx.log);
    checkHeaderAgainstSite(ctx, options?.site);
    return finish(ctx, series, options?.site?.timeZone);
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
      log.error(
        'invalid-option',
        `Unknown time zone "${String(options.timeZone)}"; give an IANA name such as Europe/Paris, or a fixed offset such as UTC-07:00 for local standard time.`,
        {
          value: String(options.timeZone),
        },
      );
      return false;
    }
    ctx.timeZone = options.timeZone;
  }
  if (options.humidityOverIce !== undefined) {
    if (typeof options.humidityOverIce !== 'boolean') {
      log.error('invalid-option', `humidityOverIce must be true or false, not ${String(options.humidityOverIce)}.`, { value: String(options.humidityOverIce) });
      return false;
    }
    ctx.humidityOverIce = options.humidityOverIce;
  }
  return true;
}

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
  // One pass gives the line count and the longest line, checked below before any parsing.
  const scanned = scanLines(text);
  counts.lines = scanned.lines;
  if (text.trim() === '') {
    log.error('empty-input', 'The file is empty.');
    return null;
  }
  if (looksBinary(text)) {
    log.error('binary-input', 'The file looks binary (for example a spreadsheet workbook or an archive), not delimited text; save it as CSV.');
    return null;
  }
  // A line of megabytes (a header of millions of columns) would hold a thread for a minute.
  const widest = scanned.longest;
  if (widest.length > MAX_LINE_CHARS) {
    log.error(
      'line-too-long',
      `Line ${widest.line} has ${widest.length.toLocaleString('en')} characters; a weather file's lines are far shorter, and Tramontane reads lines of at most ${MAX_LINE_CHARS.toLocaleString('en')}.`,
      { line: widest.line },
    );
    return null;
  }
  const published = readPublishedFormat(text, options, ctx);
  if (published !== undefined) return published;
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
  if (layout.headers.length > MAX_COLUMNS) {
    log.error(
      'too-many-columns',
      `The header on line ${parsed.lineOf(layout.headerIndex)} has ${layout.headers.length.toLocaleString('en')} columns; Tramontane reads files of at most ${MAX_COLUMNS}. Keep the time, dry-bulb, humidity and pressure columns.`,
      { line: parsed.lineOf(layout.headerIndex) },
    );
    return null;
  }
  if (layout.headerIndex > 0) noteStationLine(ctx, readStationLine(parsed.row(0), parsed.lineOf(0)));
  // Columns are sized for every remaining row; readRows counts the ones that hold data.
  const dataRows = parsed.count - layout.dataStart;
  let anyData = false;
  for (let i = layout.dataStart; i < parsed.count && !anyData; i++) {
    const row = parsed.row(i);
    anyData = !isBlankRow(row) && !isCommentRow(row);
  }
  const sampleRows = spreadSample(parsed, layout.dataStart);
  ctx.mapping.decimalSeparator = override.decimalSeparator ?? sniffDecimalSeparator(sampleRows);
  ctx.mapping.headers = layout.headers;
  if (!anyData) {
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
