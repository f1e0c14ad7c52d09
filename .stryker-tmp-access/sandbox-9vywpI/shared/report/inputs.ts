/** How a number among the scenario inputs is presented, read from its field name. */
// @ts-nocheck

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
  if (Array.isArray(value)) return [{ path: prefix, value: listText(value), kind: 'plain' }];
  if (typeof value !== 'object') {
    const key = prefix.split('.').pop() ?? prefix;
    return [{ path: prefix, value: value as string | number | boolean, kind: typeof value === 'number' ? kindOfKey(key) : 'plain' }];
  }
  return Object.entries(value as Record<string, unknown>).flatMap(([k, v]) => flattenInputs(v, prefix ? `${prefix}.${k}` : k));
}

/** Lists longer than this are summarised rather than written out (an hourly load profile has 8760 values). */
const LIST_WRITTEN_OUT = 30;

/** A list input as one text: short lists written out, long numeric lists summarised by count, range and mean. */
function listText(list: unknown[]): string {
  if (list.length <= LIST_WRITTEN_OUT) return list.map(String).join(', ');
  const numbers = list.filter((v): v is number => typeof v === 'number');
  if (numbers.length !== list.length) return `${list.length} values`;
  let min = Infinity;
  let max = -Infinity;
  let sum = 0;
  for (const v of numbers) {
    if (v < min) min = v;
    if (v > max) max = v;
    sum += v;
  }
  const r = (x: number) => Math.round(x * 1000) / 1000;
  return `${list.length} values, ${r(min)} to ${r(max)}, mean ${r(sum / list.length)}`;
}

/**
 * A run's scenario inputs as rows, without an elevation of the scenario's own: a run uses its site's elevation
 * (stated apart), so an old scenario's field would only be a second, unused elevation.
 */
export function scenarioInputRows(scenario: unknown): InputRow[] {
  return flattenInputs(scenario).filter((row) => row.path !== 'elevationM');
}

/** One input that is not the same in every run: its path and each run's row (undefined where a run lacks it). */
export interface DifferingInput {
  path: string;
  rows: (InputRow | undefined)[];
}

/** The inputs whose values differ between the scenarios (the name left out), in the order they first appear. */
export function differingInputs(scenarios: readonly unknown[]): DifferingInput[] {
  const perRun = scenarios.map((s) => new Map(scenarioInputRows(s).map((row) => [row.path, row])));
  const paths = [...new Set(perRun.flatMap((m) => [...m.keys()]))].filter((p) => p !== 'name');
  return paths
    .map((path) => ({ path, rows: perRun.map((m) => m.get(path)) }))
    .filter(({ rows }) => new Set(rows.map((r) => (r === undefined ? undefined : JSON.stringify(r.value)))).size > 1);
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
