/**
 * Proposes a mapping (time layout, dry-bulb, one humidity measure, optional pressure) from the
 * headers and a sample of cells spread over the file; each choice carries a confidence 0..1 and
 * a reason. Units missing from a header are inferred from the magnitudes of the values.
 */
// @ts-nocheck

import { CANONICAL_HEADERS, familyOf, quantityOf, readHeader, timePartOf, type TimePart, type UnitFamily } from './header-words';
import { parseNumberCell } from './number-cells';
import { lastParse, parseDateCell, parseDateTimeCell, parseIntegerCell, parseTimeCell } from './time-cells';
import type { DateOrder, Quantity, QuantityAssignment, QuantityColumn, TimeMapping } from './types';

export interface Sample {
  headers: string[];
  rows: string[][];
  decimalComma: boolean;
}

export interface Recognition {
  time: TimeMapping | null;
  dryBulb: QuantityAssignment | null;
  humidity: QuantityAssignment | null;
  pressure: QuantityAssignment | null;
  /** Columns whose unit was inferred from values, for a warning. */
  assumedUnits: QuantityAssignment[];
  /** Humidity columns found but not used (only one humidity measure is kept). */
  otherHumidity: QuantityAssignment[];
}

function columnCells(sample: Sample, column: number): string[] {
  const cells: string[] = [];
  for (const row of sample.rows) {
    const cell = row[column];
    if (cell !== undefined && cell.trim() !== '') cells.push(cell);
  }
  return cells;
}

function share(cells: string[], test: (cell: string) => boolean): number {
  if (cells.length === 0) return 0;
  let hits = 0;
  for (const cell of cells) if (test(cell)) hits++;
  return hits / cells.length;
}

/** Day/month order of `a/b/yyyy`-style dates: from values above 12, else from the separator. */
export function dateOrderOf(cells: string[]): DateOrder {
  let firstAbove12 = false;
  let secondAbove12 = false;
  let separator = '';
  let shortForm = false;
  for (const cell of cells) {
    if (Number.isNaN(parseDateTimeCell(cell, 'DMY')) && Number.isNaN(parseDateTimeCell(cell, 'MDY'))) continue;
    if (!lastParse.shortFirst) continue;
    shortForm = true;
    if (lastParse.firstGroup > 12) firstAbove12 = true;
    if (lastParse.secondGroup > 12) secondAbove12 = true;
    separator ||= /\d([./-])/.exec(cell)?.[1] ?? '';
  }
  if (!shortForm) return 'YMD';
  if (firstAbove12) return 'DMY';
  if (secondAbove12) return 'MDY';
  return separator === '/' ? 'MDY' : 'DMY';
}

/** "day/month/year", "day.month.year": the order, written with the separator the file's dates use ('/' when none is seen). */
export function describeOrder(order: DateOrder, cells: readonly string[] = []): string {
  const separator = cells.map((cell) => /^\s*\d{1,2}([./-])\d{1,2}\1/.exec(cell)?.[1]).find((s) => s !== undefined) ?? (order === 'YMD' ? '-' : '/');
  const parts = order === 'YMD' ? ['year', 'month', 'day'] : order === 'DMY' ? ['day', 'month', 'year'] : ['month', 'day', 'year'];
  return parts.join(separator);
}

