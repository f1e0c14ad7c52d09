/**
 * A sweep's points as the API gives them, and the figures drawn from them: progress, hours per mode
 * and the other results against the swept value, and grid cells of one metric.
 */
import type { ModeKey } from '../modes';
import type { ModeHours } from '../scenario/results';
import { subsetHours, waterPartL } from '../report/mode-subsets';
import { METRICS, type MetricDefinition, type MetricKey } from '../metrics';
import type { ScenarioResults } from '../scenario/run';
import type { SweepPointValues, SweepValue } from './expand';
import type { RunStatus as SweepRunStatus } from '../schemas/api/common';

/** A sweep's point is a run: the same statuses. */
export type { RunStatus as SweepRunStatus } from '../schemas/api/common';

/** The results a sweep shows for each point: enough for its charts and table, not the per-month tables. */
export interface SweepPointResults {
  hours: ModeHours;
  partialPue: number | null;
  coolingKwh: number;
  /** Site water over the file's hours with data, litres. */
  waterL: number;
  /** Parts of the evaporated water, litres; null for a run whose engine did not split it (scenario-engine 1.0.0). */
  humidificationL: number | null;
  evaporativeCoolingL: number | null;
  wueLPerKwh: number | null;
  peakMechanicalLoadKw: number;
  /** A hybrid hall's liquid-loop mechanical (trim-chiller) hours; absent for a single system. */
  liquidMechanicalHours?: number;
  /** Hours with data whose supply air lies outside the inlet envelope (any reason). */
  excursionHours: number;
  /**
   * The supply setpoint is outside the (altitude-derated) envelope, so every hour is an excursion: the point's
   * hours per mode describe a design the envelope does not allow.
   */
  breaksEnvelope: boolean;
}

export interface SweepPoint {
  runId: number;
  values: SweepPointValues;
  status: SweepRunStatus;
  progress: number;
  error: string | null;
  results: SweepPointResults | null;
}

export function pointResults(results: ScenarioResults): SweepPointResults {
  return {
    hours: results.hours,
    partialPue: results.energy.partialPue,
    coolingKwh: results.energy.coolingKwh,
    waterL: results.water.totalL,
    humidificationL: waterPartL(results.water, 'humidificationL'),
    evaporativeCoolingL: waterPartL(results.water, 'evaporativeCoolingL'),
    wueLPerKwh: results.water.wueLPerKwh,
    peakMechanicalLoadKw: results.peakMechanicalLoadKw,
    ...(results.loops ? { liquidMechanicalHours: results.loops.liquid.hours.mechanical } : {}),
    excursionHours: results.excursions.hours,
    breaksEnvelope: results.excursions.supplyAboveMaxHours > 0 || results.excursions.supplyBelowMinHours > 0,
  };
}

export interface SweepProgress {
  total: number;
  done: number;
  failed: number;
  cancelled: number;
  running: number;
  queued: number;
  /** 0…1: the share of points that finished (done, failed or cancelled); a running point counts once it ends. */
  fraction: number;
  /** No point waits or runs any more. */
  finished: boolean;
}

export function sweepProgress(points: readonly Pick<SweepPoint, 'status' | 'progress'>[]): SweepProgress {
  const p: SweepProgress = { total: points.length, done: 0, failed: 0, cancelled: 0, running: 0, queued: 0, fraction: 0, finished: true };
  let sum = 0;
  for (const point of points) {
    p[point.status]++;
    sum += point.status === 'running' || point.status === 'queued' ? 0 : 1;
  }
  p.fraction = points.length ? sum / points.length : 1;
  p.finished = p.running === 0 && p.queued === 0;
  return p;
}

export const SWEEP_METRICS = [
  'free',
  'humidified',
  'adiabatic',
  'mechanical',
  'partialMechanical',
  'partialPue',
  'waterL',
  'peakMechanicalLoadKw',
  'liquidMechanical',
  'excursionHours',
] as const;
export type SweepMetric = (typeof SWEEP_METRICS)[number];

