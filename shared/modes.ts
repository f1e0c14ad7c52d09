/**
 * The three cooling modes and hours without data: their words and Tramontane's one palette.
 * Every chart, table and legend takes its colours from here. Chosen to stay apart in lightness
 * as well as hue (blue, light amber, dark plum), so they read under the common colour-vision deficiencies.
 */
import type { ModeHours } from './scenario/results';

/**
 * In code the hours without data are `noData`, as a run's stored results (ModeHours) name them. The hourly files and
 * the hour columns write the word `no_data` (MODE_NAMES in shared/scenario/classify.ts): that is their format, not a
 * second name here.
 */
export const modeKeys = ['free', 'adiabatic', 'mechanical', 'noData'] as const;
export type ModeKey = (typeof modeKeys)[number];

export const modeLabels: Record<ModeKey, string> = {
  free: 'Free cooling',
  adiabatic: 'Adiabatic assist',
  mechanical: 'Mechanical',
  noData: 'No data',
};

export const modeColours: Record<ModeKey, string> = {
  free: '#2a78a8',
  adiabatic: '#dba53a',
  mechanical: '#7b3057',
  noData: '#b9bec3',
};

/** Text colour with WCAG AA contrast on each mode colour, for labels drawn on it. */
export const modeInk: Record<ModeKey, string> = {
  free: '#ffffff',
  adiabatic: '#1d2327',
  mechanical: '#ffffff',
  noData: '#1d2327',
};

/** The hours of one mode in a results table (a run's, a month's, a year's). */
export function hoursOfMode(row: Pick<ModeHours, ModeKey>, mode: ModeKey): number {
  return row[mode];
}
