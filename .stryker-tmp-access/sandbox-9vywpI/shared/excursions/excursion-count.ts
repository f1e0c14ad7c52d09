/**
 * Counting inlet excursions in one pass over the hourly inlet states: hours inside the recommended range,
 * outside it but inside the allowable class, outside the allowable class; excursion events (runs of
 * consecutive hours outside the recommended range) with their durations; the hourly rate of change of the
 * inlet dry-bulb; and the time-weighted X-factor. Typed arrays in, plain totals out, no allocation per hour.
 */
// @ts-nocheck

import { lnSaturationPressure } from '../psychrometrics/saturation';
import { humidityRatioFromDewPoint } from '../psychrometrics';
import { MOLAR_MASS_RATIO } from '../psychrometrics/constants';
import { MS_PER_HOUR } from '../calendar';
import type { InletLimits } from '../scenario/classify';
import { xFactorAt } from './x-factor';

/** Inlet limits an hour is checked against; dryBulbMaxC already derated for altitude. */
export type EnvelopeBounds = InletLimits;

/** Why an hour is outside an envelope (bit flags; an hour may have two). */
export const CAUSE = { warm: 1, cold: 2, humid: 4, dry: 8 } as const;

export interface CauseHours {
  warm: number;
  cold: number;
  humid: number;
  dry: number;
}

/** Event durations are counted in these bins, inclusive hours; the last is open-ended. */
export const DURATION_BINS: readonly { fromHours: number; toHours: number | null }[] = [
  { fromHours: 1, toHours: 1 },
  { fromHours: 2, toHours: 3 },
  { fromHours: 4, toHours: 6 },
  { fromHours: 7, toHours: 12 },
  { fromHours: 13, toHours: 24 },
  { fromHours: 25, toHours: 72 },
  { fromHours: 73, toHours: null },
];

export interface EventTotals {
  count: number;
  longestHours: number;
  /** Timestamp of the first hour of the longest event, ms; null without events. The earliest wins a tie. */
  longestStartMs: number | null;
}

export interface ExcursionCounts {
  dataHours: number;
  noDataHours: number;
  insideRecommendedHours: number;
  /** Outside the recommended range, inside the allowable class. */
  outsideRecommendedHours: number;
  /** Outside the allowable class (whether or not inside the recommended range). */
  outsideAllowableHours: number;
  causes: { recommended: CauseHours; allowable: CauseHours };
  /** Runs of consecutive hours outside the recommended range or the allowable class. */
  events: EventTotals & { histogram: number[] };
  /** Runs of consecutive hours outside the allowable class. */
  allowableEvents: EventTotals;
  rateOfChange: {
    limitKPerHour: number;
    /** Hour-to-hour steps whose absolute change of inlet dry-bulb is above the limit. */
    stepsAboveLimit: number;
    /** Consecutive pairs of hours with data that were compared. */
    stepsChecked: number;
    maxKPerHour: number;
    maxAtMs: number | null;
  };
  /** Mean of the X-factor over hours with data; NaN without data. */
  timeWeightedXFactor: number;
  inletC: { min: number; mean: number; max: number };
}

export interface CountInput {
  timestampsMs: Float64Array;
  inletC: Float64Array;
  inletW: Float64Array;
  pressurePa: Float64Array | number;
  recommended: EnvelopeBounds;
  allowable: EnvelopeBounds;
  /** Largest hour-to-hour change of inlet dry-bulb the guideline allows, K per hour. */
  rateLimitKPerHour: number;
}

/** Slack for comparing against limits the inlet model sets exactly (a coil holding the setpoint or W_hi). */
const TEMPERATURE_SLACK_K = 1e-9;
const MOISTURE_SLACK = 1e-9;

/**
 * Excursion totals over the hours. An hour with a NaN inlet value is a no-data hour; an event is broken by a
 * no-data hour, by an hour back inside the range, or by a time step other than one hour. Humidity limits are
 * checked as humidity ratios: W at a dew-point limit (eq. 36 with 20) and W at (inlet dry-bulb, RH limit)
 * (eq. 22 with 20, saturation pressure eq. 5/6), ASHRAE Handbook—Fundamentals (2017) ch. 1.
 * Throws RangeError for arrays of different lengths or a non-positive rate limit.
 */
