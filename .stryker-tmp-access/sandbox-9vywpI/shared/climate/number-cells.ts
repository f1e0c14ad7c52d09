/**
 * Numbers in cells: decimal point or decimal comma, blanks and missing-value markers.
 * The fast path is one Number() call; why a cell failed is worked out only when it did.
 */
// @ts-nocheck


/** Words and symbols that stations write for "no value". */
const MISSING_WORDS = new Set(['', 'na', 'n/a', 'nan', 'null', 'none', '-', '--', 'm', 'missing', '#n/a', 'x']);
/** Numeric sentinels common in station exports for "no value"; none is a possible reading of our quantities. */
const SENTINELS = new Set([-999, -9999, 9999, -99999, 99999]);

/** Exact powers of ten: an integer mantissa below 2^53 divided by one of these is correctly rounded. */
const POW10 = [1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15];

/**
 * A cell as a finite number, or NaN (blank, marker, sentinel or not a number).
 * Plain decimals (up to 15 digits, no exponent) are read from the character codes: the integer
 * mantissa divided by an exact power of ten is one correctly rounded operation, so the result equals
 * Number() of the same text, without building a string per cell. Anything else goes through Number().
 */
export function parseNumberCell(cell: string, decimalComma: boolean): number {
  return parseNumberAt(cell, 0, cell.length, decimalComma);
}

/** {@link parseNumberCell} of the cell text[from, to), read in place: a string is made only for the slow path. */
export function parseNumberAt(text: string, from: number, to: number, decimalComma: boolean): number {
  let start = from;
  let end = to;
  while (start < end && text.charCodeAt(start) === 32) start++;
  while (end > start && (text.charCodeAt(end - 1) === 32 || text.charCodeAt(end - 1) === 13)) end--;
  if (start === end) return NaN;
  const separator = decimalComma ? 44 : 46;
  let i = start;
  let c = text.charCodeAt(i);
  const negative = c === 45;
  if (negative || c === 43) i++;
  let mantissa = 0;
  let digits = 0;
  let fractionDigits = 0;
  let seenSeparator = false;
  for (; i < end; i++) {
    c = text.charCodeAt(i);
    if (c >= 48 && c <= 57) {
      mantissa = mantissa * 10 + (c - 48);
      digits++;
      if (seenSeparator) fractionDigits++;
    } else if (c === separator && !seenSeparator) {
      seenSeparator = true;
    } else {
      return parseNumberSlowly(text.substring(from, to), decimalComma);
    }
  }
  if (digits === 0) return NaN;
  if (digits > 15) return parseNumberSlowly(text.substring(from, to), decimalComma);
  const magnitude = fractionDigits === 0 ? mantissa : mantissa / POW10[fractionDigits];
  const value = negative ? -magnitude : magnitude;
  if ((value >= 999 || value <= -999) && SENTINELS.has(value)) return NaN;
  return value;
}

function parseNumberSlowly(cell: string, decimalComma: boolean): number {
  let s = cell;
  if (decimalComma && s.indexOf(',') !== -1) s = s.replace(',', '.');
  if (s.length === 0) return NaN;
  const c = s.charCodeAt(0);
  // Number() also reads '', '  ', '0x1f' and 'Infinity'; a number here starts with a digit, sign, point or space
  if (!((c >= 48 && c <= 57) || c === 45 || c === 43 || c === 46 || c === 32)) return NaN;
  if (s.length > 1) {
    const second = s.charCodeAt(1) | 32;
    if (second === 120 || second === 98 || second === 111) return NaN;
  }
  const value = Number(s);
  if (value !== value || value === Infinity || value === -Infinity) return NaN;
  if ((value >= 999 || value <= -999) && SENTINELS.has(value)) return NaN;
  if (value === 0 && s.trim() === '') return NaN;
  return value;
}

/** Why a cell gave NaN: a deliberate "no value" or something unreadable. */
export function classifyUnreadableCell(cell: string, decimalComma: boolean): 'missing-marker' | 'unreadable' {
  const trimmed = cell.trim().toLowerCase();
  if (MISSING_WORDS.has(trimmed)) return 'missing-marker';
  const s = decimalComma ? trimmed.replace(',', '.') : trimmed;
  const value = Number(s);
  if (s !== '' && SENTINELS.has(value)) return 'missing-marker';
  return 'unreadable';
}

const DECIMAL_COMMA = /^\s*[+-]?\d*,\d+\s*$/;
const DECIMAL_POINT = /^\s*[+-]?\d*\.\d+\s*$/;

/** Decimal comma when sample cells written with a comma outnumber those written with a point. */
export function sniffDecimalSeparator(rows: string[][]): '.' | ',' {
  let commas = 0;
  let points = 0;
  for (const row of rows) {
    for (const cell of row) {
      if (DECIMAL_COMMA.test(cell)) commas++;
      else if (DECIMAL_POINT.test(cell)) points++;
    }
  }
  return commas > points ? ',' : '.';
}
