/**
 * Year-to-year statistics of a run over a multi-year climate file: which year is the median, the
 * 10th and 90th percentile and the worst, and how far the years spread. Works on the run's
 * `hoursByYear`; partial calendar years are set aside, never mixed into the statistics.
 *
 * Percentiles use the nearest-rank method (the P-th percentile of N ordered values is the value of
 * rank ⌈P/100 · N⌉, rank 1 the smallest), so every percentile is a year that really happened and
 * can be named. The median is the 50th percentile by the same rule (for an even count, the lower
 * of the two middle years). The spread is the range (largest minus smallest year); the standard
 * deviation, given beside it, is the sample one (divisor N − 1).
 */
import type { YearResults } from './results';

/** The quantities summarised per year. */
export const YEAR_METRICS = ['free', 'adiabatic', 'mechanical', 'coolingKwh', 'waterL'] as const;
export type YearMetric = (typeof YEAR_METRICS)[number];

/** One year at a percentile of one quantity: the year and its value. */
export interface YearPoint {
  year: number;
  value: number;
}

export interface MetricStatistics {
  median: YearPoint;
  p10: YearPoint;
  p90: YearPoint;
  min: YearPoint;
  max: YearPoint;
  /** max − min, in the quantity's unit. */
  range: number;
  /** Sample standard deviation (divisor N − 1); null with a single full year. */
  standardDeviation: number | null;
  mean: number;
}

export interface PartialYear {
  year: number;
  /** Hours of this year present in the file (with or without data). */
  hours: number;
  /** Hours the calendar year has: 8760, or 8784 in a leap year. */
  calendarHours: number;
}

export interface WorstYear {
  year: number;
  mechanical: number;
  /** Other full years with exactly as many mechanical hours; the tie was broken as `tieRule` says. */
  tiedWith: number[];
}

export interface YearStatistics {
  /** Full calendar years, in year order: the ones the statistics are over. */
  fullYears: YearResults[];
  /** Calendar years with fewer hours in the file than the calendar year has: shown, left out. */
  partialYears: PartialYear[];
  /** Null when no full year exists. */
  metrics: Record<YearMetric, MetricStatistics> | null;
  worst: WorstYear | null;
}

/** The statistic rows under a year table, in order: the page, the report and the summary CSV share them. */
export const YEAR_STATISTIC_ROWS: { key: string; label: string; title: string; cell: (s: MetricStatistics) => YearPoint | { value: number | null } }[] = [
  { key: 'median', label: 'Median year', title: '50th percentile, nearest rank', cell: (s) => s.median },
  { key: 'p10', label: 'P10 year', title: '10th percentile, nearest rank', cell: (s) => s.p10 },
  { key: 'p90', label: 'P90 year', title: '90th percentile, nearest rank', cell: (s) => s.p90 },
  { key: 'range', label: 'Spread (max − min)', title: 'largest minus smallest full year', cell: (s) => ({ value: s.range }) },
  {
    key: 'standardDeviation',
    label: 'Standard deviation',
    title: 'sample standard deviation over the full years (divisor N − 1)',
    cell: (s) => ({ value: s.standardDeviation }),
  },
];

/** The note under a year table on how the statistics are taken (page and report). */
export function yearStatisticsNote(fullYears: number): string {
  return `Statistics over ${fullYears} full calendar year${fullYears === 1 ? '' : 's'}. Percentiles by nearest rank: of N years ordered from the smallest value, the P-th percentile is the year of rank ⌈P/100 · N⌉, so each one is a year that happened (the median of an even count is the lower middle year). Each column is ordered on its own, so the median year for free cooling need not be the median year for water. The spread is the range from the smallest to the largest year; the standard deviation beside it is the sample one (divisor N − 1).`;
}

/** How a partial year is marked beside its row, on the run page, in the report and in the summary CSV. */
export const PARTIAL_YEAR_MARK = 'partial · left out';

/** The sentence under a year table naming the partial years, e.g. "… 2024 (1 of 8,784 h)."; null when there are none. */
export function partialYearsSentence(partialYears: readonly PartialYear[]): string | null {
  if (partialYears.length === 0) return null;
  const h = (n: number) => Math.round(n).toLocaleString('en');
  return `Left out as partial (more than a day short of the calendar year's hours): ${partialYears.map((p) => `${p.year} (${h(p.hours)} of ${h(p.calendarHours)} h)`).join(', ')}.`;
}

