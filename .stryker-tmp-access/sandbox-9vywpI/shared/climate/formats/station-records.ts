/**
 * Fixed-width hourly station records, as multi-year national archives publish them in their
 * compact hourly layouts: one line per observation, twelve whitespace-separated integer columns
 *
 *   year  month  day  hour(UTC)  air-temperature  dew-point  sea-level-pressure
 *   wind-direction  wind-speed  sky-cover  precipitation-1h  precipitation-6h
 *
 * with temperatures in tenths of °C, pressure in tenths of hPa, −9999 for a missing value.
 * Sea-level pressure is reduced to sea level, so it is not the station pressure the moist-air
 * state needs: it is not read, and every hour takes the standard atmosphere at the site's elevation.
 */
// @ts-nocheck

import type { Context } from '../import-context';
import { daysFromCivil, daysInMonth, MS_PER_DAY, MS_PER_HOUR } from '../time-cells';
import type { ClimateSeries, ColumnMappingOverride, RecognisedFormat } from '../types';
import { forEachLine, FormatRows, formatRecognition, integerIn, rejectRow, yearMonthDayHour, type FormatColumn } from './format-rows';

export const STATION_RECORDS_FORMAT: RecognisedFormat = {
  id: 'fixed-width-station',
  name: 'fixed-width station records',
  conventions: [
    'one line per hour, twelve whitespace-separated integer columns: year, month, day, hour (UTC), air temperature, dew point, sea-level pressure, wind direction, wind speed, sky cover, precipitation 1 h, precipitation 6 h',
    'temperatures in tenths of °C, sea-level pressure in tenths of hPa; −9999 marks a missing value',
    'hours 0–23 in UTC, each stamp at the start of its hour',
    'sea-level pressure is not station pressure: it is not used, and each hour takes the standard atmosphere at the site’s elevation',
  ],
};

const MISSING = [-9999];
const NOT_STATION = 'it is sea-level pressure (reduced to sea level), not the pressure at the station.';
const COLUMNS: FormatColumn[] = [
  { header: 'year' },
  { header: 'month' },
  { header: 'day' },
  { header: 'hour (UTC)' },
  { header: 'air temperature (0.1 °C)', holds: { quantity: 'dry-bulb', unit: 'C' }, cellScale: 0.1, missingCodes: MISSING },
  { header: 'dew point (0.1 °C)', holds: { quantity: 'dew-point', unit: 'C' }, cellScale: 0.1, missingCodes: MISSING },
  {
    header: 'sea-level pressure (0.1 hPa)',
    holds: { quantity: 'pressure', unit: 'hPa' },
    cellScale: 0.1,
    missingCodes: MISSING,
    notStationPressure: NOT_STATION,
  },
  { header: 'wind direction (°)' },
  { header: 'wind speed (0.1 m/s)' },
  { header: 'sky cover' },
  { header: 'precipitation 1 h (0.1 mm)' },
  { header: 'precipitation 6 h (0.1 mm)' },
];
const FIELDS = COLUMNS.length;
const RECORD = /^\s*\d{4}(?:[ \t]+-?\d+){7,13}\s*$/;

/** Whether the text is fixed-width station records: most of its first 20 lines are 8–14 whitespace-separated integers starting with a year. */
export function looksLikeStationRecords(text: string): boolean {
  const lines = text
    .slice(0, 4000)
    .split('\n', 21)
    .filter((l) => l.trim() !== '' && !l.trimStart().startsWith('#'))
    .slice(0, 20);
  if (lines.length === 0) return false;
  return lines.filter((l) => RECORD.test(l)).length * 2 > lines.length && RECORD.test(lines[0]);
}

/**
 * Splits a line at runs of spaces and tabs into `cells` (reused), returns the number of fields;
 * only the first `keep` fields are cut out as strings (the rest are only counted).
 */
function splitWhitespace(line: string, cells: string[], keep: number): number {
  let k = 0;
  let i = 0;
  const n = line.length;
  while (i < n) {
    let c = line.charCodeAt(i);
    while (i < n && (c === 32 || c === 9 || c === 13)) c = line.charCodeAt(++i);
    if (i >= n) break;
    const start = i;
    while (i < n && c !== 32 && c !== 9 && c !== 13) c = line.charCodeAt(++i);
    cells[k] = k < keep ? line.substring(start, i) : '';
    k++;
  }
  cells.length = k;
  return k;
}

/** Reads fixed-width station records (BOM and line ends already handled by the caller). */
export function readStationRecords(text: string, override: Partial<ColumnMappingOverride>, ctx: Context): ClimateSeries | null {
  const { log } = ctx;
  const time = yearMonthDayHour('beginning-0-23', 'year, month, day and hour 0–23 in UTC (fixed-width station records)');
  // whitespace-separated: tab is the nearest delimiter the mapping type names; the format splits at any run of spaces or tabs
  const layout = { delimiter: '\t' as const, headerLine: null, time };
  const recognition = formatRecognition(STATION_RECORDS_FORMAT, COLUMNS, layout, { dryBulb: 4, humidity: 5, pressure: null }, override, ctx);
  ctx.timeZone = 'UTC';
  if (log.hasErrors()) return null;
  if (!recognition.pressure) {
    log.info(
      'pressure-from-elevation',
      'The records give sea-level pressure, which is not station pressure: it is not used, and every hour takes the standard-atmosphere pressure at the site’s elevation.',
      {
        column: COLUMNS[6].header,
      },
    );
  }

  let capacity = 1;
  for (let at = text.indexOf('\n'); at !== -1; at = text.indexOf('\n', at + 1)) capacity++;
  const rows = new FormatRows(capacity, COLUMNS, recognition, ctx);
  const cells: string[] = [];
  const keep = Math.max(4, rows.neededFields());
  forEachLine(text, 0, 1, (line, n) => {
    const count = splitWhitespace(line, cells, keep);
    if (count === 0 || cells[0].startsWith('#')) return;
    if (count !== FIELDS) {
      rejectRow(
        ctx,
        n,
        `Line ${n}: ${count} field${count === 1 ? '' : 's'}, expected ${FIELDS} (year month day hour temperature dew-point sea-level-pressure wind-direction wind-speed sky-cover precipitation-1h precipitation-6h); the line is left out.`,
        {
          value: line.slice(0, 80),
        },
      );
      return;
    }
    const year = integerIn(cells[0], 1000, 9999);
    const month = integerIn(cells[1], 1, 12);
    const hour = integerIn(cells[3], 0, 23);
    if (year !== year || month !== month) {
      rejectRow(
        ctx,
        n,
        `${year !== year ? `year "${cells[0]}"` : `month ${cells[1]}`} on line ${n} is not a ${year !== year ? 'year' : 'month (1–12)'}; the line is left out.`,
        { value: line.slice(0, 40) },
      );
      return;
    }
    const day = integerIn(cells[2], 1, daysInMonth(year, month));
    if (day !== day) {
      rejectRow(ctx, n, `day ${cells[2]} on line ${n}: ${year}-${String(month).padStart(2, '0')} has ${daysInMonth(year, month)} days; the line is left out.`, {
        column: 'day',
        value: cells[2],
      });
      return;
    }
    if (hour !== hour) {
      rejectRow(ctx, n, `hour ${cells[3]} on line ${n}: hours run 0–23 (UTC); the line is left out.`, { column: 'hour (UTC)', value: cells[3] });
      return;
    }
    const ms = daysFromCivil(year, month, day) * MS_PER_DAY + hour * MS_PER_HOUR;
    rows.add(n, ms, ms, cells);
  });
  return rows.finish();
}
