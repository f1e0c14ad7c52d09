/**
 * From raw text to rows of cells with their line numbers: BOM, binary check, leading comment
 * lines, delimiter sniffing, and rows (papaparse for quoted text; a row-at-a-time split otherwise).
 */
// @ts-nocheck

import Papa from 'papaparse';

export type Delimiter = ',' | ';' | '\t';
const DELIMITERS: Delimiter[] = ['\t', ';', ','];

export function stripBom(text: string): string {
  return text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
}

/**
 * True when the start of the text reads as binary rather than text: a NUL character, or more
 * than 2 % control or replacement characters (what a decoder leaves of non-text bytes).
 */
export function looksBinary(text: string): boolean {
  const end = Math.min(text.length, 8192);
  let odd = 0;
  for (let i = 0; i < end; i++) {
    const c = text.charCodeAt(i);
    if (c === 0) return true;
    if ((c < 32 && c !== 9 && c !== 10 && c !== 13) || c === 0xfffd || (c >= 0x7f && c < 0xa0)) odd++;
  }
  return end > 0 && odd / end > 0.02;
}

export interface Body {
  /** Text after the leading comment and blank lines. */
  text: string;
  /** 1-based line number of the first line of `text`. */
  firstLine: number;
  commentLines: number;
}

/** Leading lines that are blank or start with '#' are notes, not data: skip them. */
export function skipLeadingComments(text: string): Body {
  let offset = 0;
  let line = 1;
  let commentLines = 0;
  while (offset < text.length) {
    let end = text.indexOf('\n', offset);
    if (end === -1) end = text.length;
    const content = text.slice(offset, end).trim();
    if (content !== '' && !content.startsWith('#')) break;
    if (content !== '') commentLines++;
    offset = end + 1;
    line++;
  }
  return { text: offset >= text.length ? '' : text.slice(offset), firstLine: line, commentLines };
}

/** The first `count` lines of the text (cheap: no split of the whole text). */
export function firstLines(text: string, count: number): string[] {
  const lines: string[] = [];
  let offset = 0;
  while (lines.length < count && offset < text.length) {
    let end = text.indexOf('\n', offset);
    if (end === -1) end = text.length;
    const line = text.slice(offset, end).replace(/\r$/, '');
    if (line.trim() !== '' && !line.trimStart().startsWith('#')) lines.push(line);
    offset = end + 1;
  }
  return lines;
}

function fieldCount(line: string, delimiter: string): number {
  let count = 1;
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const c = line[i];
    if (c === '"') quoted = !quoted;
    else if (c === delimiter && !quoted) count++;
  }
  return count;
}

/**
 * The delimiter that splits the sample lines into the same number (≥ 2) of fields most
 * consistently; ties go to tab, then semicolon, then comma, since a comma may also be a
 * decimal separator.
 */
export function sniffDelimiter(lines: string[]): Delimiter {
  let best: Delimiter = ',';
  let bestScore = -1;
  for (const delimiter of DELIMITERS) {
    const counts = lines.map((line) => fieldCount(line, delimiter));
    const tally = new Map<number, number>();
    for (const n of counts) tally.set(n, (tally.get(n) ?? 0) + 1);
    let modal = 1;
    let modalCount = 0;
    for (const [n, times] of tally) {
      if (times > modalCount || (times === modalCount && n > modal)) {
        modal = n;
        modalCount = times;
      }
    }
    if (modal < 2) continue;
    const score = modalCount / Math.max(1, counts.length);
    if (score > bestScore + 1e-9) {
      best = delimiter;
      bestScore = score;
    }
  }
  return best;
}

export interface ParsedRows {
  /** Number of rows, blank and comment rows included. */
  count: number;
  /**
   * The cells of one row. For text without quotes the row is split when asked for, so a long file is
   * held as its text plus one offset per line rather than as millions of small strings that outlive
   * the young-generation collector.
   */
  row: (rowIndex: number) => string[];
  /** The same cells as bounds in a text, into `cells` (reused), for readers that parse cells in place. */
  rowCells: (rowIndex: number, cells: RowCells) => RowCells;
  /** 1-based line number where each row starts. */
  lineOf: (rowIndex: number) => number;
  /** Malformed quoting reported by papaparse: row index and message. */
  errors: { row: number; message: string }[];
}

/**
 * The cells of one row as bounds in a text: cell k is text.substring(starts[k], ends[k]). For text without quotes the
 * text is the file's own, so reading a row makes no string at all.
 */
export interface RowCells {
  text: string;
  count: number;
  starts: Int32Array;
  ends: Int32Array;
}

export function newRowCells(): RowCells {
  return { text: '', count: 0, starts: new Int32Array(16), ends: new Int32Array(16) };
}

