/** The climate-file importer: pure TypeScript for the server, workers and the command line. */
// @ts-nocheck

export { importClimateText, DEFAULT_MAX_GAP_HOURS, MAX_SERIES_HOURS } from './import-climate-text';
export {
  encodeColumn,
  decodeColumn,
  decodeFloat64Column,
  decodeUint8Column,
  decodeClimateSeries,
  type ColumnArray,
  type EncodedClimateSeries,
} from './column-codec';
export { cleanedSeriesCsv, seriesHoursJson, yearWindow } from './series-files';
export { decodeClimateBytes } from './decode-bytes';
export { joinClimateFiles, type FileImport } from './join-files';
export { isKnownTimeZone, standardOffsetMinutes } from '../time-zone';
export { conversionToSi, type AffineConversion } from './units';
export { DRY_BULB_MIN_C, DRY_BULB_MAX_C, PRESSURE_MIN_PA, PRESSURE_MAX_PA, RH_TOLERANCE_PCT, SATURATION_TOLERANCE_K } from './value-limits';
export { HOUR_FLAG } from './types';
export type {
  HumidityKind,
  ClimateSeries,
  ImportOptions,
  ImportResult,
  ImportReport,
  ImportIssue,
  ImportCounts,
  FileInSet,
  IssueKind,
  IssueSeverity,
  DetectedMapping,
  ColumnMappingOverride,
  ColumnRef,
  QuantityAssignment,
  QuantityColumn,
  Quantity,
  TimeLayout,
  TimeMapping,
  DateOrder,
  TemperatureUnit,
  RelativeHumidityUnit,
  HumidityRatioUnit,
  PressureUnit,
} from './types';
export { cutCell, firstLinesEchoed, ECHO_CELL_CHARS } from './echo-limits';
export { issueListCsv, ISSUES_LISTED } from './issue-log';
