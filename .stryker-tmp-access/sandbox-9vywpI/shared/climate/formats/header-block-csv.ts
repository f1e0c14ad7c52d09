/**
 * Header-block CSVs as European solar-and-climate databases publish typical years and hourly
 * series: lines such as `Latitude (decimal degrees): 45.0`, `Longitude …`, `Elevation (m): 250`
 * (and other notes), then a header `time(UTC),T2m,RH,…,SP,…` with times `yyyymmdd:hhmm` in UTC,
 * then a legend block after the data, which is not read. In that convention's naming T2m is the
 * 2-m air (dry-bulb) temperature in °C, RH the relative humidity in %, SP the surface (station)
 * pressure in Pa.
 */
// @ts-nocheck

import type { Context } from '../import-context';
import { daysFromCivil, daysInMonth, MS_PER_DAY, MS_PER_HOUR, MS_PER_MINUTE } from '../time-cells';
import type { ClimateSeries, ColumnMappingOverride, FileHeader, RecognisedFormat, TimeMapping } from '../types';
import { forEachLine, FormatRows, formatRecognition, rejectRow, type FormatColumn } from './format-rows';

export const HEADER_BLOCK_CSV_FORMAT: RecognisedFormat = {
  id: 'header-block-csv',
  name: 'header-block CSV',
  conventions: [
    'a header block of `Latitude (decimal degrees):`, `Longitude (decimal degrees):` and `Elevation (m):` lines (other lines in it are notes)',
    'a column header starting `time(UTC)`; times written yyyymmdd:hhmm in UTC',
    'T2m dry-bulb °C, RH relative humidity %, SP surface (station) pressure Pa; other columns are not used',
    'the data end at the first blank or text line; the legend block after them is not read',
    'months taken from different years are read as one continuous typical year',
  ],
};

const TIME_HEADER = /^\s*time\s*\(\s*utc\s*\)\s*([,;\t])/i;
const BLOCK_LINE = /^\s*(latitude|longitude|elevation)\b[^:]*:[\s,;]*([^\s,;]*)/i;
const TIME_CELL = /^\s*(\d{4})(\d{2})(\d{2}):(\d{2})(\d{2})\s*$/;
const LOOKS_LIKE_DATA = /^\s*\d{8}:\d{4}/;

/** Whether the text is a header-block CSV: a `time(UTC)` header, or `Latitude …:` and `Longitude …:` lines, near the top. */
export function looksLikeHeaderBlockCsv(text: string): boolean {
  const head = text.slice(0, 8000).split('\n', 60);
  if (head.some((l) => TIME_HEADER.test(l))) return true;
  return head.some((l) => /^\s*latitude\b[^:]*:/i.test(l)) && head.some((l) => /^\s*longitude\b[^:]*:/i.test(l));
}

const KNOWN: Record<string, FormatColumn> = {
  t2m: { header: 'T2m', holds: { quantity: 'dry-bulb', unit: 'C' } },
  rh: { header: 'RH', holds: { quantity: 'relative-humidity', unit: '%' } },
  sp: { header: 'SP', holds: { quantity: 'pressure', unit: 'Pa' } },
};

