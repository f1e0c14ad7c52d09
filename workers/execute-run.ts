import { migrateScenario, outdoorStates, parseScenario, runScenario, type RunOptions, type ScenarioResults, type ScenarioSeries } from '../shared/scenario';
import type { OutdoorStates } from '../shared/psychrometrics';

export interface ExecuteRunInput {
  /** Scenario JSON as stored; validated again here because a worker must not trust its caller. */
  scenario: unknown;
  series: ScenarioSeries;
  /**
   * Names the series' content (the run queue's `<file id>:<SHA-256>`), so a thread that runs several points of one
   * file computes their outdoor states once. Without it every run computes its own.
   */
  seriesKey?: string;
  options?: Omit<RunOptions, 'outdoor'>;
}

export interface ExecuteRunOutput {
  results: ScenarioResults;
  modes: Uint8Array;
  mechanicalFraction: Float64Array;
  humidified: Uint8Array;
}

/**
 * This thread's last outdoor states, by series key and elevation. A sweep's points read one file at one site, and the
 * states are most of a point's work (every hour's wet-bulb is solved by iteration), so a thread keeps the states of
 * the file it last ran: one entry, replaced by the next file, its size that of the file's own series.
 */
let lastOutdoor: { key: string; elevationM: number; states: OutdoorStates } | null = null;

function outdoorStatesOnce(seriesKey: string, series: ScenarioSeries, elevationM: number): OutdoorStates {
  if (lastOutdoor?.key !== seriesKey || lastOutdoor.elevationM !== elevationM) {
    lastOutdoor = null; // the old entry's memory goes before the new one's is taken
    lastOutdoor = { key: seriesKey, elevationM, states: outdoorStates(series, elevationM) };
  }
  return lastOutdoor.states;
}

/** Piscina task: one run, returning the summary and the per-hour modes the run page draws. */
export function executeRun({ scenario, series, seriesKey, options }: ExecuteRunInput): ExecuteRunOutput {
  // A run queued before engine 2.0.0 holds a scenario with retired inputs; it runs on their migration.
  const parsed = parseScenario(migrateScenario(scenario).scenario);
  if (!parsed.ok) throw new RangeError(`Invalid scenario: ${parsed.errors.join('; ')}`);
  // The migration removes a scenario's own elevation; with no site's elevation given (tests, old callers) it still serves.
  const own = scenario !== null && typeof scenario === 'object' ? (scenario as { elevationM?: unknown }).elevationM : undefined;
  const elevationM = options?.elevationM ?? (typeof own === 'number' ? own : undefined);
  const outdoor = seriesKey !== undefined && elevationM !== undefined ? outdoorStatesOnce(seriesKey, series, elevationM) : undefined;
  const run = runScenario(parsed.scenario, series, { ...options, elevationM, outdoor });
  const { modes, mechanicalFraction, humidified } = run.classification;
  return { results: run.results, modes, mechanicalFraction, humidified };
}