function detectTime(sample: Sample, parts: (TimePart | null)[]): TimeMapping | null {
  const n = sample.headers.length;
  const cells = Array.from({ length: n }, (_, c) => columnCells(sample, c));
  const orders = cells.map((cs) => dateOrderOf(cs));
  const isDateTime = cells.map((cs, c) => share(cs, (cell) => !Number.isNaN(parseDateTimeCell(cell, orders[c])) && lastParse.hasTime));

  // one column holding date and time
  let iso = -1;
  for (let c = 0; c < n; c++) {
    if (isDateTime[c] < 0.9) continue;
    if (iso === -1 || (parts[iso] === null && parts[c] !== null)) iso = c;
  }
  if (iso !== -1) {
    const canonical = sample.headers[iso].trim().toLowerCase() === 'timestamp' && isDateTime[iso] === 1;
    const readable = cells[iso].filter((cell) => !Number.isNaN(parseDateTimeCell(cell, orders[iso])));
    const withOffset = share(readable, (cell) => !Number.isNaN(parseDateTimeCell(cell, orders[iso])) && !Number.isNaN(lastParse.offsetMinutes));
    const offsetWords = withOffset === 1 ? 'with a UTC offset or Z' : withOffset > 0 ? 'with an offset on some rows' : 'without offset (local time)';
    return {
      layout: 'iso',
      column: iso,
      dateOrder: orders[iso],
      confidence: canonical ? 1 : parts[iso] ? 0.95 : 0.8,
      description: `one date-time column "${sample.headers[iso]}" (${orders[iso] === 'YMD' ? 'ISO 8601' : describeOrder(orders[iso], cells[iso])}, ${offsetWords})`,
    };
  }

  // a date column and a time column
  const isDate = cells.map((cs, c) => share(cs, (cell) => !Number.isNaN(parseDateCell(cell, orders[c]))));
  const isClock = cells.map((cs) => share(cs, (cell) => !Number.isNaN(parseTimeCell(cell))));
  const dateColumn = isDate.findIndex((s, c) => s >= 0.9 && parts[c] !== 'year' && parts[c] !== 'month');
  if (dateColumn !== -1) {
    let timeColumn = -1;
    for (let c = 0; c < n; c++) {
      if (c === dateColumn || isClock[c] < 0.9) continue;
      const named = parts[c] === 'time' || parts[c] === 'hour';
      if (named || (timeColumn === -1 && cells[c].some((cell) => cell.includes(':')))) {
        timeColumn = c;
        if (named) break;
      }
    }
    if (timeColumn !== -1) {
      return {
        layout: 'date-time',
        dateColumn,
        timeColumn,
        dateOrder: orders[dateColumn],
        confidence: parts[dateColumn] && parts[timeColumn] ? 0.95 : 0.8,
        description: `a date column "${sample.headers[dateColumn]}" (${describeOrder(orders[dateColumn], cells[dateColumn])}) and a time column "${sample.headers[timeColumn]}"`,
      };
    }
  }

  // year, month, day, hour columns
  const find = (part: TimePart, min: number, max: number, read: (cell: string) => number = parseIntegerCell): number =>
    parts.findIndex(
      (p, c) =>
        p === part &&
        share(cells[c], (cell) => {
          const v = read(cell);
          return v >= min && v <= max;
        }) >= 0.9,
    );
  // an hour cell may be a whole hour (13), hhmm (1300) or a clock time (13:00)
  const hourOf = (cell: string) => parseTimeCell(cell) / 3_600_000;
  const year = find('year', 1000, 9999);
  const month = find('month', 1, 12);
  const day = find('day', 1, 31);
  const hour = find('hour', 0, 24, hourOf);
  if (year !== -1 && month !== -1 && day !== -1 && hour !== -1) {
    const minuteIndex = find('minute', 0, 60);
    const hours = cells[hour].map(hourOf);
    const ending = hours.includes(24) || !hours.includes(0);
    return {
      layout: 'ymdh',
      year,
      month,
      day,
      hour,
      minute: minuteIndex === -1 ? null : minuteIndex,
      hourConvention: ending ? 'ending-1-24' : 'beginning-0-23',
      confidence: 0.95,
      description: describeYmdh(sample.headers[hour], ending ? 'ending-1-24' : 'beginning-0-23'),
    };
  }
  return null;
}

export function describeYmdh(hourHeader: string, convention: 'ending-1-24' | 'beginning-0-23'): string {
  return convention === 'ending-1-24'
    ? `year, month, day and hour columns, hour "${hourHeader}" running 1–24 as the hour ending (24 = midnight at the end of the day)`
    : `year, month, day and hour columns, hour "${hourHeader}" running 0–23`;
}

