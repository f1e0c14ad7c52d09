/** How a number among the scenario inputs is presented, read from its field name. */
export type InputKind = 'temperature' | 'temperatureDifference' | 'elevation' | 'percent' | 'power' | 'plain';

export interface InputRow {
  /** Dotted path in the scenario JSON, e.g. "system.supplyAirC". */
  path: string;
  value: string | number | boolean;
  kind: InputKind;
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

export function kindOfKey(key: string): InputKind {
  if (/ElevationM$|^elevationM$/.test(key)) return 'elevation';
  if (/C$/.test(key)) return 'temperature';
  if (/K$/.test(key) && !/PerK$/.test(key)) return 'temperatureDifference';
  if (/Pct$/.test(key)) return 'percent';
  if (/Kw$/.test(key)) return 'power';
  return 'plain';
}

/** The SI unit of an input of this kind, as the downloads write it. */
export const inputUnitSi: Record<InputKind, string> = {
  temperature: '°C',
  temperatureDifference: 'K',
  elevation: 'm',
  percent: '%',
  power: 'kW',
  plain: '',
};
