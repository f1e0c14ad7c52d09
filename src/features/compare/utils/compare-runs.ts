import type { RunListing } from '../api/get-runs';

type Results = NonNullable<RunListing['results']>;

export interface Metric {
  key: string;
  label: string;
  /** The figure in its display form; null when the run has none. */
  value: (r: Results) => number | null;
  format: 'hours' | 'ratio' | 'mwh' | 'kw' | 'water' | 'wue';
  /** Which way is better, for colouring the difference; none for neutral figures. */
  better: 'higher' | 'lower' | 'none';
}

export const metrics: Metric[] = [
  { key: 'free', label: 'Free cooling', value: (r) => r.hours.free, format: 'hours', better: 'higher' },
  { key: 'adiabatic', label: 'Adiabatic assist', value: (r) => r.hours.adiabatic, format: 'hours', better: 'none' },
  { key: 'mechanical', label: 'Mechanical', value: (r) => r.hours.mechanical, format: 'hours', better: 'lower' },
  { key: 'noData', label: 'No data', value: (r) => r.hours.noData, format: 'hours', better: 'none' },
  { key: 'ppue', label: 'Partial PUE (cooling)', value: (r) => r.energy.partialPue, format: 'ratio', better: 'lower' },
  { key: 'cooling', label: 'Cooling energy per 8,760 h', value: (r) => r.energy.annual?.coolingKwh ?? null, format: 'mwh', better: 'lower' },
  { key: 'compressor', label: 'Compressor energy per 8,760 h', value: (r) => r.energy.annual?.compressorKwh ?? null, format: 'mwh', better: 'lower' },
  { key: 'peak', label: 'Peak mechanical load', value: (r) => r.peakMechanicalLoadKw, format: 'kw', better: 'lower' },
  { key: 'water', label: 'Water per 8,760 h', value: (r) => r.water.annualL, format: 'water', better: 'lower' },
  { key: 'wue', label: 'WUE', value: (r) => r.water.wueLPerKwh, format: 'wue', better: 'lower' },
];

export interface ComparedCell {
  runId: number;
  value: number | null;
  /** value − baseline value; null for the baseline itself or when either is missing. */
  difference: number | null;
  /** difference as a percentage of the baseline; null when the baseline is 0 or missing. */
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
  return metrics.map((metric) => {
    const base = metric.value(baseline.results!);
    return {
      metric,
      cells: done.map((run) => {
        const value = metric.value(run.results!);
        const isBase = run.id === baseline.id;
        const difference = !isBase && value !== null && base !== null ? value - base : null;
        const differencePct = difference !== null && base ? (100 * difference) / Math.abs(base) : null;
        let verdict: ComparedCell['verdict'] = 'none';
        if (difference !== null && metric.better !== 'none') {
          const tolerance = Math.abs(base ?? 0) * 1e-9;
          verdict = Math.abs(difference) <= tolerance ? 'same' : (difference > 0) === (metric.better === 'higher') ? 'better' : 'worse';
        }
        return { runId: run.id, value, difference, differencePct, verdict };
      }),
    };
  });
}