/** Cell k of the row as a string; undefined past the row's last cell. For messages and slow paths. */
export function cellText(row: RowCells, k: number): string | undefined {
  return k < row.count ? row.text.substring(row.starts[k], row.ends[k]) : undefined;
}

/** The row's cells as strings (messages only). */
export function rowCellTexts(row: RowCells): string[] {
  return Array.from({ length: row.count }, (_, k) => cellText(row, k)!);
}

function addCell(cells: RowCells, start: number, end: number): void {
  if (cells.count === cells.starts.length) {
    const starts = new Int32Array(cells.count * 2);
    const ends = new Int32Array(cells.count * 2);
    starts.set(cells.starts);
    ends.set(cells.ends);
    cells.starts = starts;
    cells.ends = ends;
  }
  cells.starts[cells.count] = start;
  cells.ends[cells.count] = end;
  cells.count++;
}

/** The bounds of the cells of text[start, end) split at the delimiter, into `cells`. */
function boundsInto(text: string, start: number, end: number, delimiter: string, cells: RowCells): RowCells {
  cells.text = text;
  cells.count = 0;
  let from = start;
  for (let at = text.indexOf(delimiter, from); at !== -1 && at < end; at = text.indexOf(delimiter, from)) {
    addCell(cells, from, at);
    from = at + 1;
  }
  addCell(cells, from, end);
  return cells;
}

/** Cells already split (papaparse's rows) as bounds in their joined text. */
function boundsOfRow(row: string[], cells: RowCells): RowCells {
  cells.text = row.join('');
  cells.count = 0;
  let offset = 0;
  for (const cell of row) {
    addCell(cells, offset, offset + cell.length);
    offset += cell.length;
  }
  return cells;
}

/**
 * Splits the body into rows, keeping each row's line number. Text with quotes goes through papaparse;
 * text without quotes is split at every LF and every delimiter, as papaparse's fast mode does, but one
 * row at a time. Mixed CRLF/LF files keep one row per line; cell readers ignore a trailing CR.
 */
export function parseRows(body: Body, delimiter: Delimiter): ParsedRows {
  const text = body.text;
  if (!text.includes('"')) {
    const starts = lineStarts(text);
    const count = starts.length - 1;
    return {
      count,
      row: (i) => text.slice(starts[i], starts[i + 1] - 1).split(delimiter),
      rowCells: (i, cells) => boundsInto(text, starts[i], starts[i + 1] - 1, delimiter, cells),
      lineOf: (i) => body.firstLine + i,
      errors: [],
    };
  }
  const result = Papa.parse<string[]>(text, { delimiter, header: false, skipEmptyLines: false, dynamicTyping: false });
  const rows = result.data;
  const errors = result.errors.filter((e) => e.type === 'Quotes').map((e) => ({ row: e.row ?? 0, message: e.message }));
  const starts = rowStartLines(text, body.firstLine);
  return {
    count: rows.length,
    row: (i) => rows[i],
    rowCells: (i, cells) => boundsOfRow(rows[i], cells),
    lineOf: (i) => starts[i] ?? body.firstLine + i,
    errors,
  };
}

/** Offset where each LF-separated line starts, then one past the text's end: line i is text[starts[i], starts[i + 1] - 1). */
function lineStarts(text: string): Int32Array {
  let lines = 1;
  for (let at = text.indexOf('\n'); at !== -1; at = text.indexOf('\n', at + 1)) lines++;
  const starts = new Int32Array(lines + 1);
  let k = 1;
  for (let at = text.indexOf('\n'); at !== -1; at = text.indexOf('\n', at + 1)) starts[k++] = at + 1;
  starts[lines] = text.length + 1;
  return starts;
}

/** Line on which each row starts, counting line breaks inside quoted fields. */
function rowStartLines(text: string, firstLine: number): number[] {
  const starts = [firstLine];
  let line = firstLine;
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 34) quoted = !quoted;
    else if (c === 10 || (c === 13 && text.charCodeAt(i + 1) !== 10)) {
      line++;
      if (!quoted) starts.push(line);
    }
  }
  return starts;
}

/**
 * Lines of the text (a final line end adds none) and its longest line — characters without the line end, and its
 * 1-based number — in one pass.
 */
export function scanLines(text: string): { lines: number; longest: { length: number; line: number } } {
  if (text.length === 0) return { lines: 0, longest: { length: 0, line: 0 } };
  let longest = 0;
  let longestAt = 0;
  let start = 0;
  let lines = 0;
  while (start < text.length) {
    let end = text.indexOf('\n', start);
    if (end === -1) end = text.length;
    lines++;
    const length = end - start - (end > start && text.charCodeAt(end - 1) === 13 ? 1 : 0);
    if (length > longest) {
      longest = length;
      longestAt = lines;
    }
    start = end + 1;
  }
  return { lines, longest: { length: longest, line: longestAt } };
}
