/**
 * Tramontane stores each hour by the instant it starts (shared/time-zone.ts). Stamps that mark the end of
 * their hour (hour 1–24, a 24:00 time, EPW records) move back one hour here, before typical-year placement
 * and the hourly grid, so hour 24 of 31 December stays in its year and no phantom hour opens the next.
 */
// @ts-nocheck

import type { Context } from './import-context';
import { formatUtc, MS_PER_HOUR } from './time-cells';

/** Moves `count` rows' UTC and local times back one hour when ctx.hourEnding, and says so once. */
export function moveHourEndingToStart(timeMs: Float64Array, localMs: Float64Array, count: number, firstLine: number, ctx: Context): void {
  if (!ctx.hourEnding || count === 0) return;
  for (let i = 0; i < count; i++) {
    timeMs[i] -= MS_PER_HOUR;
    localMs[i] -= MS_PER_HOUR;
  }
  const stamped = formatUtc(localMs[0] + MS_PER_HOUR)
    .slice(0, 16)
    .replace('T', ' ');
  ctx.log.info(
    'hour-ending-stamps',
    `Stamps mark the end of their hour (hour 1–24): each hour is stored by its start, one hour earlier, so the row stamped ${stamped} is the hour from ${formatUtc(localMs[0]).slice(11, 16)} and a year of such rows stays in its year.`,
    { line: firstLine },
  );
}
