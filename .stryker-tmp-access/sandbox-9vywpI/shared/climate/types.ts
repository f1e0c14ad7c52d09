/**
 * Types of the climate-file importer: what it returns (series, report, mapping) and what a
 * caller may override. Everything here except the typed arrays of ClimateSeries is plain JSON,
 * so the report and the mapping can be sent as an API body unchanged.
 */
// @ts-nocheck


import type { HumidityKind } from '../psychrometrics';

export type { HumidityKind };

export type TemperatureUnit = 'C' | 'F' | 'K';
export type RelativeHumidityUnit = '%' | 'fraction';
export type HumidityRatioUnit = 'g/kg' | 'kg/kg' | 'gr/lb';
export type PressureUnit = 'Pa' | 'hPa' | 'kPa' | 'inHg' | 'psi';

/** A quantity column as detected or chosen, with the unit its cells are written in. */
export type QuantityColumn =
  | { quantity: 'dry-bulb'; unit: TemperatureUnit }
  | { quantity: 'relative-humidity'; unit: RelativeHumidityUnit }
  | { quantity: 'dew-point'; unit: TemperatureUnit }
  | { quantity: 'wet-bulb'; unit: TemperatureUnit }
  | { quantity: 'humidity-ratio'; unit: HumidityRatioUnit }
  | { quantity: 'pressure'; unit: PressureUnit };

export type Quantity = QuantityColumn['quantity'];
export type HumidityQuantity = 'relative-humidity' | 'dew-point' | 'wet-bulb' | 'humidity-ratio';

/** A column reference: 0-based index or the header text (matched without regard to case). */
export type ColumnRef = number | string;

export type QuantityAssignment = QuantityColumn & {
  /** 0-based column index. */
  column: number;
  header: string;
  /** 0..1; 1 for the canonical names, lower where the unit or quantity was guessed from values. */
  confidence: number;
  /** Why this column was chosen, in words. */
  reason: string;
};

export type DateOrder = 'YMD' | 'DMY' | 'MDY';

/**
 * How time is written. Timestamps in the series are the instants the file states:
 * for 'ymdh' with hours 1–24 (hour ending) hour h of a day is that day's midnight + h hours,
 * so hour 24 is midnight at the end of the day.
 */
export type TimeLayout =
  | { layout: 'iso'; column: number; dateOrder?: DateOrder }
  | { layout: 'date-time'; dateColumn: number; timeColumn: number; dateOrder: DateOrder }
  | {
      layout: 'ymdh';
      year: number;
      month: number;
      day: number;
      hour: number;
      minute: number | null;
      hourConvention: 'ending-1-24' | 'beginning-0-23';
    };

export type TimeMapping = TimeLayout & { confidence: number; description: string };

/** Published weather formats read by their own readers (shared/climate/formats/), recognised without flags. */
export type PublishedFormatId = 'epw' | 'header-block-csv' | 'fixed-width-station';

/** A published format as recognised: its name and the conventions it is read with, in words. */
export interface RecognisedFormat {
  id: PublishedFormatId;
  name: string;
  conventions: string[];
}

/**
 * What a file's own header says about where it was measured; every field null when not given.
 * Offered to pre-fill a new site and checked against the chosen one.
 */
export interface FileHeader {
  /** 1-based line the values come from (the first such line). */
  line: number;
  name: string | null;
  region: string | null;
  country: string | null;
  source: string | null;
  stationId: string | null;
  /** Decimal degrees, north positive. */
  latitude: number | null;
  /** Decimal degrees, east positive. */
  longitude: number | null;
  elevationM: number | null;
  /** Offset of the file's local standard time from UTC, hours (east positive). */
  utcOffsetHours: number | null;
}

/** A typical year placed in one calendar year: the year used and the year each month came from. */
export interface TypicalYearInfo {
  year: number;
  /** Source year of January…December (index 0–11); null for a month with no rows. */
  sourceYearByMonth: (number | null)[];
}