export function countExcursions(input: CountInput): ExcursionCounts {
  const { timestampsMs, inletC, inletW, pressurePa, recommended, allowable, rateLimitKPerHour } = input;
  const n = inletC.length;
  if (timestampsMs.length !== n) throw new RangeError(`timestampsMs has ${timestampsMs.length} hours, inletC has ${n}`);
  if (inletW.length !== n) throw new RangeError(`inletW has ${inletW.length} hours, inletC has ${n}`);
  if (typeof pressurePa !== 'number' && pressurePa.length !== n) throw new RangeError(`pressurePa has ${pressurePa.length} hours, inletC has ${n}`);
  if (!(rateLimitKPerHour > 0)) throw new RangeError(`rateLimitKPerHour must be above 0, got ${rateLimitKPerHour}`);

  const recCauses = { warm: 0, cold: 0, humid: 0, dry: 0 };
  const allowCauses = { warm: 0, cold: 0, humid: 0, dry: 0 };
  const histogram = new Array<number>(DURATION_BINS.length).fill(0);
  const events: EventTotals = { count: 0, longestHours: 0, longestStartMs: null };
  const allowableEvents: EventTotals = { count: 0, longestHours: 0, longestStartMs: null };
  let dataHours = 0;
  let inside = 0;
  let outsideRecommended = 0;
  let outsideAllowable = 0;
  let xSum = 0;
  let minC = Number.POSITIVE_INFINITY;
  let maxC = Number.NEGATIVE_INFINITY;
  let sumC = 0;
  let stepsAbove = 0;
  let stepsChecked = 0;
  let maxRate = 0;
  let maxRateAt: number | null = null;

  let runLength = 0;
  let runStart = 0;
  let allowRun = 0;
  let allowStart = 0;
  let previousMs = Number.NaN;
  let previousC = Number.NaN;

  const fixedPressure = typeof pressurePa === 'number' ? pressurePa : Number.NaN;
  const pressureSeries = typeof pressurePa === 'number' ? null : pressurePa;
  let cachedPressure = Number.NaN;
  let recDpMinW = 0;
  let recDpMaxW = 0;
  let allowDpMinW = 0;
  let allowDpMaxW = 0;

  const closeRun = (length: number, start: number, totals: EventTotals, binned: boolean) => {
    if (length === 0) return;
    totals.count++;
    if (length > totals.longestHours) {
      totals.longestHours = length;
      totals.longestStartMs = start;
    }
    if (binned) histogram[durationBin(length)]++;
  };

  for (let i = 0; i < n; i++) {
    const c = inletC[i];
    const w = inletW[i];
    const ms = timestampsMs[i];
    const p = pressureSeries === null ? fixedPressure : pressureSeries[i];
    const contiguous = ms - previousMs === MS_PER_HOUR;
    if (c !== c || w !== w || p !== p) {
      closeRun(runLength, runStart, events, true);
      closeRun(allowRun, allowStart, allowableEvents, false);
      runLength = 0;
      allowRun = 0;
      previousMs = ms;
      previousC = Number.NaN;
      continue;
    }
    if (p !== cachedPressure) {
      cachedPressure = p;
      recDpMinW = humidityRatioFromDewPoint(recommended.dewPointMinC, p);
      recDpMaxW = humidityRatioFromDewPoint(recommended.dewPointMaxC, p);
      allowDpMinW = humidityRatioFromDewPoint(allowable.dewPointMinC, p);
      allowDpMaxW = humidityRatioFromDewPoint(allowable.dewPointMaxC, p);
    }
    dataHours++;
    sumC += c;
    if (c < minC) minC = c;
    if (c > maxC) maxC = c;
    xSum += xFactorAt(c);

    const pws = Math.exp(lnSaturationPressure(c));
    const rec = causesOf(c, w, p, pws, recommended, recDpMinW, recDpMaxW);
    const allow = causesOf(c, w, p, pws, allowable, allowDpMinW, allowDpMaxW);
    tally(rec, recCauses);
    tally(allow, allowCauses);
    if (allow !== 0) outsideAllowable++;
    else if (rec !== 0) outsideRecommended++;
    else inside++;

    // Events: consecutive hours outside either envelope.
    if (rec !== 0 || allow !== 0) {
      if (runLength > 0 && !contiguous) {
        closeRun(runLength, runStart, events, true);
        runLength = 0;
      }
      if (runLength === 0) runStart = ms;
      runLength++;
    } else {
      closeRun(runLength, runStart, events, true);
      runLength = 0;
    }
    if (allow !== 0) {
      if (allowRun > 0 && !contiguous) {
        closeRun(allowRun, allowStart, allowableEvents, false);
        allowRun = 0;
      }
      if (allowRun === 0) allowStart = ms;
      allowRun++;
    } else {
      closeRun(allowRun, allowStart, allowableEvents, false);
      allowRun = 0;
    }

    if (contiguous && previousC === previousC) {
      stepsChecked++;
      const rate = Math.abs(c - previousC);
      if (rate > rateLimitKPerHour) stepsAbove++;
      if (rate > maxRate) {
        maxRate = rate;
        maxRateAt = ms;
      }
    }
    previousMs = ms;
    previousC = c;
  }
  closeRun(runLength, runStart, events, true);
  closeRun(allowRun, allowStart, allowableEvents, false);

  const hasData = dataHours > 0;
  return {
    dataHours,
    noDataHours: n - dataHours,
    insideRecommendedHours: inside,
    outsideRecommendedHours: outsideRecommended,
    outsideAllowableHours: outsideAllowable,
    causes: { recommended: recCauses, allowable: allowCauses },
    events: { ...events, histogram },
    allowableEvents,
    rateOfChange: { limitKPerHour: rateLimitKPerHour, stepsAboveLimit: stepsAbove, stepsChecked, maxKPerHour: maxRate, maxAtMs: maxRateAt },
    timeWeightedXFactor: hasData ? xSum / dataHours : Number.NaN,
    inletC: hasData ? { min: minC, mean: sumC / dataHours, max: maxC } : { min: Number.NaN, mean: Number.NaN, max: Number.NaN },
  };
}

