/**
 * EPW weather files (the open EnergyPlus weather format): eight header records, then one
 * comma-separated record per hour. Fields used, 1-based as the format's data dictionary counts them:
 * 1 year, 2 month, 3 day, 4 hour 1–24 (hour ending, local standard time), 5 minute, 6 data-source
 * flags, 7 dry-bulb °C, 8 dew point °C, 9 relative humidity %, 10 station pressure Pa; the
 * radiation, wind and sky fields after them are not needed. Missing values: 99.9 for the
 * temperatures, 999 for RH, 999999 for pressure. Times are in local standard time at the offset the
 * LOCATION record gives (hours, east positive).
 */
// @ts-nocheck

import type { Context } from '../import-context';
import { daysFromCivil, daysInMonth, MS_PER_DAY, MS_PER_HOUR } from '../time-cells';
import type { ClimateSeries, ColumnMappingOverride, FileHeader, RecognisedFormat } from '../types';
import { fixedOffsetZone } from '../../time-zone';
import { forEachLine, FormatRows, formatRecognition, integerIn, rejectRow, yearMonthDayHour, type FormatColumn } from './format-rows';

export const EPW_FORMAT: RecognisedFormat = {
  id: 'epw',
  name: 'EPW',
  conventions: [
    'eight header records (LOCATION, DESIGN CONDITIONS, TYPICAL/EXTREME PERIODS, GROUND TEMPERATURES, HOLIDAYS/DAYLIGHT SAVINGS, COMMENTS 1, COMMENTS 2, DATA PERIODS), then one record per hour',
    'year, month, day and hour 1–24 (hour ending) in local standard time at the LOCATION record’s UTC offset',
    'dry-bulb °C (field 7), dew point °C (field 8), relative humidity % (field 9), station pressure Pa (field 10)',
    '99.9 marks a missing temperature, 999 a missing RH, 999999 a missing pressure',
    'months taken from different years are read as one continuous typical year',
  ],
};

const HEADER_RECORDS = [
  'LOCATION',
  'DESIGN CONDITIONS',
  'TYPICAL/EXTREME PERIODS',
  'GROUND TEMPERATURES',
  'HOLIDAYS/DAYLIGHT SAVINGS',
  'COMMENTS 1',
  'COMMENTS 2',
  'DATA PERIODS',
];
/** Fields a record needs: year … station pressure. */
const NEEDED_FIELDS = 10;
const TEMPERATURE_MISSING = [99.9];

const COLUMNS: FormatColumn[] = [
  { header: 'Year' },
  { header: 'Month' },
  { header: 'Day' },
  { header: 'Hour (1–24, hour ending)' },
  { header: 'Minute' },
  { header: 'Data source and uncertainty flags' },
  { header: 'Dry bulb temperature (°C)', holds: { quantity: 'dry-bulb', unit: 'C' }, missingCodes: TEMPERATURE_MISSING },
  { header: 'Dew point temperature (°C)', holds: { quantity: 'dew-point', unit: 'C' }, missingCodes: TEMPERATURE_MISSING },
  { header: 'Relative humidity (%)', holds: { quantity: 'relative-humidity', unit: '%' }, missingCodes: [999] },
  { header: 'Atmospheric station pressure (Pa)', holds: { quantity: 'pressure', unit: 'Pa' }, missingCodes: [999999] },
];

/** Whether the text is an EPW file: its first line is a LOCATION record. */
export function looksLikeEpw(text: string): boolean {
  let start = 0;
  while (start < text.length && /\s/.test(text[start])) start++;
  return /^LOCATION\s*,/i.test(text.slice(start, start + 20));
}

function recordName(firstField: string): string | null {
  const name = firstField.trim().toUpperCase();
  return HEADER_RECORDS.find((r) => r === name) ?? null;
}

function numberField(fields: string[], index: number, min: number, max: number): number | null {
  const text = (fields[index] ?? '').trim();
  if (text === '') return null;
  const n = Number(text);
  return Number.isFinite(n) && n >= min && n <= max ? n : NaN;
}

interface EpwHeader {
  header: FileHeader;
  offsetMinutes: number;
  dataStart: number;
  dataLine: number;
}

