/**
 * Reading dates and times from cells by their character codes: no Date object and no
 * allocation per cell, so a 30-year hourly file reads in a few tens of milliseconds.
 * Wall-clock results are "local milliseconds": epoch ms as if the wall time were UTC.
 */
// @ts-nocheck

import type { DateOrder } from './types';

export const MS_PER_MINUTE = 60_000;
export const MS_PER_HOUR = 3_600_000;
export const MS_PER_DAY = 86_400_000;

/**
 * Days since 1970-01-01 of a proleptic Gregorian date (H. Hinnant, "chrono-compatible low-level
 * date algorithms", days_from_civil). Month 1–12; no range check here.
 */
export function daysFromCivil(year: number, month: number, day: number): number {
  const y = month <= 2 ? year - 1 : year;
  const era = Math.floor(y / 400);
  const yoe = y - era * 400;
  const mp = (month + 9) % 12;
  const doy = Math.floor((153 * mp + 2) / 5) + day - 1;
  const doe = yoe * 365 + Math.floor(yoe / 4) - Math.floor(yoe / 100) + doy;
  return era * 146097 + doe - 719468;
}

export function daysInMonth(year: number, month: number): number {
  if (month === 2) return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0 ? 29 : 28;
  return month === 4 || month === 6 || month === 9 || month === 11 ? 30 : 31;
}

/** Days since epoch of a valid date in years 1000–9999, else NaN. */
export function civilDays(year: number, month: number, day: number): number {
  if (!(year >= 1000 && year <= 9999 && month >= 1 && month <= 12 && day >= 1)) return NaN;
  if (day > daysInMonth(year, month)) return NaN;
  return daysFromCivil(year, month, day);
}

/** State of the last successful parse, read right after a call (kept module-level to avoid allocation). */
export const lastParse = {
  /** Offset from UTC written in the cell, minutes; NaN when the cell has none. */
  offsetMinutes: NaN,
  /** Whether the cell held a time of day as well as a date. */
  hasTime: false,
  /** For D/M/Y-or-M/D/Y forms: the first and second number, so callers can detect the order. */
  firstGroup: 0,
  secondGroup: 0,
  /** True when the date was written with a 1–2 digit first group (day or month first). */
  shortFirst: false,
};

/** The cell being read is s[pos, end): a whole cell string, or a cell inside a line of the file. */
let pos = 0;
let end = 0;
/** Character code at i inside the cell, NaN past its end. */
const at = (s: string, i: number): number => (i < end ? s.charCodeAt(i) : Number.NaN);

function readDigits(s: string, maxCount: number): number {
  let value = 0;
  let count = 0;
  while (count < maxCount && pos < end) {
    const c = s.charCodeAt(pos) - 48;
    if (c < 0 || c > 9) break;
    value = value * 10 + c;
    pos++;
    count++;
  }
  digitCount = count;
  return value;
}
let digitCount = 0;
/** Digits read by the last readDigits call (a call, so the compiler does not narrow it across calls). */
function digitsRead(): number {
  return digitCount;
}

function skipSpaces(s: string): void {
  // space, tab, and a CR left by a file whose line ends are mixed
  while (pos < end && (s.charCodeAt(pos) === 32 || s.charCodeAt(pos) === 9 || s.charCodeAt(pos) === 13)) pos++;
}

function isDateSeparator(c: number): boolean {
  return c === 45 /* - */ || c === 47 /* / */ || c === 46; /* . */
}

