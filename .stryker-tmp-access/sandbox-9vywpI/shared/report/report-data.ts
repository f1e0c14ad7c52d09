/**
 * What a printed report shows, and nothing more: the job, the site and climate file with its
 * validation summary, the envelope with its edition, the scenario as run and its results.
 * Built on the server from stored rows; the same shape goes to project members and to a shared link,
 * so it carries no database ids beyond the run numbers a reader sees as labels.
 */
// @ts-nocheck

import type { ImportReport } from '../climate/types';
import { findEnvelopePreset } from '../scenario/envelopes';
import type { ScenarioResults } from '../scenario/run';
import type { Scenario } from '../scenario/schema';
import type { SweepPointValues } from '../sweep/expand';

export interface ReportSite {
  name: string;
  elevationM: number;
  timeZone: string;
  /** Offset of the site's standard time from UTC, minutes; months and hours of day are on this clock. */
  utcOffsetMinutes: number;
  latitude: number | null;
  longitude: number | null;
}

export interface ReportClimate {
  name: string;
  /** The uploaded file's name; null when the file has since been deleted. */
  fileName: string | null;
  sha256: string;
  hours: number;
  firstHourMs: number;
  lastHourMs: number;
  /** null when the file has been deleted since the run: the validation summary is then not known. */
  validation: ReportValidation | null;
  /** Set for a derived future-climate file: a projection, not measured weather. */
  projection: { method: string | null; note: string | null } | null;
  /**
   * The file's humidity was read over ice below 0 °C (the import option) rather than over liquid water; null when
   * neither the run nor the file recorded it (runs and files from before the option).
   */
  humidityOverIce: boolean | null;
}

export interface ReportValidation {
  years: number[];
  measuredHours: number;
  filledHours: number;
  missingHours: number;
  /** Measured and filled hours as a share of all hours, %. */
  completenessPct: number;
  gaps: number;
  longestGapHours: number;
  /** Longest gap the import was allowed to fill by interpolation, h. */
  maxGapFilledHours: number;
  /** The time layout the importer read, in words. */
  timeLayout: string | null;
  /** The zone timestamps without an offset were read in. */
  timeZone: string;
  stepMinutes: number | null;
  hasStationPressure: boolean;
  humidityKind: string;
  summary: string;
  warnings: number;
  rowsRejected: number;
  cellsUnreadable: number;
}

export interface ReportEnvelope {
  /** The preset's label, or "Custom envelope". */
  label: string;
  /** The guideline edition the limits come from; null for a custom envelope. */
  edition: string | null;
  recalledFromMemory: boolean;
  note: string | null;
}

export interface ReportRun {
  id: number;
  engineVersion: string;
  createdAt: string;
  finishedAt: string | null;
  scenario: Scenario;
  /** For a sweep point, the swept inputs' values (SI), so the name can be shown in the reader's units; else null. */
  sweepPoint: SweepPointValues | null;
  site: ReportSite;
  climate: ReportClimate;
  envelope: ReportEnvelope;
  results: ScenarioResults;
}

export interface RunReportData {
  kind: 'run';
  projectName: string;
  generatedAt: string;
  run: ReportRun;
}

export interface ComparisonReportData {
  kind: 'comparison';
  projectName: string;
  generatedAt: string;
  /** The run the others are measured against; the first of `runs`. */
  baselineId: number;
  runs: ReportRun[];
}

export type ReportData = RunReportData | ComparisonReportData;

/** The snapshot of the climate file and site that a run keeps (server/runs/new-run.ts). */
export interface RunClimateSnapshot {
  name: string;
  sha256: string;
  hours: number;
  firstHourMs: number;
  lastHourMs: number;
  site: { name: string; elevationM: number; timeZone: string };
  elevationM: number;
  utcOffsetMinutes: number;
  /** The file was read with humidity over ice below 0 °C (import option); absent for runs made before the option. */
  humidityOverIce?: boolean;
}

