/**
 * Piscina task: one scenario over one hourly series passed as typed arrays. A thin wrapper over
 * shared/scenario; it validates the scenario JSON again because a worker must not trust its caller.
 */
import { parseScenario, runScenario, type RunOptions, type ScenarioResults, type ScenarioSeries } from '../shared/scenario';

export interface RunScenarioTask {
  /** Scenario JSON as stored (validated here with the shared schema). */
  scenario: unknown;
  series: ScenarioSeries;
  options?: RunOptions;
}

export default function runScenarioTask({ scenario, series, options }: RunScenarioTask): ScenarioResults {
  const parsed = parseScenario(scenario);
  if (!parsed.ok) throw new RangeError(`Invalid scenario: ${parsed.errors.join('; ')}`);
  return runScenario(parsed.scenario, series, options).results;
}