export interface DetectedMapping {
  /** Set when the file is one of the published formats; its columns are then fixed by the format. */
  format?: RecognisedFormat | null;
  delimiter: ',' | ';' | '\t';
  decimalSeparator: '.' | ',';
  /** 1-based line of the header row, or null when the file has none. */
  headerLine: number | null;
  headers: string[];
  time: TimeMapping | null;
  dryBulb: QuantityAssignment | null;
  humidity: QuantityAssignment | null;
  pressure: QuantityAssignment | null;
  /** Lowest confidence among time, dry-bulb and humidity (0 when one is missing). */
  confidence: number;
}

/** What a caller may fix before importing; any part left out is detected. */
export interface ColumnMappingOverride {
  delimiter: ',' | ';' | '\t';
  decimalSeparator: '.' | ',';
  time:
    | { layout: 'iso'; column: ColumnRef; dateOrder?: DateOrder }
    | { layout: 'date-time'; dateColumn: ColumnRef; timeColumn: ColumnRef; dateOrder?: DateOrder }
    | {
        layout: 'ymdh';
        year: ColumnRef;
        month: ColumnRef;
        day: ColumnRef;
        hour: ColumnRef;
        minute?: ColumnRef | null;
        hourConvention?: 'ending-1-24' | 'beginning-0-23';
      };
  dryBulb: { column: ColumnRef; unit: TemperatureUnit };
  humidity: { column: ColumnRef } & Exclude<QuantityColumn, { quantity: 'dry-bulb' | 'pressure' }>;
  /** null: ignore any pressure column. */
  pressure: { column: ColumnRef; unit: PressureUnit } | null;
}

export interface ImportOptions {
  mapping?: Partial<ColumnMappingOverride>;
  /** Longest run of missing hours filled by linear interpolation; longer runs stay missing. Default 6. */
  maxGapHours?: number;
  /**
   * Zone of local timestamps without offset: an IANA name (daylight saving applied, e.g. Europe/Paris)
   * or a fixed offset such as 'UTC-07:00' for files in local standard time. Default 'UTC'.
   */
  timeZone?: string;
  /**
   * The file gives relative humidity (or dew point) below 0 °C with respect to ice. Default false: over liquid
   * water at every temperature, the meteorological convention (WMO-No. 8). When true, sub-zero values are
   * converted to over water at import, and the report records it.
   */
  humidityOverIce?: boolean;
  /**
   * The site the file is for: what the file's header says (elevation, UTC offset) is checked against it,
   * with a warning when they disagree.
   */
  site?: { elevationM: number; timeZone: string };
}

export type IssueKind =
  | 'empty-input'
  | 'line-too-long'
  | 'too-many-columns'
  | 'binary-input'
  | 'header-only'
  | 'no-header'
  | 'preamble-skipped'
  | 'unrecognised-column'
  | 'missing-time'
  | 'missing-dry-bulb'
  | 'missing-humidity'
  | 'mapping-override-invalid'
  | 'unit-assumed'
  | 'unparsable-time'
  | 'unparsable-value'
  | 'wrong-field-count'
  | 'missing-value-marker'
  | 'impossible-value'
  | 'clamped-value'
  | 'duplicate-timestamp'
  | 'out-of-order'
  | 'gap-filled'
  | 'gap-missing'
  | 'non-hourly-step'
  | 'timestamps-rounded'
  | 'typical-year-restamped'
  | 'hour-ending-stamps'
  | 'files-overlap'
  | 'files-gap'
  | 'files-layout-differs'
  | 'malformed-row'
  | 'other-humidity-ignored'
  | 'pressure-ignored'
  | 'unexpected-failure'
  | 'sub-hourly-averaged'
  | 'daylight-saving-jump'
  | 'span-too-long'
  | 'too-many-rejected'
  | 'too-little-data'
  | 'invalid-option'
  | 'humidity-over-ice'
  | 'format-recognised'
  | 'format-header'
  | 'header-site-mismatch'
  | 'pressure-from-elevation'
  | 'legend-skipped';

export type IssueSeverity = 'error' | 'warning' | 'info';

export interface ImportIssue {
  kind: IssueKind;
  severity: IssueSeverity;
  /** 1-based line in the text as given (comment lines and the header count). */
  line?: number;
  /** Header text of the column, or its 1-based number when the file has no header. */
  column?: string;
  /** The cell or value concerned, as text. */
  value?: string;
  /** In a set of several files: the file the issue is in (its line numbers count in that file). */
  file?: string;
  message: string;
}