/** A year may lack this many of its hours and still count as a full year. */
export const FULL_YEAR_SHORTFALL_HOURS = 24;

export const PERCENTILE_METHOD =
  'nearest rank: the P-th percentile of N years is the year of rank ⌈P/100 · N⌉ counted from the smallest value (ties ordered by year)';
export const WORST_YEAR_TIE_RULE = 'most mechanical hours; a tie goes to the year with more cooling energy, then to the earlier year';

/** Hours in calendar year `year` of the proleptic Gregorian calendar. */
export function calendarYearHours(year: number): number {
  if (!Number.isInteger(year)) throw new RangeError(`year must be a whole number, got ${year}`);
  const leap = (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
  return leap ? 8784 : 8760;
}

/**
 * Value at percentile `percent` (0 < percent ≤ 100) of `points` sorted ascending, nearest-rank method
 * (rank ⌈P/100 · N⌉, at least 1), the inverse of the empirical distribution function: definition 1 of
 * Hyndman & Fan, "Sample quantiles in statistical packages", The American Statistician 50(4), 1996. Throws RangeError for an empty list or a percent outside (0, 100].
 */
export function nearestRank<T>(sortedAscending: readonly T[], percent: number): T {
  if (sortedAscending.length === 0) throw new RangeError('sortedAscending must hold at least one value');
  if (!(percent > 0 && percent <= 100)) throw new RangeError(`percent must be above 0 and at most 100, got ${percent}`);
  const rank = Math.max(1, Math.ceil((percent / 100) * sortedAscending.length));
  return sortedAscending[rank - 1];
}

/** Statistics over the full years of `hoursByYear` (a run's results). */
export function yearStatistics(hoursByYear: readonly YearResults[]): YearStatistics {
  const fullYears: YearResults[] = [];
  const partialYears: PartialYear[] = [];
  for (const y of [...hoursByYear].sort((a, b) => a.year - b.year)) {
    const calendarHours = calendarYearHours(y.year);
    // `total` counts every hour of the year in the file, no-data hours included: those are shown in the
    // run's counts, but a year cut short by the file's start or end would bias every statistic. Up to a
    // day short still counts as whole: a file of whole UTC years read on a site's clock moves up to 14 h
    // of its first or last year into the next or previous one.
    if (y.total < calendarHours - FULL_YEAR_SHORTFALL_HOURS) partialYears.push({ year: y.year, hours: y.total, calendarHours });
    else fullYears.push(y);
  }
  if (fullYears.length === 0) return { fullYears, partialYears, metrics: null, worst: null };

  const metrics = Object.fromEntries(YEAR_METRICS.map((metric) => [metric, metricStatistics(fullYears, metric)])) as Record<YearMetric, MetricStatistics>;
  return { fullYears, partialYears, metrics, worst: worstYear(fullYears) };
}

function metricStatistics(years: readonly YearResults[], metric: YearMetric): MetricStatistics {
  const points: YearPoint[] = years.map((y) => ({ year: y.year, value: y[metric] })).sort((a, b) => a.value - b.value || a.year - b.year);
  const n = points.length;
  let sum = 0;
  for (const p of points) sum += p.value;
  const mean = sum / n;
  let squares = 0;
  for (const p of points) squares += (p.value - mean) ** 2;
  return {
    median: nearestRank(points, 50),
    p10: nearestRank(points, 10),
    p90: nearestRank(points, 90),
    min: points[0],
    max: points[n - 1],
    range: points[n - 1].value - points[0].value,
    standardDeviation: n > 1 ? Math.sqrt(squares / (n - 1)) : null,
    mean,
  };
}

function worstYear(years: readonly YearResults[]): WorstYear {
  const ordered = [...years].sort((a, b) => b.mechanical - a.mechanical || b.coolingKwh - a.coolingKwh || a.year - b.year);
  const worst = ordered[0];
  const tiedWith = ordered
    .slice(1)
    .filter((y) => y.mechanical === worst.mechanical)
    .map((y) => y.year)
    .sort((a, b) => a - b);
  return { year: worst.year, mechanical: worst.mechanical, tiedWith };
}
