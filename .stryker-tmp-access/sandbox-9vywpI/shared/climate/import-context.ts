/** What one import carries from step to step: the issue log, the counts and the mapping. */
// @ts-nocheck

import type { IssueLog } from './issue-log';
import type { DetectedMapping, FileHeader, ImportCounts, TypicalYearInfo } from './types';

export const DEFAULT_MAX_GAP_HOURS = 6;
/** 100 years of hours: anything longer is a garbled date rather than weather. */
export const MAX_SERIES_HOURS = 876_600;
/** Acceptance rule (import-climate-text.ts): share of bad rows or cells above which a file is refused. */
export const REJECT_SHARE = 0.1;
/** Acceptance rule: share of the series' hours that must hold measured values. */
export const MIN_MEASURED_SHARE = 0.5;
/** Rows spread over the file on which columns and units are recognised. */
export const SAMPLE_ROWS = 400;

export function emptyCounts(): ImportCounts {
  return {
    lines: 0,
    rows: 0,
    rowsRejected: 0,
    cellsUnreadable: 0,
    impossibleValues: 0,
    clampedValues: 0,
    duplicateTimestamps: 0,
    rowsAveraged: 0,
    nonHourlySteps: 0,
    daylightSavingJumps: 0,
    hours: 0,
    measuredHours: 0,
    filledHours: 0,
    missingHours: 0,
    gaps: 0,
    longestGapHours: 0,
    issuesNotListed: 0,
  };
}

export function emptyMapping(): DetectedMapping {
  return {
    delimiter: ',',
    decimalSeparator: '.',
    headerLine: null,
    headers: [],
    time: null,
    dryBulb: null,
    humidity: null,
    pressure: null,
    confidence: 0,
  };
}

export interface Context {
  log: IssueLog;
  counts: ImportCounts;
  mapping: DetectedMapping;
  maxGapHours: number;
  timeZone: string;
  /** The humidityOverIce option as given (default false). */
  humidityOverIce: boolean;
  stepMinutes: number | null;
  /** Local minus UTC of the first row read, ms: the file's own clock for the years covered. */
  fileOffsetMs: number;
  /** True when stamps mark the end of their hour (hour 1–24 or a 24:00 time). */
  hourEnding: boolean;
  /** Line of the last row in each hour of the series, once built. */
  hourLines: Int32Array | null;
  /** What the file's own header says about its station, when it has one. */
  fileHeader?: FileHeader | null;
  /** Set when the rows were placed in one year as a typical year. */
  typicalYear?: TypicalYearInfo | null;
}

export function round(value: number): string {
  return String(Math.round(value * 100) / 100);
}

export function percent(share: number): string {
  return `${Math.round(share * 1000) / 10} %`;
}