function median(values: number[]): number {
  if (values.length === 0) return NaN;
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

/** A unit for a column whose header gives none, from the magnitude of its values. */
export function inferUnit(quantity: Quantity, values: number[]): { unit: UnitFamily['unit']; confidence: number; reason: string } {
  const mid = median(values);
  const max = values.length ? Math.max(...values) : NaN;
  switch (familyOf(quantity)) {
    case 'temperature':
      if (mid > 150) return { unit: 'K', confidence: 0.8, reason: 'values near 200–330 read as kelvin' };
      if (max > 60 && mid > 25) return { unit: 'F', confidence: 0.6, reason: 'values above 60 read as °F' };
      return { unit: 'C', confidence: 0.7, reason: 'no unit in the header; °C assumed' };
    case 'relative-humidity':
      if (max <= 1.0001 && values.length > 0) return { unit: 'fraction', confidence: 0.8, reason: 'values all ≤ 1 read as a fraction' };
      return { unit: '%', confidence: 0.85, reason: 'values above 1 read as %' };
    case 'humidity-ratio':
      if (mid < 0.1) return { unit: 'kg/kg', confidence: 0.7, reason: 'values below 0.1 read as kg/kg' };
      if (mid > 35) return { unit: 'gr/lb', confidence: 0.6, reason: 'values above 35 read as grains/lb' };
      return { unit: 'g/kg', confidence: 0.7, reason: 'values 0.1–35 read as g/kg' };
    case 'pressure':
      if (mid > 20000) return { unit: 'Pa', confidence: 0.8, reason: 'values near 10⁵ read as Pa' };
      if (mid > 400) return { unit: 'hPa', confidence: 0.8, reason: 'values near 1000 read as hPa' };
      if (mid > 40) return { unit: 'kPa', confidence: 0.8, reason: 'values near 100 read as kPa' };
      if (mid > 16.5) return { unit: 'inHg', confidence: 0.7, reason: 'values near 30 read as inHg' };
      return { unit: 'psi', confidence: 0.6, reason: 'values near 14.7 read as psi' };
  }
}

function assignment(sample: Sample, column: number): QuantityAssignment | null {
  const header = sample.headers[column];
  const canonical = CANONICAL_HEADERS[header.trim().toLowerCase()];
  if (canonical && canonical.quantity !== 'timestamp' && canonical.unit) {
    return {
      quantity: canonical.quantity,
      unit: canonical.unit,
      column,
      header,
      confidence: 1,
      reason: 'canonical column name',
    } as QuantityAssignment;
  }
  const reading = readHeader(header);
  const named = quantityOf(reading);
  if (!named) return null;
  const family = familyOf(named.quantity);
  if (reading.unit && reading.unit.family === family) {
    return {
      quantity: named.quantity,
      unit: reading.unit.unit,
      column,
      header,
      confidence: named.strength,
      reason: 'quantity and unit read from the header',
    } as QuantityAssignment;
  }
  const values: number[] = [];
  for (const cell of columnCells(sample, column)) {
    const v = parseNumberCell(cell, sample.decimalComma);
    if (!Number.isNaN(v)) values.push(v);
  }
  if (values.length === 0) return null;
  const inferred = inferUnit(named.quantity, values);
  return {
    quantity: named.quantity,
    unit: inferred.unit,
    column,
    header,
    confidence: Math.min(named.strength, inferred.confidence),
    reason: `quantity read from the header; ${inferred.reason}`,
  } as QuantityAssignment;
}

/** Among equally sure humidity columns, the measure that averages most faithfully over an hour comes first. */
const HUMIDITY_PREFERENCE: Quantity[] = ['dew-point', 'humidity-ratio', 'relative-humidity', 'wet-bulb'];

function best(candidates: QuantityAssignment[]): QuantityAssignment | null {
  let chosen: QuantityAssignment | null = null;
  for (const c of candidates) {
    if (
      !chosen ||
      c.confidence > chosen.confidence ||
      (c.confidence === chosen.confidence && HUMIDITY_PREFERENCE.indexOf(c.quantity) < HUMIDITY_PREFERENCE.indexOf(chosen.quantity))
    ) {
      chosen = c;
    }
  }
  return chosen;
}

export function recogniseColumns(sample: Sample): Recognition {
  const parts = sample.headers.map((h) => timePartOf(readHeader(h)));
  const time = detectTime(sample, parts);
  const timeColumns = new Set<number>();
  if (time?.layout === 'iso') timeColumns.add(time.column);
  if (time?.layout === 'date-time') [time.dateColumn, time.timeColumn].forEach((c) => timeColumns.add(c));
  if (time?.layout === 'ymdh') [time.year, time.month, time.day, time.hour, time.minute ?? -1].forEach((c) => timeColumns.add(c));

  const found: QuantityAssignment[] = [];
  for (let c = 0; c < sample.headers.length; c++) {
    if (timeColumns.has(c)) continue;
    const a = assignment(sample, c);
    if (a) found.push(a);
  }
  const dryBulb = best(found.filter((a) => a.quantity === 'dry-bulb'));
  const humidityCandidates = found.filter((a) => a.quantity !== 'dry-bulb' && a.quantity !== 'pressure');
  const humidity = best(humidityCandidates);
  const pressure = best(found.filter((a) => a.quantity === 'pressure'));
  const chosen = [dryBulb, humidity, pressure].filter((a): a is QuantityAssignment => a !== null);
  return {
    time,
    dryBulb,
    humidity,
    pressure,
    assumedUnits: chosen.filter((a) => a.reason.includes('read as') || a.reason.includes('assumed')),
    otherHumidity: humidityCandidates.filter((a) => a !== humidity),
  };
}

/** Type guard helper: the QuantityColumn part of an assignment. */
export function unitOf(a: QuantityAssignment): QuantityColumn {
  return { quantity: a.quantity, unit: a.unit } as QuantityColumn;
}
