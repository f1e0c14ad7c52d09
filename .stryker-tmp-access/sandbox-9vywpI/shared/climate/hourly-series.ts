/** Rows in time → the hourly series: order, duplicates, steps, daylight-saving hints, averaging and gap repair. */
// @ts-nocheck

import { averageToHours, fillGaps, hourRange, timeOrder, trimToCompleteHours, type RowColumns } from './hourly-grid';
import { MAX_SERIES_HOURS, MIN_MEASURED_SHARE, percent, round, type Context } from './import-context';
import { formatUtc, MS_PER_HOUR, MS_PER_MINUTE } from './time-cells';
import type { ClimateSeries, HumidityQuantity } from './types';
import { humidityKindOf } from './units';

export function toHourlySeries(rows: RowColumns, humidity: HumidityQuantity, ctx: Context, naiveLocal: boolean): ClimateSeries | null {
  const { log, counts } = ctx;
  const t = rows.timeMs;
  // rows out of order, in file order
  for (let i = 1; i < rows.count; i++) {
    if (t[i] < t[i - 1]) {
      log.warning('out-of-order', `The time goes back from ${formatUtc(t[i - 1])} to ${formatUtc(t[i])}; rows are put in time order.`, {
        line: rows.line[i],
      });
    }
  }
  const order = timeOrder(rows);
  const at = (k: number): number => (order ? order[k] : k);

  // duplicates and steps, in time order
  // one-hour steps are counted apart: a Map update per row would cost more than the rest of the loop
  const steps = new Map<number, number>();
  let hourSteps = 0;
  let previous = -1;
  for (let k = 0; k < rows.count; k++) {
    const i = at(k);
    if (previous !== -1) {
      const step = t[i] - t[previous];
      if (step === MS_PER_HOUR) {
        hourSteps++;
        previous = i;
        continue;
      }
      if (step === 0) {
        rows.dropped[i] = 1;
        counts.duplicateTimestamps++;
        log.warning('duplicate-timestamp', `${formatUtc(t[i])} appears again (first on line ${rows.line[previous]}); the later row is left out.`, {
          line: rows.line[i],
        });
        continue;
      }
      steps.set(step, (steps.get(step) ?? 0) + 1);
    }
    previous = i;
  }
  let modalStep = MS_PER_HOUR;
  let modalCount = hourSteps;
  for (const [step, times] of steps) {
    if (times > modalCount) {
      modalStep = step;
      modalCount = times;
    }
  }
  ctx.stepMinutes = modalCount > 0 ? modalStep / MS_PER_MINUTE : null;
  const hourly = modalStep >= MS_PER_HOUR;

  // hourly data stamped at a fixed minute (e.g. :50) is moved to the nearest whole hour
  let shiftMs = 0;
  if (hourly) {
    const minuteTally = new Map<number, number>();
    let onTheHour = 0;
    for (let i = 0; i < rows.count; i++) {
      if (rows.dropped[i]) continue;
      const m = ((t[i] % MS_PER_HOUR) + MS_PER_HOUR) % MS_PER_HOUR;
      if (m === 0) onTheHour++;
      else minuteTally.set(m, (minuteTally.get(m) ?? 0) + 1);
    }
    let commonMinute = 0;
    let commonCount = onTheHour;
    for (const [m, times] of minuteTally) if (times > commonCount) [commonMinute, commonCount] = [m, times];
    if (commonMinute !== 0) {
      shiftMs = commonMinute >= MS_PER_HOUR / 2 ? MS_PER_HOUR - commonMinute : -commonMinute;
      log.info(
        'timestamps-rounded',
        `Rows are stamped ${commonMinute / MS_PER_MINUTE} minutes past the hour; they are moved ${shiftMs / MS_PER_MINUTE} minutes to the nearest whole hour.`,
      );
    }
  }

  // steps that do not fit the file's rhythm, and daylight-saving hints for naive local times
  previous = -1;
  for (let k = 0; k < rows.count; k++) {
    const i = at(k);
    if (rows.dropped[i]) continue;
    if (previous !== -1) {
      const step = t[i] - t[previous];
      const offRhythm = hourly ? step % MS_PER_HOUR !== 0 : step % modalStep !== 0;
      if (offRhythm) {
        counts.nonHourlySteps++;
        log.warning(
          'non-hourly-step',
          `The step from ${formatUtc(t[previous])} to ${formatUtc(t[i])} (${round(step / MS_PER_MINUTE)} min) does not fit the file's ${round(modalStep / MS_PER_MINUTE)}-minute step.`,
          {
            line: rows.line[i],
          },
        );
      }
      if (naiveLocal && hourly && modalStep === MS_PER_HOUR && step === 2 * MS_PER_HOUR && looksLikeClockChange(t[previous])) {
        counts.daylightSavingJumps++;
        log.warning(
          'daylight-saving-jump',
          `The clock skips from ${formatUtc(t[previous])} to ${formatUtc(t[i])}, as local time does when clocks go forward; if the file is in local time, give its time zone.`,
          {
            line: rows.line[i],
          },
        );
      }
    }
    previous = i;
  }
  if (naiveLocal && hourly) {
    for (let i = 1; i < rows.count; i++) {
      if (rows.dropped[i] && looksLikeClockChange(t[i])) {
        counts.daylightSavingJumps++;
        log.warning(
          'daylight-saving-jump',
          `${formatUtc(t[i])} repeats, as local time does when clocks go back; if the file is in local time, give its time zone.`,
          {
            line: rows.line[i],
          },
        );
      }
    }
  }

  const range = hourRange(rows, shiftMs);
  if (range.last - range.first + 1 > MAX_SERIES_HOURS) {
    log.error(
      'span-too-long',
      `The times span ${Math.round((range.last - range.first + 1) / 8766)} years (${formatUtc(range.first * MS_PER_HOUR)} to ${formatUtc(range.last * MS_PER_HOUR)}); a garbled date is likely.`,
    );
    return null;
  }
  const averaged = averageToHours(rows, shiftMs, range);
  for (let h = 0; h < averaged.hours; h++) if (averaged.rowsInHour[h] > 1) counts.rowsAveraged += averaged.rowsInHour[h] - 1;
  if (counts.rowsAveraged > 0) {
    log.info(
      'sub-hourly-averaged',
      `${counts.rowsAveraged + countHoursWithSeveralRows(averaged.rowsInHour)} rows sharing an hour were averaged into ${countHoursWithSeveralRows(averaged.rowsInHour)} hourly values.`,
    );
  }
  const grid = trimToCompleteHours(averaged);
  if (!grid) {
    log.error('too-little-data', 'No hour has both a dry-bulb and a humidity value.');
    return null;
  }
  const gaps = fillGaps(grid, ctx.maxGapHours);
  for (const run of gaps.runs) {
    const length = run.to - run.from + 1;
    const from = formatUtc((grid.startHour + run.from) * MS_PER_HOUR);
    const to = formatUtc((grid.startHour + run.to) * MS_PER_HOUR);
    const line = grid.lastLine[run.from - 1] || undefined;
    if (run.filled) {
      log.info('gap-filled', `${length} hour${length > 1 ? 's' : ''} without complete data (${from} to ${to}) filled by linear interpolation.`, { line });
    } else {
      log.warning('gap-missing', `${length} hours without complete data (${from} to ${to}) are longer than ${ctx.maxGapHours} h and stay missing.`, { line });
    }
  }
  counts.hours = grid.hours;
  counts.filledHours = gaps.filledHours;
  counts.missingHours = gaps.missingHours;
  counts.measuredHours = grid.hours - gaps.filledHours - gaps.missingHours;
  counts.gaps = gaps.gaps;
  counts.longestGapHours = gaps.longestGapHours;
  if (counts.measuredHours < MIN_MEASURED_SHARE * grid.hours) {
    log.error(
      'too-little-data',
      `Only ${counts.measuredHours} of ${grid.hours} hours (${percent(counts.measuredHours / grid.hours)}) hold measured values; at least half are needed.`,
    );
    return null;
  }
  ctx.hourLines = grid.lastLine;
  const timestampsMs = new Float64Array(grid.hours);
  for (let h = 0; h < grid.hours; h++) timestampsMs[h] = (grid.startHour + h) * MS_PER_HOUR;
  return {
    timestampsMs,
    dryBulbC: grid.dryBulbC,
    humidity: { kind: humidityKindOf(humidity), values: grid.humidity },
    pressurePa: grid.pressurePa,
    flags: gaps.flags,
  };
}

function countHoursWithSeveralRows(rowsInHour: Uint16Array): number {
  let n = 0;
  for (let h = 0; h < rowsInHour.length; h++) if (rowsInHour[h] > 1) n++;
  return n;
}

/** Whether a UTC-read wall time sits where daylight-saving changes happen: 00–04 h in March, April, September, October or November. */
function looksLikeClockChange(wallMs: number): boolean {
  const date = new Date(wallMs);
  const month = date.getUTCMonth() + 1;
  const hour = date.getUTCHours();
  return hour <= 4 && (month === 3 || month === 4 || month === 9 || month === 10 || month === 11);
}
