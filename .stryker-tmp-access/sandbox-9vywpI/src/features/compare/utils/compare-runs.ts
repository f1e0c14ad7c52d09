// @ts-nocheck
import type { RunListing } from '../api/get-runs';
import { comparedFigures, differencePercent, type ComparedFigure } from '../../../../shared/report/summary-table';

type Results = NonNullable<RunListing['results']>;

/** A compared figure (shared/report's one list, read by the report and its CSV too) with how this page writes it. */
export interface Metric extends ComparedFigure {
  format: 'hours' | 'ratio' | 'mwh' | 'kw' | 'water' | 'wue';
}

const formatOfUnit: Record<string, Metric['format']> = { h: 'hours', '': 'ratio', kWh: 'mwh', kW: 'kw', L: 'water', 'L/kWh': 'wue' };

export const metrics: Metric[] = comparedFigures.map((f) => ({ ...f, format: formatOfUnit[f.unit] ?? 'ratio' }));

export interface ComparedCell {
  runId: number;
  value: number | null;
  /** value − baseline value; null for the baseline itself or when either is missing. */
  difference: number | null;
  /** difference as a percentage of the baseline; null when the baseline is missing or under the figure's floor. */
  differencePct: number | null;
  /** Whether the difference is an improvement, a worsening, or neither. */
  verdict: 'better' | 'worse' | 'same' | 'none';
}

export interface ComparedRow {
  metric: Metric;
  cells: ComparedCell[];
}

/** Every metric for every run, with its difference from the baseline run. Runs without results are skipped. */
export function compareRuns(runs: RunListing[], baselineId: number): ComparedRow[] {
  const done = runs.filter((r) => r.results);
  const baseline = done.find((r) => r.id === baselineId) ?? done[0];
  if (!baseline) return [];
  // A hybrid hall's loop figures only when a hybrid is among the runs.
  const anyHybrid = done.some((r) => r.results!.loops !== undefined);
  return metrics
    .filter((m) => anyHybrid || !m.hybridOnly)
    .map((metric) => {
      const base = metric.value(baseline.results! satisfies Results);
      return {
        metric,
        cells: done.map((run) => {
          const value = metric.value(run.results!);
          const isBase = run.id === baseline.id;
          const difference = !isBase && value !== null && base !== null ? value - base : null;
          const differencePct = differencePercent(metric, difference, base);
          let verdict: ComparedCell['verdict'] = 'none';
          if (difference !== null && metric.better !== 'none') {
            const tolerance = Math.abs(base ?? 0) * 1e-9;
            verdict = Math.abs(difference) <= tolerance ? 'same' : difference > 0 === (metric.better === 'higher') ? 'better' : 'worse';
          }
          return { runId: run.id, value, difference, differencePct, verdict };
        }),
      };
    });
}