/** One file of a set uploaded together, as the set's report lists it. */
export interface FileInSet {
  fileName: string;
  bytes: number;
  sha256: string;
  ok: boolean;
  summary: string;
  firstTimestamp: string | null;
  lastTimestamp: string | null;
  hours: number;
  /** Lines of the file's first and last hours. */
  firstLine: number | null;
  lastLine: number | null;
  errors: number;
  warnings: number;
}

export interface ImportCounts {
  /** Lines in the text, all kinds. */
  lines: number;
  /** Data rows read (not comments, header or blank lines). */
  rows: number;
  /** Rows whose time could not be read and were left out. */
  rowsRejected: number;
  /** Cells that did not parse as numbers or held a missing-value marker. */
  cellsUnreadable: number;
  impossibleValues: number;
  clampedValues: number;
  duplicateTimestamps: number;
  /** Rows that shared an hour with other rows of a finer step and were averaged into it. */
  rowsAveraged: number;
  nonHourlySteps: number;
  daylightSavingJumps: number;
  /** Length of the hourly series. */
  hours: number;
  measuredHours: number;
  filledHours: number;
  missingHours: number;
  gaps: number;
  longestGapHours: number;
  /** Issues found but not in the report's list (it holds the first 200, at most 25 of a kind); the full list has them. */
  issuesNotListed: number;
}

export interface ImportReport {
  ok: boolean;
  /** One sentence on the outcome. */
  summary: string;
  /** The time layout, in words. */
  timeLayout: string | null;
  /** Typical step between rows in minutes, before averaging to hours. */
  stepMinutes: number | null;
  firstTimestamp: string | null;
  lastTimestamp: string | null;
  /**
   * Calendar years the series covers in the file's own clock (the UTC offset of its first row), each hour
   * by its start (an hour-ending stamp 24:00 on 31 December belongs to that year).
   */
  years: number[];
  maxGapHours: number;
  timeZone: string;
  /**
   * True when the file was read with humidity over ice below 0 °C (the import option) and its sub-zero values
   * converted to over liquid water; false for the default reading. Absent in reports stored before the option.
   */
  humidityOverIce: boolean;
  counts: ImportCounts;
  issues: ImportIssue[];
  /** Present when several files were imported together as one series: each file, in time order. */
  files?: FileInSet[];
  /** What the file's header says about its station (published formats and station lines); absent or null when nothing. */
  fileHeader?: FileHeader | null;
  /** Set when the file was read as a typical year: the year it was placed in and each month's source year. */
  typicalYear?: TypicalYearInfo | null;
  /**
   * Where the full issue list can be downloaded as CSV (every issue, in the order found), when `issues`
   * holds only the first ones; absent or null when it holds them all. Set by the server.
   */
  fullIssueList?: { path: string; issues: number } | null;
}

export interface ClimateSeries {
  /** UTC epoch ms, one per hour, strictly hourly and increasing (missing hours present with NaN values). */
  timestampsMs: Float64Array;
  dryBulbC: Float64Array;
  /** SI: %, °C or kg/kg according to kind; RH and dew point over liquid water at every temperature. */
  humidity: { kind: HumidityKind; values: Float64Array };
  /** null when the file has no pressure. */
  pressurePa: Float64Array | null;
  /** 0 measured, 1 filled by interpolation, 2 missing. */
  flags: Uint8Array;
}

export interface ImportResult {
  ok: boolean;
  series: ClimateSeries | null;
  report: ImportReport;
  mapping: DetectedMapping;
  /** Line of the last row read into each hour of the series (0 for an hour no row fell in); null when refused. */
  hourLines?: Int32Array | null;
  /**
   * Every issue found, as CSV rows (shared/climate/issue-log.ts, ISSUE_CSV_COLUMNS, a set's with `file` first), for the
   * full list the report's first 200 are cut from; `notWritten` counts issues past the list's size limit.
   */
  issueList?: { rows: string[]; notWritten: number; ofSet: boolean } | null;
}

export const HOUR_FLAG = { measured: 0, filled: 1, missing: 2 } as const;
