// @ts-nocheck
const plainNumber = /^-?\d+(\.\d+)?(e[+-]?\d+)?$/i;
const formulaStart = /^[=+\-@\t\r]/;

/**
 * One CSV cell, safe to open in a spreadsheet: quoted where needed, and text that a spreadsheet would
 * read as a formula (starting with = + - @, tab or CR) is prefixed with an apostrophe (OWASP "CSV
 * Injection" guidance). Plain numbers, negative ones included, are left as numbers.
 */
export function csvCell(value: string | number | null | undefined): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
  let text = value;
  if (formulaStart.test(text) && !plainNumber.test(text)) text = `'${text}`;
  return /[",\n\r]/.test(text) ? `"${text.replaceAll('"', '""')}"` : text;
}

export function csvRow(cells: Array<string | number | null | undefined>): string {
  return cells.map(csvCell).join(',');
}
