// @ts-nocheck
import { migrateScenario, parseScenario, runScenario, type RunOptions, type ScenarioResults, type ScenarioSeries } from '../shared/scenario';

export interface ExecuteRunInput {
  /** Scenario JSON as stored; validated again here because a worker must not trust its caller. */
  scenario: unknown;
  series: ScenarioSeries;
  options?: RunOptions;
}

export interface ExecuteRunOutput {
  results: ScenarioResults;
  modes: Uint8Array;
  mechanicalFraction: Float64Array;
  humidified: Uint8Array;
}

/** Piscina task: one run, returning the summary and the per-hour modes the run page draws. */
export function executeRun({ scenario, series, options }: ExecuteRunInput): ExecuteRunOutput {
  // A run queued before engine 2.0.0 holds a scenario with retired inputs; it runs on their migration.
  const parsed = parseScenario(migrateScenario(scenario).scenario);
  if (!parsed.ok) throw new RangeError(`Invalid scenario: ${parsed.errors.join('; ')}`);
  // The migration removes a scenario's own elevation; with no site's elevation given (tests, old callers) it still serves.
  const own = scenario !== null && typeof scenario === 'object' ? (scenario as { elevationM?: unknown }).elevationM : undefined;
  const run = runScenario(parsed.scenario, series, { ...options, elevationM: options?.elevationM ?? (typeof own === 'number' ? own : undefined) });
  const { modes, mechanicalFraction, humidified } = run.classification;
  return { results: run.results, modes, mechanicalFraction, humidified };
}
