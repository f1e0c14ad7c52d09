/** Where the header and the data are among the parsed rows, and a sample of data rows spread over the file. */
// @ts-nocheck

import type { ParsedRows } from './delimited-text';
import { SAMPLE_ROWS, type Context } from './import-context';
import { parseNumberCell } from './number-cells';
import { parseDateTimeCell, parseTimeCell } from './time-cells';

export function isBlankRow(row: string[]): boolean {
  return row.length === 0 || (row.length === 1 && row[0].trim() === '');
}

export function isCommentRow(row: string[]): boolean {
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

export interface Layout {
  headerIndex: number;
  dataStart: number;
  headers: string[];
  hasHeader: boolean;
}

/** Finds the header row (the first row with the modal field count) and an optional units row below it. */
export function findLayout(parsed: ParsedRows, ctx: Context): Layout | null {
  const candidates: number[] = [];
  for (let i = 0; i < parsed.count && candidates.length < 60; i++) {
    const row = parsed.row(i);
    if (!isBlankRow(row) && !isCommentRow(row)) candidates.push(i);
  }
  if (candidates.length === 0) return null;
  const tally = new Map<number, number>();
  for (const i of candidates) tally.set(width(parsed.row(i)), (tally.get(width(parsed.row(i))) ?? 0) + 1);
  let modal = width(parsed.row(candidates[0]));
  for (const [n, times] of tally) if (times > (tally.get(modal) ?? 0)) modal = n;
  const headerIndex = candidates.find((i) => width(parsed.row(i)) === modal) ?? candidates[0];
  for (const i of candidates) {
    if (i >= headerIndex) break;
    ctx.log.info('preamble-skipped', 'A line before the header was skipped as a note.', {
      line: parsed.lineOf(i),
      value: parsed.row(i).join(' ').slice(0, 80),
    });
  }
  const headerRow = parsed.row(headerIndex);
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
  while (dataStart < parsed.count && (isBlankRow(parsed.row(dataStart)) || isCommentRow(parsed.row(dataStart)))) dataStart++;
  const next = dataStart < parsed.count ? parsed.row(dataStart) : undefined;
  if (next && width(next) === width(headerRow) && next.some((c) => c.trim() !== '') && next.every((c) => c.trim() === '' || isTextCell(c))) {
    // a second header row holding the units, as spreadsheets often have
    for (let i = 0; i < headers.length; i++) if ((next[i] ?? '').trim() !== '') headers[i] = `${headers[i]} (${next[i].trim()})`;
    dataStart++;
  }
  return { headerIndex, dataStart, headers, hasHeader: true };
}

export function spreadSample(parsed: ParsedRows, dataStart: number): string[][] {
  const sample: string[][] = [];
  const total = parsed.count - dataStart;
  const stride = Math.max(1, Math.floor(total / SAMPLE_ROWS));
  for (let i = dataStart; i < parsed.count; i += i < dataStart + 48 ? 1 : stride) {
    const row = parsed.row(i);
    if (!isBlankRow(row) && !isCommentRow(row)) sample.push(row);
  }
  return sample;
}
