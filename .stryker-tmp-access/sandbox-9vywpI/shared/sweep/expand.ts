/**
 * A sweep's axes expanded into points. A numeric axis runs from `from` to `to` by `step`, both ends
 * included when the step lands on `to`; a preset axis lists envelope presets. Two axes make a grid,
 * the first axis outer (rows), the second inner (columns).
 */
// @ts-nocheck

import type { SweepInputPath } from './inputs';

export const MAX_SWEEP_POINTS = 200;

export interface RangeAxis {
  input: Exclude<SweepInputPath, 'envelope.presetId'>;
  from: number;
  to: number;
  step: number;
}
export interface PresetAxis {
  input: 'envelope.presetId';
  presetIds: string[];
}
export type SweepAxis = RangeAxis | PresetAxis;

export type SweepValue = number | string;
/** One point: the swept inputs' values, e.g. {"system.supplyAirC": 24}. */
export type SweepPointValues = Partial<Record<SweepInputPath, SweepValue>>;

// Slack for a range whose last step falls a rounding error short of `to` (e.g. 0.1 to 0.9 by 0.1).
const SLACK = 1e-9;

/**
 * How many values a numeric range gives: ⌊(to − from)/step⌋ + 1, or 0 for a range that is not one
 * (step not above 0, to below from, a number not finite). Counts without building the list.
 */
export function rangeCount(from: number, to: number, step: number): number {
  if (!Number.isFinite(from) || !Number.isFinite(to) || !Number.isFinite(step) || !(step > 0) || to < from) return 0;
  return Math.floor((to - from) / step + SLACK) + 1;
}

/** Rounds away the binary noise of from + i·step (0.1 + 2·0.1 = 0.30000000000000004) at nine decimals. */
const tidy = (v: number) => Math.round(v * 1e9) / 1e9;

/** The values of one axis, in sweep order. A numeric range longer than `limit` throws RangeError naming the axis. */
export function axisValues(axis: SweepAxis, limit = MAX_SWEEP_POINTS): SweepValue[] {
  if (axis.input === 'envelope.presetId') return [...axis.presetIds];
  const count = rangeCount(axis.from, axis.to, axis.step);
  if (count === 0)
    throw new RangeError(`${axis.input}: from ${axis.from} to ${axis.to} by ${axis.step} is not a range (step must be above 0 and to at least from)`);
  if (count > limit) throw new RangeError(`${axis.input}: from ${axis.from} to ${axis.to} by ${axis.step} gives ${count} values, more than ${limit}`);
  const values = new Array<number>(count);
  for (let i = 0; i < count; i++) values[i] = tidy(axis.from + i * axis.step);
  return values;
}

/** The number of points of a sweep (product of its axes' lengths) without building them. */
export function sweepPointCount(axes: readonly SweepAxis[]): number {
  return axes.reduce((n, a) => n * (a.input === 'envelope.presetId' ? a.presetIds.length : rangeCount(a.from, a.to, a.step)), axes.length ? 1 : 0);
}

/** Every point of the sweep: one axis gives a line, two a grid (first axis outer). */
export function expandSweep(axes: readonly SweepAxis[], limit = MAX_SWEEP_POINTS): SweepPointValues[] {
  if (axes.length === 0 || axes.length > 2) throw new RangeError(`axes must hold one or two inputs, got ${axes.length}`);
  const count = sweepPointCount(axes);
  if (count > limit) throw new RangeError(`the sweep has ${count} points, more than ${limit}`);
  const [outer, inner] = axes;
  const outerValues = axisValues(outer, limit);
  if (!inner) return outerValues.map((v) => ({ [outer.input]: v }));
  const innerValues = axisValues(inner, limit);
  return outerValues.flatMap((a) => innerValues.map((b) => ({ [outer.input]: a, [inner.input]: b })));
}
