/**
 * The station line some typical-year CSVs carry above their column header:
 * `station number, "name", region, UTC offset (h), latitude, longitude, elevation (m)`.
 * The general importer skips it as a note; this reads what it says about the station.
 */
// @ts-nocheck

import type { Context } from '../import-context';
import { fixedOffsetMs, fixedOffsetZone } from '../../time-zone';
import type { FileHeader } from '../types';

/** The header a station line gives, or null when the line is not one (seven fields, the last four numbers in range). */
export function readStationLine(cells: string[], line: number): FileHeader | null {
  if (cells.length !== 7) return null;
  const number = (i: number, min: number, max: number): number => {
    const text = cells[i].trim();
    const n = text === '' ? NaN : Number(text);
    return n >= min && n <= max ? n : NaN;
  };
  const offset = number(3, -12, 14);
  const latitude = number(4, -90, 90);
  const longitude = number(5, -180, 180);
  const elevationM = number(6, -450, 9000);
  if ([offset, latitude, longitude, elevationM].some((n) => n !== n)) return null;
  const text = (i: number) =>
    cells[i]
      .trim()
      .replace(/^"(.*)"$/, '$1')
      .trim() || null;
  return { line, name: text(1), region: text(2), country: null, source: null, stationId: text(0), latitude, longitude, elevationM, utcOffsetHours: offset };
}

/** Keeps what a station line says and warns when the file's times are read at another offset than it gives. */
export function noteStationLine(ctx: Context, header: FileHeader | null): void {
  ctx.fileHeader = header;
  if (!header || header.utcOffsetHours === null) return;
  const zone = fixedOffsetZone(Math.round(header.utcOffsetHours * 60));
  const asked = ctx.timeZone === 'UTC' ? 0 : fixedOffsetMs(ctx.timeZone);
  if (asked !== fixedOffsetMs(zone)) {
    ctx.log.warning(
      'format-header',
      `The station line (line ${header.line}) gives the file's times as ${zone}; they are read in ${ctx.timeZone} as asked. Typical-year files are usually in local standard time: if so, read the file in the site's standard time.`,
      { line: header.line },
    );
  }
}
