// @ts-nocheck
import Papa from 'papaparse';
import { MONTH_NAMES, type MonthFactor } from './factors';

/**
 * Columns of a change-factor table. Temperature changes in K (or °F difference with the _f names, ÷ 1.8);
 * humidity as % change of specific humidity and/or an absolute shift in g/kg (or gr/lb, ÷ 7).
 */
const columns = {
  month: ['month'],
  deltaMean: ['delta_mean_k', 'delta_mean_f'],
  deltaMax: ['delta_max_k', 'delta_max_f'],
  deltaMin: ['delta_min_k', 'delta_min_f'],
  humidityPct: ['humidity_change_pct'],
  humidityShift: ['humidity_shift_g_per_kg', 'humidity_shift_gr_per_lb'],
} as const;

// 1 °F difference = 1/1.8 K; 7000 grains to the pound, so 1 gr/lb = 1/7 g/kg (exact definitions).
const toSi: Record<string, number> = { _k: 1, _f: 1 / 1.8, _pct: 1, _g_per_kg: 1, _gr_per_lb: 1 / 7 };

export type FactorsCsvResult = { ok: true; months: MonthFactor[] } | { ok: false; errors: string[] };

function monthNumber(cell: string): number | null {
  const t = cell.trim().toLowerCase();
  if (/^\d{1,2}$/.test(t)) {
    const n = Number(t);
    return n >= 1 && n <= 12 ? n : null;
  }
  const i = MONTH_NAMES.findIndex((name) => name.toLowerCase() === t || name.slice(0, 3).toLowerCase() === t);
  return i >= 0 ? i + 1 : null;
}

/**
 * Reads a small change-factor table (CSV with a header row, one row per month, lines starting with # are
 * comments). Every problem names its line and column, e.g. "line 4, column delta_max_k: 'abc' is not a number".
 * Missing delta_max/delta_min take the month's delta_mean (no change of the daily range); missing humidity columns mean no change.
 */
export function parseFactorsCsv(text: string): FactorsCsvResult {
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { skipEmptyLines: false });
  const rows = parsed.data;
  const errors: string[] = parsed.errors.map((e) => `line ${(e.row ?? 0) + 1}: ${e.message}`);
  const headerIndex = rows.findIndex((r) => r.some((c) => c.trim() !== '') && !r[0]?.trim().startsWith('#'));
  if (headerIndex < 0) return { ok: false, errors: ['the table is empty: give a header row and 12 month rows'] };
  const header = rows[headerIndex].map((c) => c.trim().toLowerCase());
  const find = (names: readonly string[]) => {
    const at = header.findIndex((h) => names.includes(h));
    return at < 0 ? null : { at, name: header[at], scale: toSi[Object.keys(toSi).find((s) => header[at].endsWith(s)) ?? '_k'] };
  };
  const col = {
    month: find(columns.month),
    deltaMean: find(columns.deltaMean),
    deltaMax: find(columns.deltaMax),
    deltaMin: find(columns.deltaMin),
    humidityPct: find(columns.humidityPct),
    humidityShift: find(columns.humidityShift),
  };
  if (!col.month) errors.push(`line ${headerIndex + 1}: no 'month' column (header is: ${header.join(', ')})`);
  if (!col.deltaMean) errors.push(`line ${headerIndex + 1}: no 'delta_mean_k' (or 'delta_mean_f') column`);
  const unknown = header.filter((h) => h !== '' && !Object.values(columns).some((names) => (names as readonly string[]).includes(h)));
  for (const h of unknown) errors.push(`line ${headerIndex + 1}, column ${h}: unknown column`);
  if (errors.length) return { ok: false, errors };

  const byMonth: (MonthFactor | undefined)[] = new Array(12);
  const lineOfMonth: number[] = new Array(12);
  for (let r = headerIndex + 1; r < rows.length; r++) {
    const row = rows[r];
    const line = r + 1;
    if (row.every((c) => c.trim() === '') || row[0]?.trim().startsWith('#')) continue;
    const number = (c: { at: number; name: string; scale: number } | null, fallback: number): number => {
      if (!c) return fallback;
      const cell = (row[c.at] ?? '').trim();
      if (cell === '') {
        errors.push(`line ${line}, column ${c.name}: empty cell`);
        return Number.NaN;
      }
      const v = Number(cell.replace('−', '-'));
      if (!Number.isFinite(v)) {
        errors.push(`line ${line}, column ${c.name}: '${cell}' is not a number`);
        return Number.NaN;
      }
      return v * c.scale;
    };
    const monthCell = (row[col.month!.at] ?? '').trim();
    const month = monthNumber(monthCell);
    if (month === null) {
      errors.push(`line ${line}, column month: '${monthCell}' is not a month (1–12 or a month name)`);
      continue;
    }
    if (byMonth[month - 1]) {
      errors.push(`line ${line}, column month: ${MONTH_NAMES[month - 1]} is given twice (also on line ${lineOfMonth[month - 1]})`);
      continue;
    }
    const deltaMeanK = number(col.deltaMean, 0);
    byMonth[month - 1] = {
      deltaMeanK,
      deltaMaxK: number(col.deltaMax, deltaMeanK),
      deltaMinK: number(col.deltaMin, deltaMeanK),
      humidityChangePct: number(col.humidityPct, 0),
      humidityShiftGPerKg: number(col.humidityShift, 0),
    };
    lineOfMonth[month - 1] = line;
  }
  const missing = MONTH_NAMES.filter((_, m) => !byMonth[m]);
  if (missing.length) errors.push(`months missing from the table: ${missing.join(', ')}`);
  if (errors.length) return { ok: false, errors };
  return { ok: true, months: byMonth as MonthFactor[] };
}
