/**
 * The IT load through the years, as a fraction of the design load (energy.itLoadKw) per hour: a constant,
 * a ramp by calendar year, or an uploaded profile per hour of the year. Reading a profile file, the
 * built-in example shape, and each hour's fraction for a run.
 */
// @ts-nocheck

import { civilFromDays, MS_PER_DAY, MS_PER_HOUR } from '../calendar';
import { LOAD_PROFILE_HOURS, type ItLoadProfile } from './schema';

export type ParseLoadProfileResult = { ok: true; fractions: number[] } | { ok: false; errors: string[] };

/** Errors listed before the report says how many more there are. */
const MAX_ERRORS = 20;

/**
 * Reads a load profile: one value per line, the fraction of design IT load (0…1) for each hour of a
 * 365-day year in local standard time, 8760 lines. A first line that is not a number is taken as a header.
 * A line may hold several comma-, semicolon- or tab-separated cells (e.g. "hour,fraction"): the last one is
 * the fraction. Blank lines are skipped. Every error names the line and the value; nothing is returned
 * unless the whole file is good.
 */
export function parseLoadProfileCsv(text: string): ParseLoadProfileResult {
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\n|\r/);
  const fractions: number[] = [];
  const errors: string[] = [];
  let extra = 0;
  let firstData = true;
  for (let index = 0; index < lines.length; index++) {
    const line = lines[index].trim();
    if (line === '') continue;
    const cells = line.split(/[,;\t]/);
    const cell = cells[cells.length - 1].trim().replace(/^"(.*)"$/, '$1');
    const value = cell === '' ? Number.NaN : Number(cell);
    if (firstData && !Number.isFinite(value)) {
      firstData = false; // a header line
      continue;
    }
    firstData = false;
    const lineNumber = index + 1;
    if (!Number.isFinite(value)) addError(`line ${lineNumber}: "${cell}" is not a number`);
    else if (value < 0 || value > 1) addError(`line ${lineNumber}: ${cell} is outside 0 to 1 (a fraction of the design IT load; 100 % is 1)`);
    fractions.push(value);
  }
  if (fractions.length !== LOAD_PROFILE_HOURS) {
    errors.unshift(
      `the file has ${fractions.length} hourly values; a load profile needs ${LOAD_PROFILE_HOURS} (one per hour of a 365-day year, 29 February left out)`,
    );
  }
  if (extra > 0) errors.push(`… and ${extra} more values out of range or not numbers`);
  return errors.length > 0 ? { ok: false, errors } : { ok: true, fractions };

  function addError(message: string): void {
    if (errors.length < MAX_ERRORS) errors.push(message);
    else extra++;
  }
}

/** Name of the built-in example profile; it is an example, not a measured load. */
export const EXAMPLE_LOAD_PROFILE_NAME = 'Typical daily and weekly shape (example, synthetic)';

/**
 * A built-in EXAMPLE of an hourly IT load profile (synthetic, for trying the feature — not measured data):
 * a daily shape from 0.80 of design at 04:00 to 0.95 at 16:00 (a cosine), weekends at 0.9 of the weekday
 * value. The year starts on a Monday. 8760 fractions.
 */
export function exampleLoadProfile(): number[] {
  const fractions = new Array<number>(LOAD_PROFILE_HOURS);
  for (let h = 0; h < LOAD_PROFILE_HOURS; h++) {
    const hourOfDay = h % 24;
    const dayOfWeek = Math.floor(h / 24) % 7; // 0 Monday … 6 Sunday
    const daily = 0.875 - 0.075 * Math.cos((2 * Math.PI * (hourOfDay - 4)) / 24);
    const weekly = dayOfWeek >= 5 ? 0.9 : 1;
    fractions[h] = Math.round(daily * weekly * 1000) / 1000;
  }
  return fractions;
}

/** Cumulative days before each month of a 365-day year. */
const DAYS_BEFORE_MONTH = [0, 31, 59, 90, 120, 151, 181, 212, 243, 273, 304, 334];

/**
 * Each hour's IT load as a fraction of design, for timestamps (UTC ms) at a site whose local standard time
 * is UTC + utcOffsetMinutes:
 * constant — 1;
 * yearly-ramp — fractions[k] in the k-th calendar year (local) from the first year of the series; the last
 *   value holds afterwards;
 * hourly-profile — fractions[hour of the 365-day local year]; 29 February repeats 28 February.
 * NaN timestamps get NaN.
 */
export function hourlyLoadFractions(profile: ItLoadProfile, timestampsMs: Float64Array, utcOffsetMinutes = 0): Float64Array {
  const n = timestampsMs.length;
  const out = new Float64Array(n);
  if (profile.kind === 'constant') return out.fill(1);
  const offsetMs = utcOffsetMinutes * 60_000;
  const civil = { year: 0, month: 0, day: 0 };
  let firstYear = Number.NaN;
  let currentDay = Number.NaN;
  let dayValue = 0; // ramp: the year's fraction; profile: the first hour of the day in the 365-day year
  for (let i = 0; i < n; i++) {
    const localMs = timestampsMs[i] + offsetMs;
    if (localMs !== localMs) {
      out[i] = Number.NaN;
      continue;
    }
    const day = Math.floor(localMs / MS_PER_DAY);
    if (day !== currentDay) {
      currentDay = day;
      civilFromDays(day, civil);
      if (profile.kind === 'yearly-ramp') {
        if (firstYear !== firstYear) firstYear = civil.year;
        const k = Math.min(profile.fractions.length - 1, Math.max(0, civil.year - firstYear));
        dayValue = profile.fractions[k];
      } else {
        // 29 February takes 28 February's hours; later days keep their 365-day position.
        const dayOfYear = DAYS_BEFORE_MONTH[civil.month - 1] + (civil.month === 2 && civil.day === 29 ? 28 : civil.day) - 1;
        dayValue = dayOfYear * 24;
      }
    }
    if (profile.kind === 'yearly-ramp') out[i] = dayValue;
    else out[i] = profile.fractions[dayValue + Math.floor((localMs - day * MS_PER_DAY) / MS_PER_HOUR)];
  }
  return out;
}
