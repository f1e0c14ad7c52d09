/**
 * The counts that sit under one mode ("of which" rows) and the parts of the evaporated water: one list
 * that every table, chart, CSV and report reads, so their words and numbers stay the same everywhere.
 *
 * Runs made before these were counted (scenario-engine 1.0.0) lack the fields: the getters give null,
 * which every view shows as NOT_COUNTED with `notCountedNote` naming the engine that made the run.
 */
// @ts-nocheck

import { modeKeys, type ModeKey } from '../modes';

export type ModeSubsetKey = 'humidified' | 'partialMechanical';

export interface ModeSubset {
  key: ModeSubsetKey;
  /** The mode these hours are part of. */
  parent: ModeKey;
  /** Under its mode in a list of rows: "of which …". */
  rowLabel: string;
  /** As a column beside its mode's column. */
  columnLabel: string;
  /** Standing alone (CSV figure, comparison row, sweep metric). */
  figure: string;
  /** What the hours are, in a designer's words. */
  description: string;
}

export const modeSubsets: readonly ModeSubset[] = [
  {
    key: 'humidified',
    parent: 'free',
    rowLabel: 'of which with humidification',
    columnLabel: 'with humidification',
    figure: 'Free cooling with humidification',
    description: 'free-cooling hours in which the evaporative media only add moisture to air that is drier than the envelope allows',
  },
  {
    key: 'partialMechanical',
    parent: 'mechanical',
    rowLabel: 'of which partly economised',
    columnLabel: 'partly economised',
    figure: 'Mechanical, partly economised',
    description: 'mechanical hours in which the economiser still carries part of the load and the compressors only the rest',
  },
];

/** Shown where a run has no such count. */
export const NOT_COUNTED = '—';

/** Why a count is missing: the engine that made the run did not count it. */
export function notCountedNote(engineVersion: string): string {
  return `${NOT_COUNTED} not counted: the engine that made this run (${engineVersion}) did not count humidified or partly economised hours, nor split the water by use. Run the scenario again to get them.`;
}

/** The same, short, under a table whose "—" the longer note already explains on the page. */
export function notCountedShort(engineVersion: string): string {
  return `${NOT_COUNTED} not counted by ${engineVersion}, the engine that made this run.`;
}

/** A subset's hours in a results table (a run's, a month's, a year's); null when the run's engine did not count them. */
export function subsetHours(row: object, key: ModeSubsetKey): number | null {
  const value = (row as Partial<Record<ModeSubsetKey, unknown>>)[key];
  return typeof value === 'number' && Number.isFinite(value) ? value : null;
}

/** Whether these results carry the subset counts (made by an engine that counts them). */
export function countsSubsets(results: { hours: object }): boolean {
  return subsetHours(results.hours, 'humidified') !== null;
}

export type ModeRowSpec = { kind: 'mode'; mode: ModeKey } | { kind: 'subset'; subset: ModeSubset };

/** The modes in palette order, each followed by the counts that are part of it: the rows (or columns) of every mode table. */
export const modeRowSpecs: readonly ModeRowSpec[] = modeKeys.flatMap((mode): ModeRowSpec[] => [
  { kind: 'mode', mode },
  ...modeSubsets.filter((s) => s.parent === mode).map((subset): ModeRowSpec => ({ kind: 'subset', subset })),
]);

export type WaterPartKey = 'humidificationL' | 'evaporativeCoolingL' | 'driftL';

export interface WaterPart {
  key: WaterPartKey;
  /** Under "Evaporated" (the first two) or on its own line (drift). */
  rowLabel: string;
  figure: string;
  /** Part of the evaporated water (else a separate loss counted in the total). */
  ofEvaporated: boolean;
}

export const waterParts: readonly WaterPart[] = [
  { key: 'humidificationL', rowLabel: 'of which for humidification', figure: 'Water for humidification', ofEvaporated: true },
  { key: 'evaporativeCoolingL', rowLabel: 'of which for evaporative cooling', figure: 'Water for evaporative cooling', ofEvaporated: true },
  { key: 'driftL', rowLabel: 'Tower drift', figure: 'Tower drift', ofEvaporated: false },
];

/** One part of a run's water, litres; null when the run's engine did not split it. */
export function waterPartL(water: object, key: WaterPartKey): number | null {
  const value = (water as Partial<Record<WaterPartKey, unknown>>)[key];
  return typeof value === 'number' && Number.isFinite(value) ? value : null;
}

/** The water parts a view lists: the split of the evaporated water always (NOT_COUNTED for an old run), drift where there is some (towers). */
export function waterPartsShown(water: object, counted: boolean): readonly WaterPart[] {
  return waterParts.filter((p) => p.ofEvaporated || (counted && (waterPartL(water, p.key) ?? 0) > 0));
}

/** Engine versions among some runs, in first-seen order; more than one means the comparison mixes engines. */
export function engineVersionsOf(runs: readonly { engineVersion: string }[]): string[] {
  return [...new Set(runs.map((r) => r.engineVersion))];
}

/** The words a comparison shows when its runs come from different engine versions; null when they do not. */
export function mixedEngineNote(runs: readonly { id: number; engineVersion: string }[]): string | null {
  const versions = engineVersionsOf(runs);
  if (versions.length < 2) return null;
  const groups = versions.map(
    (v) =>
      `${v}: run${runs.filter((r) => r.engineVersion === v).length > 1 ? 's' : ''} ${runs
        .filter((r) => r.engineVersion === v)
        .map((r) => r.id)
        .join(', ')}`,
  );
  return `These runs were made by different engine versions (${groups.join('; ')}). The rules changed between versions, so part of a difference may come from the engine rather than the design. Run the older scenarios again to compare like with like.`;
}

/** A mode table's column head: "Free cooling (h)", "with humidification (h)". */
export function modeColumnLabel(spec: ModeRowSpec, modeLabels: Record<ModeKey, string>): string {
  return spec.kind === 'mode' ? `${modeLabels[spec.mode]} (h)` : `${spec.subset.columnLabel} (h)`;
}

/** The hours of one row or column of a mode table; null for a count the run's engine did not make. */
export function hoursOfSpec(row: { free: number; adiabatic: number; mechanical: number; noData: number }, spec: ModeRowSpec): number | null {
  if (spec.kind === 'subset') return subsetHours(row, spec.subset.key);
  return spec.mode === 'no_data' ? row.noData : row[spec.mode];
}

/** Hours as a table shows them: whole hours with thousands separators, or NOT_COUNTED. */
export function hoursText(hours: number | null): string {
  return hours === null ? NOT_COUNTED : Math.round(hours).toLocaleString('en');
}
