/**
 * The caller's overrides laid over the detected mapping. A column named by header text or
 * index that does not exist is an error naming it; an overridden choice gets confidence 1.
 */
// @ts-nocheck

import type { IssueLog } from './issue-log';
import type { Recognition } from './recognise-columns';
import { describeYmdh } from './recognise-columns';
import type { ColumnMappingOverride, ColumnRef, QuantityAssignment, TimeMapping } from './types';

function resolve(ref: ColumnRef, headers: string[], what: string, log: IssueLog): number {
  if (typeof ref === 'number') {
    if (Number.isInteger(ref) && ref >= 0 && ref < headers.length) return ref;
  } else if (typeof ref === 'string') {
    const wanted = ref.trim().toLowerCase();
    const index = headers.findIndex((h) => h.trim().toLowerCase() === wanted);
    if (index !== -1) return index;
  }
  log.error('mapping-override-invalid', `The ${what} column "${String(ref)}" is not in the file (columns: ${headers.join(', ')}).`, {
    value: String(ref),
  });
  return -1;
}

function overrideTime(time: NonNullable<ColumnMappingOverride['time']>, headers: string[], log: IssueLog): TimeMapping | null {
  if (time.layout === 'iso') {
    const column = resolve(time.column, headers, 'timestamp', log);
    if (column === -1) return null;
    return {
      layout: 'iso',
      column,
      dateOrder: time.dateOrder,
      confidence: 1,
      description: `one date-time column "${headers[column]}" (chosen by the user)`,
    };
  }
  if (time.layout === 'date-time') {
    const dateColumn = resolve(time.dateColumn, headers, 'date', log);
    const timeColumn = resolve(time.timeColumn, headers, 'time', log);
    if (dateColumn === -1 || timeColumn === -1) return null;
    return {
      layout: 'date-time',
      dateColumn,
      timeColumn,
      dateOrder: time.dateOrder ?? 'YMD',
      confidence: 1,
      description: `a date column "${headers[dateColumn]}" and a time column "${headers[timeColumn]}" (chosen by the user)`,
    };
  }
  if (time.layout === 'ymdh') {
    const year = resolve(time.year, headers, 'year', log);
    const month = resolve(time.month, headers, 'month', log);
    const day = resolve(time.day, headers, 'day', log);
    const hour = resolve(time.hour, headers, 'hour', log);
    const minute = time.minute === undefined || time.minute === null ? null : resolve(time.minute, headers, 'minute', log);
    if (year === -1 || month === -1 || day === -1 || hour === -1 || minute === -1) return null;
    const hourConvention = time.hourConvention ?? 'ending-1-24';
    return {
      layout: 'ymdh',
      year,
      month,
      day,
      hour,
      minute,
      hourConvention,
      confidence: 1,
      description: `${describeYmdh(headers[hour], hourConvention)} (chosen by the user)`,
    };
  }
  log.error('mapping-override-invalid', 'The time layout must be "iso", "date-time" or "ymdh".');
  return null;
}

const UNITS: Record<QuantityAssignment['quantity'], string[]> = {
  'dry-bulb': ['C', 'F', 'K'],
  'dew-point': ['C', 'F', 'K'],
  'wet-bulb': ['C', 'F', 'K'],
  'relative-humidity': ['%', 'fraction'],
  'humidity-ratio': ['g/kg', 'kg/kg', 'gr/lb'],
  pressure: ['Pa', 'hPa', 'kPa', 'inHg', 'psi'],
};

function chosen(
  spec: { column: ColumnRef; quantity: QuantityAssignment['quantity']; unit: string },
  headers: string[],
  log: IssueLog,
): QuantityAssignment | null {
  const units = UNITS[spec.quantity];
  if (!units) {
    log.error('mapping-override-invalid', `"${String(spec.quantity)}" is not a quantity the importer knows.`);
    return null;
  }
  if (!units.includes(spec.unit)) {
    log.error('mapping-override-invalid', `"${String(spec.unit)}" is not a unit for ${spec.quantity} (one of ${units.join(', ')}).`, {
      value: String(spec.unit),
    });
    return null;
  }
  const column = resolve(spec.column, headers, spec.quantity, log);
  if (column === -1) return null;
  return {
    quantity: spec.quantity,
    unit: spec.unit,
    column,
    header: headers[column],
    confidence: 1,
    reason: 'chosen by the user',
  } as QuantityAssignment;
}

/** The choice itself, without how sure or how described: what decides whether an override changed anything. */
function choiceOf(mapping: object | null): string {
  if (!mapping) return 'null';
  const { confidence: _c, description: _d, reason: _r, header: _h, ...rest } = mapping as Record<string, unknown>;
  return JSON.stringify(Object.entries(rest).sort(([a], [b]) => a.localeCompare(b)));
}

/**
 * An override that repeats what was recognised (the mapping step sends every part back) keeps the recognition,
 * so the report says "recognised" rather than "chosen by the user" for a choice nobody changed.
 */
function keepRecognised<T extends object>(recognised: T | null, overridden: T | null): T | null {
  return recognised && overridden && choiceOf(recognised) === choiceOf(overridden) ? recognised : overridden;
}

/** Applies the overrides in place; errors go to the log. */
export function applyMappingOverride(recognition: Recognition, override: Partial<ColumnMappingOverride>, headers: string[], log: IssueLog): void {
  if (override.time) recognition.time = keepRecognised(recognition.time, overrideTime(override.time, headers, log));
  if (override.dryBulb) {
    recognition.dryBulb = keepRecognised(recognition.dryBulb, chosen({ ...override.dryBulb, quantity: 'dry-bulb' }, headers, log));
  }
  if (override.humidity) recognition.humidity = keepRecognised(recognition.humidity, chosen(override.humidity, headers, log));
  if (override.pressure === null) recognition.pressure = null;
  else if (override.pressure) recognition.pressure = keepRecognised(recognition.pressure, chosen({ ...override.pressure, quantity: 'pressure' }, headers, log));
  for (const key of ['dryBulb', 'humidity', 'pressure'] as const) {
    const a = recognition[key];
    if (a) recognition.assumedUnits = recognition.assumedUnits.filter((u) => u.column !== a.column || a.confidence < 1);
  }
}
