export interface SeriesSummary {
  count: number;
  missing: number;
  min: number;
  max: number;
  mean: number;
}

/**
 * Count, missing values, min, max and mean of one column in a single pass.
 * NaN marks a missing value; an empty or all-missing column gives NaN statistics.
 */
export function summariseSeries(values: Float64Array): SeriesSummary {
  let count = 0;
  let min = Infinity;
  let max = -Infinity;
  let sum = 0;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (v !== v) continue;
    count++;
    sum += v;
    if (v < min) min = v;
    if (v > max) max = v;
  }
  return {
    count,
    missing: values.length - count,
    min: count ? min : NaN,
    max: count ? max : NaN,
    mean: count ? sum / count : NaN,
  };
}