/** Reads a header-block CSV (BOM and line ends already handled by the caller). */
export function readHeaderBlockCsv(text: string, override: Partial<ColumnMappingOverride>, ctx: Context): ClimateSeries | null {
  const { log } = ctx;
  const header: FileHeader = {
    line: 0,
    name: null,
    region: null,
    country: null,
    source: null,
    stationId: null,
    latitude: null,
    longitude: null,
    elevationM: null,
    utcOffsetHours: null,
  };
  let headerLine = 0;
  let headerCells: string[] = [];
  let delimiter: ',' | ';' | '\t' = ',';
  let dataFrom = 0;
  let offset = 0;
  const limits = { latitude: [-90, 90, '°'], longitude: [-180, 180, '°'], elevation: [-450, 9000, 'm'] } as const;
  forEachLine(text, 0, 1, (line, n) => {
    offset += line.length + (text.charCodeAt(offset + line.length) === 13 ? 2 : 1);
    const time = TIME_HEADER.exec(line);
    if (time) {
      headerLine = n;
      delimiter = time[1] as ',' | ';' | '\t';
      headerCells = line.split(delimiter).map((c) => c.trim());
      dataFrom = offset;
      return false;
    }
    const block = BLOCK_LINE.exec(line);
    if (!block) return true;
    const key = block[1].toLowerCase() as keyof typeof limits;
    const [min, max, unit] = limits[key];
    const value = Number(block[2]);
    if (block[2] === '' || !Number.isFinite(value) || value < min || value > max) {
      log.warning('format-header', `${block[1]} "${block[2]}" on line ${n} is not a number from ${min} to ${max} ${unit}; it is not used.`, {
        line: n,
        value: block[2],
      });
      return true;
    }
    if (header.line === 0) header.line = n;
    if (key === 'elevation') header.elevationM = value;
    else header[key] = value;
    return true;
  });
  if (header.line !== 0) ctx.fileHeader = header;
  if (headerLine === 0) {
    log.error(
      'missing-time',
      'The file starts with a header block (latitude, longitude, elevation) but has no column header starting "time(UTC)", so its hours cannot be found.',
    );
    return null;
  }

  const columns: FormatColumn[] = headerCells.map((h) => KNOWN[h.toLowerCase()] ?? { header: h });
  const find = (name: string) => headerCells.findIndex((h) => h.toLowerCase() === name);
  const dry = find('t2m');
  const rh = find('rh');
  const sp = find('sp');
  const missing = [dry === -1 ? 'T2m (dry-bulb °C)' : '', rh === -1 ? 'RH (relative humidity %)' : ''].filter(Boolean);
  if (missing.length > 0) {
    log.error(
      dry === -1 ? 'missing-dry-bulb' : 'missing-humidity',
      `The column header on line ${headerLine} has no ${missing.join(' and no ')} column (columns: ${headerCells.join(', ')}).`,
      { line: headerLine },
    );
    return null;
  }
  const time: TimeMapping = { layout: 'iso', column: 0, confidence: 1, description: 'time(UTC) written yyyymmdd:hhmm, in UTC' };
  const recognition = formatRecognition(
    HEADER_BLOCK_CSV_FORMAT,
    columns,
    { delimiter, headerLine, time },
    { dryBulb: dry, humidity: rh, pressure: sp === -1 ? null : sp },
    override,
    ctx,
  );
  ctx.timeZone = 'UTC';
  if (log.hasErrors()) return null;

  const lines: string[] = [];
  const numbers: number[] = [];
  let legendFrom = 0;
  let legendLines = 0;
  let dataAfterLegend = 0;
  forEachLine(text, dataFrom, headerLine + 1, (line, n) => {
    if (legendFrom === 0) {
      const c = line.trimStart().charCodeAt(0);
      const isDigit = c >= 48 && c <= 57;
      if (isDigit) {
        lines.push(line);
        numbers.push(n);
        return;
      }
      legendFrom = n;
    }
    if (line.trim() === '') return;
    legendLines++;
    if (LOOKS_LIKE_DATA.test(line) && dataAfterLegend++ < 3) {
      log.warning('legend-skipped', `Line ${n} looks like data but comes after the data ended on line ${legendFrom}; it is not read.`, {
        line: n,
        value: line.slice(0, 60),
      });
    }
  });
  if (legendLines > 0)
    log.info('legend-skipped', `The ${legendLines} lines from line ${legendFrom} on are the legend after the data; they are not read.`, { line: legendFrom });
  if (lines.length === 0) {
    log.error('header-only', `The file has its column header on line ${headerLine} but no data rows after it.`, { line: headerLine });
    return null;
  }

  const rows = new FormatRows(lines.length, columns, recognition, ctx);
  const needed = rows.neededFields();
  for (let i = 0; i < lines.length; i++) {
    const line = numbers[i];
    const cells = lines[i].split(delimiter);
    if (cells.length < needed) {
      rejectRow(ctx, line, `Line ${line}: ${cells.length} fields, expected ${headerCells.length} as in the column header; the row is left out.`, {
        value: lines[i].slice(0, 80),
      });
      continue;
    }
    const t = TIME_CELL.exec(cells[0]);
    if (!t) {
      rejectRow(ctx, line, `time "${cells[0].trim()}" on line ${line} is not written yyyymmdd:hhmm; the row is left out.`, {
        column: headerCells[0],
        value: cells[0].trim(),
      });
      continue;
    }
    const [year, month, day, hour, minute] = [Number(t[1]), Number(t[2]), Number(t[3]), Number(t[4]), Number(t[5])];
    if (month < 1 || month > 12 || day < 1 || year < 1000 || day > daysInMonth(year, month)) {
      rejectRow(ctx, line, `date ${t[1]}-${t[2]}-${t[3]} on line ${line} does not exist; the row is left out.`, {
        column: headerCells[0],
        value: cells[0].trim(),
      });
      continue;
    }
    if (hour > 23 || minute > 59) {
      rejectRow(ctx, line, `${hour > 23 ? `hour ${hour}` : `minute ${minute}`} on line ${line}: times run 00:00–23:59 (UTC); the row is left out.`, {
        column: headerCells[0],
        value: cells[0].trim(),
      });
      continue;
    }
    const ms = daysFromCivil(year, month, day) * MS_PER_DAY + hour * MS_PER_HOUR + minute * MS_PER_MINUTE;
    rows.add(line, ms, ms, cells);
  }
  return rows.finish();
}