/** Reads a date at `pos`; returns days since epoch or NaN. */
function readDate(s: string, order: DateOrder): number {
  const first = readDigits(s, 8);
  const firstCount = digitsRead();
  lastParse.shortFirst = false;
  if (firstCount === 8) {
    return civilDays(Math.floor(first / 10000), Math.floor(first / 100) % 100, first % 100);
  }
  if (pos >= end) return NaN;
  const sep = s.charCodeAt(pos);
  if (!isDateSeparator(sep)) return NaN;
  pos++;
  const second = readDigits(s, 2);
  if (digitsRead() === 0 || pos >= end || s.charCodeAt(pos) !== sep) return NaN;
  pos++;
  if (firstCount === 4) {
    const day = readDigits(s, 2);
    if (digitsRead() === 0) return NaN;
    return civilDays(first, second, day);
  }
  if (firstCount < 1 || firstCount > 2) return NaN;
  const year = readDigits(s, 4);
  if (digitsRead() !== 4) return NaN;
  lastParse.shortFirst = true;
  lastParse.firstGroup = first;
  lastParse.secondGroup = second;
  return order === 'MDY' ? civilDays(year, first, second) : civilDays(year, second, first);
}

/** Reads hh[:mm[:ss[.fff]]] at `pos`; returns ms since midnight (24:00 allowed) or NaN. */
function readClock(s: string, allowCompact: boolean): number {
  let hour = readDigits(s, allowCompact ? 4 : 2);
  let minute = 0;
  let second = 0;
  let ms = 0;
  if (digitsRead() === 0) return NaN;
  if (digitsRead() > 2) {
    // "1300" or "100": compact hhmm, as some loggers write
    minute = hour % 100;
    hour = Math.floor(hour / 100);
  } else if (pos < end && s.charCodeAt(pos) === 58 /* : */) {
    pos++;
    minute = readDigits(s, 2);
    if (digitsRead() !== 2) return NaN;
    if (pos < end && s.charCodeAt(pos) === 58) {
      pos++;
      second = readDigits(s, 2);
      if (digitsRead() !== 2) return NaN;
      if (pos < end && (s.charCodeAt(pos) === 46 || s.charCodeAt(pos) === 44)) {
        pos++;
        const fracStart = pos;
        const frac = readDigits(s, 9);
        if (digitsRead() === 0) return NaN;
        ms = Math.round((frac / 10 ** (pos - fracStart)) * 1000);
      }
    }
  }
  if (minute > 59 || second > 59) return NaN;
  const meridiem = readMeridiem(s);
  if (meridiem !== 0) {
    // 12-hour clock as US spreadsheets write it: 12:xx AM is just after midnight, 12:xx PM just after noon
    if (hour < 1 || hour > 12) return NaN;
    hour = (hour % 12) + (meridiem === 2 ? 12 : 0);
  }
  if (hour > 24 || (hour === 24 && (minute !== 0 || second !== 0 || ms !== 0))) return NaN;
  return hour * 3_600_000 + minute * 60_000 + second * 1000 + ms;
}

/** Reads an optional AM or PM (any case, dots allowed) at `pos`: 0 none, 1 AM, 2 PM. */
function readMeridiem(s: string): number {
  const start = pos;
  skipSpaces(s);
  const c = at(s, pos) | 32;
  if (c === 97 /* a */ || c === 112 /* p */) {
    let next = pos + 1;
    if (at(s, next) === 46) next++;
    if ((at(s, next) | 32) === 109 /* m */) {
      next++;
      if (at(s, next) === 46) next++;
      pos = next;
      return c === 97 ? 1 : 2;
    }
  }
  pos = start;
  return 0;
}

/** Reads an optional Z, UTC or ±hh[:mm] at `pos` into lastParse.offsetMinutes; false when malformed. */
function readOffset(s: string): boolean {
  lastParse.offsetMinutes = NaN;
  skipSpaces(s);
  if (pos >= end) return true;
  const c = s.charCodeAt(pos);
  if (c === 90 || c === 122 /* Z z */) {
    pos++;
    lastParse.offsetMinutes = 0;
    return true;
  }
  if ((c === 85 || c === 117) && pos + 3 <= end && s.slice(pos, pos + 3).toUpperCase() === 'UTC') {
    pos += 3;
    if (pos >= end) {
      lastParse.offsetMinutes = 0;
      return true;
    }
  }
  const signChar = at(s, pos);
  if (signChar !== 43 && signChar !== 45) return false;
  pos++;
  const hours = readDigits(s, 2);
  if (digitsRead() !== 2) return false;
  let minutes = 0;
  if (pos < end && s.charCodeAt(pos) === 58) pos++;
  if (pos < end) {
    minutes = readDigits(s, 2);
    if (digitsRead() !== 2) return false;
  }
  if (hours > 18 || minutes > 59) return false;
  lastParse.offsetMinutes = (signChar === 45 ? -1 : 1) * (hours * 60 + minutes);
  return true;
}

