/**
 * The three cooling modes and hours without data: their words and Tramontane's one palette.
 * Every chart, table and legend takes its colours from here. Chosen to stay apart in lightness
 * as well as hue (blue, light amber, dark plum), so they read under the common colour-vision deficiencies.
 */
// @ts-nocheck

import type { ModeHours } from './scenario/results';

export const modeKeys = ['free', 'adiabatic', 'mechanical', 'no_data'] as const;
export type ModeKey = (typeof modeKeys)[number];

export const modeLabels: Record<ModeKey, string> = {
  free: 'Free cooling',
  adiabatic: 'Adiabatic assist',
  mechanical: 'Mechanical',
  no_data: 'No data',
};

export const modeColours: Record<ModeKey, string> = {
  free: '#2a78a8',
  adiabatic: '#dba53a',
  mechanical: '#7b3057',
  no_data: '#b9bec3',
};

/** Text colour with WCAG AA contrast on each mode colour, for labels drawn on it. */
export const modeInk: Record<ModeKey, string> = {
  free: '#ffffff',
  adiabatic: '#1d2327',
  mechanical: '#ffffff',
  no_data: '#1d2327',
};

/** Where each mode's hours sit in a results table (ModeHours names the no-data hours `noData`). */
const modeHoursField: Record<ModeKey, 'free' | 'adiabatic' | 'mechanical' | 'noData'> = {
  free: 'free',
  adiabatic: 'adiabatic',
  mechanical: 'mechanical',
  no_data: 'noData',
};

/** The hours of one mode in a results table (a run's, a month's, a year's). */
export function hoursOfMode(row: Pick<ModeHours, 'free' | 'adiabatic' | 'mechanical' | 'noData'>, mode: ModeKey): number {
  return row[modeHoursField[mode]];
}
