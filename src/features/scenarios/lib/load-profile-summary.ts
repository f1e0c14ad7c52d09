/** What the editor shows of an hourly IT load profile: its range, its full-load hours and its average week. */
export interface LoadProfileSummary {
  meanFraction: number;
  minFraction: number;
  maxFraction: number;
  /** Sum of the fractions: the hours at design load that carry the same IT energy, h. */
  fullLoadHours: number;
  /** Mean fraction for each hour of the week (168 values, the profile's first day first), over its whole weeks and the days left over. */
  averageWeek: number[];
}

const HOURS_PER_WEEK = 168;

/** Range, full-load hours and average week of fractions of design load, one per hour. Empty input gives NaN figures. */
export function summariseLoadProfile(fractions: readonly number[]): LoadProfileSummary {
  const sums = new Array<number>(HOURS_PER_WEEK).fill(0);
  const counts = new Array<number>(HOURS_PER_WEEK).fill(0);
  let total = 0;
  let min = Number.POSITIVE_INFINITY;
  let max = Number.NEGATIVE_INFINITY;
  for (let h = 0; h < fractions.length; h++) {
    const f = fractions[h];
    total += f;
    if (f < min) min = f;
    if (f > max) max = f;
    sums[h % HOURS_PER_WEEK] += f;
    counts[h % HOURS_PER_WEEK]++;
  }
  const n = fractions.length;
  return {
    meanFraction: n ? total / n : Number.NaN,
    minFraction: n ? min : Number.NaN,
    maxFraction: n ? max : Number.NaN,
    fullLoadHours: total,
    averageWeek: sums.map((s, i) => (counts[i] ? s / counts[i] : Number.NaN)),
  };
}

export type RampParse = { ok: true; fractions: number[] } | { ok: false; errors: string[] };

/**
 * A ramp typed as text, one fraction of design load per year: "0.4, 0.6, 0.8, 1" (commas, semicolons, spaces or new
 * lines between). Per cent signs are read as per cent ("40 %" is 0.4). Each error names the entry and its value.
 */
export function parseRampText(text: string): RampParse {
  const errors: string[] = [];
  const fractions: number[] = [];
  // "40 %" is one entry.
  const cells = text
    .replace(/(\d)\s+%/g, '$1%')
    .split(/[\s,;]+/)
    .filter((e) => e !== '');
  cells.forEach((cell, i) => {
    const percent = cell.endsWith('%');
    const value = Number(percent ? cell.slice(0, -1) : cell);
    const fraction = percent ? value / 100 : value;
    if (!Number.isFinite(value)) errors.push(`year ${i + 1}: "${cell}" is not a number`);
    else if (fraction < 0 || fraction > 1) errors.push(`year ${i + 1}: ${cell} is outside 0 to 1 of the design load`);
    else fractions.push(fraction);
  });
  if (cells.length === 0) errors.push('give at least one year’s fraction of the design load, e.g. 0.4, 0.6, 0.8, 1');
  if (cells.length > 100) errors.push(`${cells.length} years given; at most 100`);
  return errors.length ? { ok: false, errors } : { ok: true, fractions };
}