/** Index in DURATION_BINS of an event lasting `hours`. */
export function durationBin(hours: number): number {
  for (let b = 0; b < DURATION_BINS.length; b++) {
    const to = DURATION_BINS[b].toHours;
    if (to === null || hours <= to) return b;
  }
  return DURATION_BINS.length - 1;
}

function causesOf(c: number, w: number, p: number, pws: number, e: EnvelopeBounds, dpMinW: number, dpMaxW: number): number {
  let causes = 0;
  if (c > e.dryBulbMaxC + TEMPERATURE_SLACK_K) causes |= CAUSE.warm;
  if (c < e.dryBulbMinC - TEMPERATURE_SLACK_K) causes |= CAUSE.cold;
  const pwMax = (e.rhMaxPct / 100) * pws;
  const rhMaxW = (MOLAR_MASS_RATIO * pwMax) / (p - pwMax);
  if (w > dpMaxW + MOISTURE_SLACK || w > rhMaxW + MOISTURE_SLACK) causes |= CAUSE.humid;
  const pwMin = (e.rhMinPct / 100) * pws;
  const rhMinW = (MOLAR_MASS_RATIO * pwMin) / (p - pwMin);
  if (w < dpMinW - MOISTURE_SLACK || w < rhMinW - MOISTURE_SLACK) causes |= CAUSE.dry;
  return causes;
}

function tally(causes: number, into: CauseHours): void {
  if (causes & CAUSE.warm) into.warm++;
  if (causes & CAUSE.cold) into.cold++;
  if (causes & CAUSE.humid) into.humid++;
  if (causes & CAUSE.dry) into.dry++;
}
