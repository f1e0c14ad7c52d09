import { hoursOfMode, modeKeys, type ModeKey } from '../../../shared/modes';
import type { ModeHours } from '../../../shared/scenario/results';

export interface MonthModeHours {
  month: number;
  mode: ModeKey;
  hours: number;
}

/** The per-month table as one row per month and mode, in the palette's mode order, for a stacked chart. */
export function monthlyModeRows(byMonth: (ModeHours & { month: number })[]): MonthModeHours[] {
  return byMonth.flatMap((m) => modeKeys.map((mode) => ({ month: m.month, mode, hours: hoursOfMode(m, mode) })));
}
