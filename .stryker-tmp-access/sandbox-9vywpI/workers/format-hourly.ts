// @ts-nocheck
import { hourlyJson } from '../shared/report/hourly-json';
import {
  hourlyCsvInput,
  hybridHourlyColumns,
  isHybrid,
  migrateScenario,
  outdoorStates,
  parseScenario,
  runScenario,
  writeHourlyCsv,
  type ScenarioSeries,
} from '../shared/scenario';

export interface FormatHourlyInput {
  /** Scenario JSON as stored with the run; validated again because a worker must not trust its caller. */
  scenario: unknown;
  series: ScenarioSeries;
  /** The elevation the run used (its site's, as snapshotted); the scenario's own when absent. */
  elevationM?: number;
  /** The site's standard-time offset the run used, minutes (for local_standard_time); 0 when absent. */
  utcOffsetMinutes?: number;
  /** The run's stored per-hour outcome, used as it was rather than classified again. */
  modes: Uint8Array;
  mechanicalFraction: Float64Array;
  /** Stored humidified flags; null for runs made before engine 2.0.0 (the column is left empty). */
  humidified: Uint8Array | null;
  format: 'csv' | 'json';
  /** For JSON: what the file is of (run id, names), written first. */
  about?: Record<string, unknown>;
}

const encoder = new TextEncoder();

/**
 * Piscina task: a finished run's hourly file, as bytes. The run keeps only each hour's mode and
 * compressor share, so the outdoor states (wet-bulb, dew point, RH, W, h) are recomputed here from the
 * climate series at the run's elevation, exactly as the run computed them (its first step, outdoorStates),
 * and written beside the stored modes — kept off the server's main thread.
 */
export function formatHourly({
  scenario,
  series,
  elevationM,
  utcOffsetMinutes,
  modes,
  mechanicalFraction,
  humidified,
  format,
  about,
}: FormatHourlyInput): Uint8Array {
  // A run's scenario is stored as it ran; one from engine 1.0.0 carries retired inputs, so it is migrated first
  // (only its elevation is used here).
  const parsed = parseScenario(migrateScenario(scenario).scenario);
  if (!parsed.ok) throw new RangeError(`Invalid scenario: ${parsed.errors.join('; ')}`);
  // The run's site elevation (the climate snapshot's); a stored scenario no longer carries one once migrated.
  const siteElevationM = elevationM ?? parsed.scenario.elevationM ?? 0;
  const { states } = outdoorStates(series, siteElevationM);
  // A hybrid run stores only the hall's modes; its loops' columns come from classifying the loops again (the same
  // scenario, series and elevation give the same hours).
  const loops = isHybrid(parsed.scenario) ? hybridHourlyColumns(runScenario(parsed.scenario, series, { elevationM: siteElevationM, utcOffsetMinutes })) : null;
  const hourly = hourlyCsvInput(series, { states, classification: { modes, mechanicalFraction, humidified } }, utcOffsetMinutes ?? 0, loops);
  if (format === 'json') return encoder.encode(JSON.stringify({ ...(about ? { run: about } : {}), ...hourlyJson(hourly) }));
  const chunks: Uint8Array[] = [];
  let length = 0;
  // The writer reuses one buffer per chunk, so each is copied.
  writeHourlyCsv(hourly, (bytes) => {
    chunks.push(bytes.slice());
    length += bytes.length;
  });
  const out = new Uint8Array(length);
  let at = 0;
  for (const chunk of chunks) {
    out.set(chunk, at);
    at += chunk.length;
  }
  return out;
}
