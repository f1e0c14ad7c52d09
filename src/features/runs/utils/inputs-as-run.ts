import type { QuantityKind } from '@/lib/quantity';

export interface InputRow {
  /** Dotted path in the scenario JSON, e.g. "system.supplyAirC". */
  path: string;
  value: string | number | boolean;
  /** How to present a number, read from the field's name (supplyAirC → temperature). */
  kind: QuantityKind | 'percent' | 'power' | 'plain';
}

/**
 * The scenario exactly as run, flattened to one row per input. Units come from the field-name
 * convention of the scenario schema: …C a temperature, …K a temperature difference, …Pct a percentage,
 * …M an elevation, …Kw a power; anything else is shown as stored.
 */
export function flattenInputs(value: unknown, prefix = ''): InputRow[] {
  if (value === null || value === undefined) return [];
  if (typeof value !== 'object') {
    const key = prefix.split('.').pop() ?? prefix;
    return [{ path: prefix, value: value as string | number | boolean, kind: typeof value === 'number' ? kindOfKey(key) : 'plain' }];
  }
  return Object.entries(value as Record<string, unknown>).flatMap(([k, v]) => flattenInputs(v, prefix ? `${prefix}.${k}` : k));
}

export function kindOfKey(key: string): InputRow['kind'] {
  if (/ElevationM$|^elevationM$/.test(key)) return 'elevation';
  if (/C$/.test(key)) return 'temperature';
  if (/K$/.test(key) && !/PerK$/.test(key)) return 'temperatureDifference';
  if (/Pct$/.test(key)) return 'percent';
  if (/Kw$/.test(key)) return 'power';
  return 'plain';
}