/** Reads the header records up to the first data record; errors and warnings go to the log. */
function readHeader(text: string, ctx: Context): EpwHeader | null {
  const { log } = ctx;
  const seen = new Set<string>();
  let location: { fields: string[]; line: number } | null = null;
  let recordsPerHour = 1;
  let dataStart = -1;
  let dataLine = 0;
  let offset = 0;
  forEachLine(text, 0, 1, (line, lineNumber) => {
    const fields = line.split(',');
    if (line.trim() !== '' && /^\s*[+-]?\d/.test(fields[0])) {
      dataStart = offset;
      dataLine = lineNumber;
      return false;
    }
    offset += line.length + (text.charCodeAt(offset + line.length) === 13 ? 2 : 1);
    if (line.trim() === '') return true;
    const name = recordName(fields[0]);
    if (name === null) {
      log.warning(
        'format-header',
        `EPW record ${lineNumber}: "${fields[0].trim().slice(0, 40)}" is not one of the eight header records (${HEADER_RECORDS.join(', ')}); it is skipped.`,
        { line: lineNumber },
      );
      return true;
    }
    seen.add(name);
    if (name === 'LOCATION') location = { fields, line: lineNumber };
    if (name === 'DATA PERIODS') {
      const perHour = integerIn(fields[2], 1, 60);
      if (perHour === perHour) recordsPerHour = perHour;
      else
        log.warning(
          'format-header',
          `EPW record ${lineNumber} (DATA PERIODS): records per hour "${(fields[2] ?? '').trim()}" is not a whole number from 1 to 60; hourly records are assumed.`,
          { line: lineNumber },
        );
    }
    return true;
  });
  const missing = HEADER_RECORDS.filter((r) => !seen.has(r));
  if (missing.length > 0) {
    log.warning(
      'format-header',
      `The EPW header lacks the record${missing.length > 1 ? 's' : ''} ${missing.join(', ')}; the hourly records are read all the same.`,
    );
  }
  if (recordsPerHour !== 1) {
    log.error('format-header', `The EPW DATA PERIODS record gives ${recordsPerHour} records per hour; only hourly EPW files (1 record per hour) are read.`);
    return null;
  }
  if (dataStart === -1) {
    log.error('header-only', 'The EPW file has its header records but no hourly records.');
    return null;
  }
  const loc = location as { fields: string[]; line: number } | null;
  if (!loc) {
    log.error('format-header', 'The EPW file has no LOCATION record, so the UTC offset of its local standard time is unknown.');
    return null;
  }
  const f = loc.fields;
  const at = `EPW record ${loc.line} (LOCATION)`;
  const text2 = (i: number) => (f[i] ?? '').trim() || null;
  const checked = (i: number, what: string, min: number, max: number, unit: string): number | null => {
    const n = numberField(f, i, min, max);
    if (n !== n) {
      log.warning('format-header', `${at}: ${what} "${(f[i] ?? '').trim()}" is not a number from ${min} to ${max} ${unit}; it is not used.`, {
        line: loc.line,
        value: (f[i] ?? '').trim(),
      });
      return null;
    }
    return n;
  };
  const offsetHours = numberField(f, 8, -12, 14);
  if (offsetHours === null || offsetHours !== offsetHours) {
    log.error(
      'format-header',
      `${at}: the time zone field "${(f[8] ?? '').trim()}" is not a UTC offset in hours from −12 to +14, so the local standard times cannot be placed.`,
      {
        line: loc.line,
        value: (f[8] ?? '').trim(),
      },
    );
    return null;
  }
  const header: FileHeader = {
    line: loc.line,
    name: text2(1),
    region: text2(2),
    country: text2(3),
    source: text2(4),
    stationId: text2(5),
    latitude: checked(6, 'latitude', -90, 90, '°'),
    longitude: checked(7, 'longitude', -180, 180, '°'),
    elevationM: checked(9, 'elevation', -1000, 9999.9, 'm'),
    utcOffsetHours: offsetHours,
  };
  return { header, offsetMinutes: Math.round(offsetHours * 60), dataStart, dataLine };
}

