// @ts-nocheck
import { analyseProposal, type ExcursionAnalysis, type Proposal } from '../shared/excursions';
import { parseScenario, type ScenarioSeries } from '../shared/scenario';

export interface AnalyseExcursionsInput {
  /** Scenario JSON as stored with the run; validated again because a worker must not trust its caller. */
  scenario: unknown;
  series: ScenarioSeries;
  elevationM: number;
  proposal: Proposal;
}

/** Piscina task: excursions of the IT inlet under an operator's proposal, over a run's climate series. */
export function analyseExcursions({ scenario, series, elevationM, proposal }: AnalyseExcursionsInput): ExcursionAnalysis {
  const parsed = parseScenario(scenario);
  if (!parsed.ok) throw new RangeError(`Invalid scenario: ${parsed.errors.join('; ')}`);
  return analyseProposal(parsed.scenario, series, elevationM, proposal);
}
