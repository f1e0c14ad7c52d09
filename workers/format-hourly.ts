import { hourlyJson } from '../shared/report/hourly-json';
import { standardPressurePa } from '../shared/psychrometrics';
import { hourlyCsvInput, outdoorStates, parseScenario, writeHourlyCsv, type ScenarioSeries } from '../shared/scenario';

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
export function formatHourly({ scenario, series, elevationM, utcOffsetMinutes, modes, mechanicalFraction, format, about }: FormatHourlyInput): Uint8Array {
  const parsed = parseScenario(scenario);
  if (!parsed.ok) throw new RangeError(`Invalid scenario: ${parsed.errors.join('; ')}`);
  const { states } = outdoorStates(series, standardPressurePa(elevationM ?? parsed.scenario.elevationM));
  const hourly = hourlyCsvInput(series, { states, classification: { modes, mechanicalFraction } }, utcOffsetMinutes ?? 0);
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