/** Which humidity field to read: dew point, unless it is mostly missing where RH is not. */
function humidityField(lines: string[]): number {
  let dewMissing = 0;
  let rhMissing = 0;
  const step = Math.max(1, Math.floor(lines.length / 500));
  for (let i = 0; i < lines.length; i += step) {
    const f = lines[i].split(',', NEEDED_FIELDS);
    if (Number(f[7]) === 99.9 || (f[7] ?? '').trim() === '') dewMissing++;
    if (Number(f[8]) === 999 || (f[8] ?? '').trim() === '') rhMissing++;
  }
  return dewMissing > rhMissing && dewMissing * 2 > Math.ceil(lines.length / step) ? 8 : 7;
}

/** Reads an EPW text (BOM and line ends already handled by the caller). */
export function readEpw(text: string, override: Partial<ColumnMappingOverride>, ctx: Context): ClimateSeries | null {
  const { log } = ctx;
  const head = readHeader(text, ctx);
  if (!head) return null;
  ctx.fileHeader = head.header;
  const zone = fixedOffsetZone(head.offsetMinutes);
  const offsetMs = head.offsetMinutes * 60_000;
  ctx.timeZone = zone;
  ctx.hourEnding = true;
  ctx.fileOffsetMs = offsetMs;

  const lines: string[] = [];
  const lineNumbers: number[] = [];
  forEachLine(text, head.dataStart, head.dataLine, (line, n) => {
    if (line.trim() === '') return;
    lines.push(line);
    lineNumbers.push(n);
  });
  let widest = NEEDED_FIELDS;
  for (let i = 0; i < Math.min(lines.length, 24); i++) widest = Math.max(widest, lines[i].split(',').length);
  const columns = [...COLUMNS];
  for (let c = columns.length; c < widest; c++) columns.push({ header: `Field ${c + 1}` });

  const time = yearMonthDayHour('ending-1-24', `EPW year, month, day and hour 1–24 (hour ending), local standard time at ${zone} from the LOCATION record`);
  const layout = { delimiter: ',' as const, headerLine: null, time };
  const recognition = formatRecognition(EPW_FORMAT, columns, layout, { dryBulb: 6, humidity: humidityField(lines), pressure: 9 }, override, ctx);
  if (log.hasErrors()) return null;

  const rows = new FormatRows(lines.length, columns, recognition, ctx);
  const needed = Math.max(NEEDED_FIELDS, rows.neededFields());
  for (let i = 0; i < lines.length; i++) {
    const line = lineNumbers[i];
    const fields = lines[i].split(',');
    if (fields.length < needed) {
      rejectRow(
        ctx,
        line,
        `EPW record ${line}: ${fields.length} field${fields.length === 1 ? '' : 's'}, expected at least ${needed} (year, month, day, hour, minute, flags, dry-bulb, dew point, RH, station pressure); the record is left out.`,
        {
          value: lines[i].slice(0, 80),
        },
      );
      continue;
    }
    const year = integerIn(fields[0], 1000, 9999);
    const month = integerIn(fields[1], 1, 12);
    const hour = integerIn(fields[3], 1, 24);
    if (year !== year) {
      rejectRow(ctx, line, `year "${fields[0].trim()}" on line ${line} is not a year; the record is left out.`, { column: 'Year', value: fields[0].trim() });
      continue;
    }
    if (month !== month) {
      rejectRow(ctx, line, `month ${fields[1].trim()} on line ${line}: months run 1–12; the record is left out.`, { column: 'Month', value: fields[1].trim() });
      continue;
    }
    const day = integerIn(fields[2], 1, daysInMonth(year, month));
    if (day !== day) {
      rejectRow(
        ctx,
        line,
        `day ${fields[2].trim()} on line ${line}: ${year}-${String(month).padStart(2, '0')} has ${daysInMonth(year, month)} days; the record is left out.`,
        {
          column: 'Day',
          value: fields[2].trim(),
        },
      );
      continue;
    }
    if (hour !== hour) {
      rejectRow(ctx, line, `hour ${fields[3].trim()} on line ${line}: EPW hours run 1–24 (hour ending); the record is left out.`, {
        column: 'Hour',
        value: fields[3].trim(),
      });
      continue;
    }
    const localMs = daysFromCivil(year, month, day) * MS_PER_DAY + hour * MS_PER_HOUR;
    rows.add(line, localMs, localMs - offsetMs, fields);
  }
  return rows.finish();
}
