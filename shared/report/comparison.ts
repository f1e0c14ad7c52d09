/**
 * Runs side by side against a baseline, on the compared figures of shared/metrics.ts: one computation for the compare
 * page, the comparison report and the one comparison CSV both download, so they give the same figures in the same units.
 */
import { csvRow } from '../csv';
import { comparedMetrics, differencePercent, metricUnit, metricValue, type ComparableResults, type ComparedMetric, type MetricUnits } from '../metrics';

/** What a comparison needs of a run: the run list's entries and the report's runs both have it. */
export interface ComparedRun {
  id: number;
  engineVersion: string;
  scenario: { name: string };
  climate: { name: string };
  results: ComparableResults;
}

export interface ComparedCell {
  runId: number;
  /** SI, as computed. */
  value: number | null;
  /** value − baseline value; null for the baseline itself or when either is missing. */
  difference: number | null;
  /** difference as a percentage of the baseline; null when the baseline is missing or under the figure's floor. */
  differencePct: number | null;
  /** Whether the difference is an improvement, a worsening, or neither. */
  verdict: 'better' | 'worse' | 'same' | 'none';
}

export interface ComparedRow {
  metric: ComparedMetric;
  cells: ComparedCell[];
}

/** The runs of a list that have results (finished ones), as a comparison takes them. */
export function withResults<R extends { results: ComparableResults | null }>(runs: readonly R[]): (R & { results: ComparableResults })[] {
  return runs.filter((r): r is R & { results: ComparableResults } => r.results !== null);
}

/** Every compared figure for every run (in the order given), with its difference from the baseline; hybrid figures only when a hybrid is among them. */
export function compareRuns(runs: readonly ComparedRun[], baselineId: number): ComparedRow[] {
  const baseline = runs.find((r) => r.id === baselineId) ?? runs[0];
  if (!baseline) return [];
  const anyHybrid = runs.some((r) => r.results.loops !== undefined);
  return comparedMetrics
    .filter((m) => anyHybrid || !m.hybridOnly)
    .map((metric) => {
      const base = metric.value(baseline.results);
      return {
        metric,
        cells: runs.map((run) => {
          const value = metric.value(run.results);
          const difference = run.id !== baseline.id && value !== null && base !== null ? value - base : null;
          let verdict: ComparedCell['verdict'] = 'none';
          if (difference !== null && metric.better !== 'none') {
            const tolerance = Math.abs(base ?? 0) * 1e-9;
            verdict = Math.abs(difference) <= tolerance ? 'same' : difference > 0 === (metric.better === 'higher') ? 'better' : 'worse';
          }
          return { runId: run.id, value, difference, differencePct: differencePercent(metric, difference, base), verdict };
        }),
      };
    });
}

/** One line of the comparison as downloaded (CSV and JSON): values and differences in the chosen units, rounded to the figure's decimals. */
export interface ComparisonRow {
  key: string;
  figure: string;
  unit: string;
  better: ComparedMetric['better'];
  notInOldRuns: boolean;
  part: boolean;
  /** The figure's name where it stands alone (a CSV line). */
  standaloneFigure: string;
  cells: { runId: number; value: number | null; difference: number | null }[];
}

export function comparisonRows(runs: readonly ComparedRun[], baselineId: number, units: MetricUnits = 'SI'): ComparisonRow[] {
  return compareRuns(runs, baselineId).map(({ metric, cells }) => ({
    key: metric.key,
    figure: metric.label,
    unit: metricUnit(metric, units),
    better: metric.better,
    notInOldRuns: metric.notInOldRuns,
    part: metric.part,
    standaloneFigure: metric.standalone,
    cells: cells.map((c) => ({ runId: c.runId, value: metricValue(metric, c.value, units), difference: metricValue(metric, c.difference, units, true) })),
  }));
}

/**
 * The comparison as CSV: one line per figure; each run's value, then its difference from the baseline. `runName` names
 * a run in the header (the compare page adds a sweep point's values to the scenario's name).
 */
export function comparisonCsv(
  runs: readonly ComparedRun[],
  baselineId: number,
  units: MetricUnits = 'SI',
  runName: (run: ComparedRun) => string = (run) => run.scenario.name,
): string {
  const label = (run: ComparedRun) => `run ${run.id}${run.id === baselineId ? ' (baseline)' : ''}: ${runName(run)} / ${run.climate.name}`;
  const header = ['figure', 'unit', ...runs.flatMap((run) => [label(run), `run ${run.id} difference`])];
  const lines = [csvRow(header), csvRow(['Engine version', '', ...runs.flatMap((run) => [run.engineVersion, ''])])];
  for (const row of comparisonRows(runs, baselineId, units)) {
    lines.push(csvRow([row.standaloneFigure, row.unit, ...row.cells.flatMap((c) => [c.value, c.difference])]));
  }
  return `${lines.join('\n')}\n`;
}