/**
 * A date with an optional time of day and offset, in one cell: ISO 8601 (`2021-03-01T13:00:00+01:00`,
 * `2021-03-01 13:00Z`), or `01.03.2021 13:00`-style with the given order. Returns local ms
 * (offset not applied; see lastParse.offsetMinutes) or NaN.
 */
export function parseDateTimeCell(cell: string, order: DateOrder): number {
  return parseDateTimeAt(cell, 0, cell.length, order);
}

/** {@link parseDateTimeCell} of the cell text[start, stop), read in place (no string is made for the cell). */
export function parseDateTimeAt(text: string, start: number, stop: number, order: DateOrder): number {
  pos = start;
  end = stop;
  lastParse.hasTime = false;
  lastParse.offsetMinutes = NaN;
  skipSpaces(text);
  const days = readDate(text, order);
  if (Number.isNaN(days)) return NaN;
  let clockMs = 0;
  if (pos < end) {
    const c = text.charCodeAt(pos);
    if (c === 84 || c === 116 || c === 32 || c === 9 /* T t space */) {
      pos++;
      skipSpaces(text);
      if (pos < end) {
        clockMs = readClock(text, false);
        if (Number.isNaN(clockMs)) return NaN;
        lastParse.hasTime = true;
      }
    }
  }
  if (!readOffset(text)) return NaN;
  skipSpaces(text);
  if (pos !== end) return NaN;
  return days * MS_PER_DAY + clockMs;
}

/** A date alone (a trailing 00:00 is tolerated, as spreadsheets write it); local ms of midnight or NaN. */
export function parseDateCell(cell: string, order: DateOrder): number {
  const ms = parseDateTimeCell(cell, order);
  if (Number.isNaN(ms) || !Number.isNaN(lastParse.offsetMinutes)) return NaN;
  if (ms % MS_PER_DAY !== 0) return NaN;
  return ms;
}

/** A time of day alone: `13:00`, `13:00:00`, `1300`, or a whole hour `13`; 24 allowed. Ms since midnight or NaN. */
export function parseTimeCell(cell: string): number {
  pos = 0;
  end = cell.length;
  skipSpaces(cell);
  const ms = readClock(cell, true);
  if (Number.isNaN(ms)) return NaN;
  skipSpaces(cell);
  return pos === end ? ms : NaN;
}

/** A whole number cell (year, month, day, hour); NaN otherwise. `60.0`-style decimals of a whole number pass. */
export function parseIntegerCell(cell: string): number {
  pos = 0;
  end = cell.length;
  skipSpaces(cell);
  const value = readDigits(cell, 6);
  if (digitsRead() === 0) return NaN;
  if (pos < end && cell.charCodeAt(pos) === 46) {
    pos++;
    readDigits(cell, 6);
    if (digitsRead() > 0 && Number(cell.slice(cell.indexOf('.') + 1)) !== 0) return NaN;
  }
  skipSpaces(cell);
  return pos === end ? value : NaN;
}

/** ISO 8601 text of a UTC epoch ms, minutes precision (for messages). */
export function formatUtc(ms: number): string {
  if (!Number.isFinite(ms) || Math.abs(ms) > 8.64e15) return String(ms);
  return `${new Date(ms).toISOString().slice(0, 16)}Z`;
}