/** Each metric's figure in the metric list (shared/metrics.ts), where its label, units and decimals are. */
export const sweepMetricKeys = {
  free: 'free',
  humidified: 'humidified',
  adiabatic: 'adiabatic',
  mechanical: 'mechanical',
  partialMechanical: 'partialMechanical',
  partialPue: 'ppue',
  waterL: 'waterTotal',
  peakMechanicalLoadKw: 'peak',
  liquidMechanical: 'liquidMechanical',
  excursionHours: 'excursions',
} as const satisfies Record<SweepMetric, MetricKey>;

/** A sweep metric's definition: label, units, decimals, which way is better. */
export const sweepMetric = (metric: SweepMetric): MetricDefinition => METRICS[sweepMetricKeys[metric]];

/** One metric of a finished point (SI: hours, litres, kW); null while it is not done. */
export function metricOf(results: SweepPointResults | null, metric: SweepMetric): number | null {
  if (!results) return null;
  switch (metric) {
    case 'free':
    case 'adiabatic':
    case 'mechanical':
      return results.hours[metric];
    case 'humidified':
    case 'partialMechanical':
      return subsetHours(results.hours, metric);
    case 'partialPue':
      return results.partialPue;
    case 'waterL':
      return results.waterL;
    case 'peakMechanicalLoadKw':
      return results.peakMechanicalLoadKw;
    case 'liquidMechanical':
      return results.liquidMechanicalHours ?? null;
    case 'excursionHours':
      return results.excursionHours;
  }
}

export interface ModeHoursRow {
  /** Position along the axis (0-based), so presets and numbers share one chart form. */
  index: number;
  value: SweepValue;
  mode: ModeKey;
  hours: number;
}

/** Hours per mode against the swept value, one row per finished point and mode, in mode order. */
export function modeHoursRows(points: readonly SweepPoint[], input: string): ModeHoursRow[] {
  const rows: ModeHoursRow[] = [];
  points.forEach((p, index) => {
    const value = p.values[input as keyof SweepPointValues];
    if (!p.results || value === undefined) return;
    const h = p.results.hours;
    rows.push(
      { index, value, mode: 'free', hours: h.free },
      { index, value, mode: 'adiabatic', hours: h.adiabatic },
      { index, value, mode: 'mechanical', hours: h.mechanical },
      { index, value, mode: 'noData', hours: h.noData },
    );
  });
  return rows;
}

export interface MetricRow {
  index: number;
  value: SweepValue;
  metric: number;
}

/** One metric against the swept value, finished points with a value only. */
export function metricRows(points: readonly SweepPoint[], input: string, metric: SweepMetric): MetricRow[] {
  const rows: MetricRow[] = [];
  points.forEach((p, index) => {
    const value = p.values[input as keyof SweepPointValues];
    const m = metricOf(p.results, metric);
    if (value !== undefined && m !== null) rows.push({ index, value, metric: m });
  });
  return rows;
}

export interface GridCell {
  row: SweepValue;
  column: SweepValue;
  runId: number;
  metric: number | null;
  /** The point has finished (so a null metric is a count its run's engine did not make). */
  done: boolean;
  /** The point has zero mechanical hours. */
  noMechanical: boolean;
  /** The point's supply setpoint is outside the derated envelope (every hour an excursion). */
  breaksEnvelope: boolean;
}

/** The grid of a two-input sweep: one cell per point, rows the first input, columns the second. */
export function gridCells(points: readonly SweepPoint[], rowInput: string, columnInput: string, metric: SweepMetric): GridCell[] {
  return points.flatMap((p) => {
    const row = p.values[rowInput as keyof SweepPointValues];
    const column = p.values[columnInput as keyof SweepPointValues];
    if (row === undefined || column === undefined) return [];
    return [
      {
        row,
        column,
        runId: p.runId,
        metric: metricOf(p.results, metric),
        done: p.results !== null,
        noMechanical: p.results?.hours.mechanical === 0 && !p.results.breaksEnvelope,
        breaksEnvelope: p.results?.breaksEnvelope ?? false,
      },
    ];
  });
}

/** The distinct values of one input in sweep order (the axis of a chart or table). */
export function axisOrder(points: readonly SweepPoint[], input: string): SweepValue[] {
  const seen: SweepValue[] = [];
  for (const p of points) {
    const v = p.values[input as keyof SweepPointValues];
    if (v !== undefined && !seen.includes(v)) seen.push(v);
  }
  return seen;
}
