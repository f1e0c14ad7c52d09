/**
 * The value exceeded by `exceedPct` percent of the finite values (ASHRAE's cumulative-frequency
 * reading: the 0.4 % dry-bulb is exceeded in 0.4 % of hours). Linear interpolation between order
 * statistics. `sorted` must be ascending and hold no NaN. NaN for an empty array.
 */
// @ts-nocheck

export function exceededValue(sorted: Float64Array, exceedPct: number): number {
  if (!(exceedPct >= 0 && exceedPct <= 100)) throw new RangeError(`exceedPct must be 0..100, got ${exceedPct}`);
  const n = sorted.length;
  if (n === 0) return NaN;
  const position = (1 - exceedPct / 100) * (n - 1);
  const lower = Math.floor(position);
  const upper = Math.min(lower + 1, n - 1);
  return sorted[lower] + (sorted[upper] - sorted[lower]) * (position - lower);
}

/** The finite values of a column, sorted ascending, as a new array. */
export function sortedFinite(values: Float64Array): Float64Array {
  let n = 0;
  for (let i = 0; i < values.length; i++) if (values[i] === values[i]) n++;
  const out = new Float64Array(n);
  let j = 0;
  for (let i = 0; i < values.length; i++) if (values[i] === values[i]) out[j++] = values[i];
  return out.sort();
}