export interface ReportRunSource {
  id: number;
  engineVersion: string;
  createdAt: Date;
  finishedAt: Date | null;
  scenario: Scenario;
  sweepPoint: SweepPointValues | null;
  climate: RunClimateSnapshot;
  results: ScenarioResults;
  /** The stored file, when it still exists. */
  file: {
    originalFileName: string;
    hasPressure: boolean;
    humidityKind: string;
    report: ImportReport;
    derivationJson: string | null;
  } | null;
  /** The site as it is now, for its coordinates; the run's snapshot wins for everything it holds. */
  siteNow: { latitude: number | null; longitude: number | null } | null;
}

/** A stored run, its climate file and site, as the report shows them. */
export function shapeReportRun(source: ReportRunSource): ReportRun {
  const { climate, file } = source;
  return {
    id: source.id,
    engineVersion: source.engineVersion,
    createdAt: source.createdAt.toISOString(),
    finishedAt: source.finishedAt ? source.finishedAt.toISOString() : null,
    scenario: source.scenario,
    sweepPoint: source.sweepPoint,
    site: {
      name: climate.site.name,
      elevationM: climate.elevationM,
      timeZone: climate.site.timeZone,
      utcOffsetMinutes: climate.utcOffsetMinutes,
      latitude: source.siteNow?.latitude ?? null,
      longitude: source.siteNow?.longitude ?? null,
    },
    climate: {
      name: climate.name,
      fileName: file?.originalFileName ?? null,
      sha256: climate.sha256,
      hours: climate.hours,
      firstHourMs: climate.firstHourMs,
      lastHourMs: climate.lastHourMs,
      validation: file ? validationOf(file.report, file.hasPressure, file.humidityKind) : null,
      projection: file?.derivationJson ? projectionOf(file.derivationJson) : null,
      humidityOverIce: climate.humidityOverIce ?? (typeof file?.report.humidityOverIce === 'boolean' ? file.report.humidityOverIce : null),
    },
    envelope: envelopeOf(source.scenario.envelope.presetId),
    results: source.results,
  };
}

export function validationOf(report: ImportReport, hasStationPressure: boolean, humidityKind: string): ReportValidation {
  const c = report.counts;
  return {
    years: report.years,
    measuredHours: c.measuredHours,
    filledHours: c.filledHours,
    missingHours: c.missingHours,
    completenessPct: c.hours > 0 ? (100 * (c.measuredHours + c.filledHours)) / c.hours : 0,
    gaps: c.gaps,
    longestGapHours: c.longestGapHours,
    maxGapFilledHours: report.maxGapHours,
    timeLayout: report.timeLayout,
    timeZone: report.timeZone,
    stepMinutes: report.stepMinutes,
    hasStationPressure,
    humidityKind,
    summary: report.summary,
    warnings: report.issues.filter((issue) => issue.severity === 'warning').length,
    rowsRejected: c.rowsRejected,
    cellsUnreadable: c.cellsUnreadable,
  };
}

export function envelopeOf(presetId: string | undefined): ReportEnvelope {
  const preset = presetId ? findEnvelopePreset(presetId) : undefined;
  if (!preset) return { label: 'Custom envelope', edition: null, recalledFromMemory: false, note: null };
  return { label: preset.label, edition: preset.edition, recalledFromMemory: preset.recalledFromMemory, note: preset.note };
}

/** How a derived file was made, from its stored JSON; tolerant of its exact shape. */
function projectionOf(derivationJson: string): ReportClimate['projection'] {
  try {
    const d = JSON.parse(derivationJson) as Record<string, unknown>;
    return { method: typeof d.method === 'string' ? d.method : null, note: typeof d.note === 'string' ? d.note : null };
  } catch {
    return { method: null, note: null };
  }
}

/** Runs in the order asked, the baseline first; a baseline not among them is refused by the caller. */
export function baselineFirst<T extends { id: number }>(runs: T[], baselineId: number): T[] {
  const baseline = runs.find((r) => r.id === baselineId);
  return baseline ? [baseline, ...runs.filter((r) => r.id !== baselineId)] : runs;
}
