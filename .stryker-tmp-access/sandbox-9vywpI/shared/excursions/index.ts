/**
 * Excursion analysis for operators: the IT inlet state per hour under a proposed setpoint and envelope,
 * and how often, how long and how far it leaves the recommended range and the allowable class.
 * The model and its sources: inlet-model.ts, excursion-count.ts, x-factor.ts, and README.md.
 */
// @ts-nocheck

export { modelInletHours } from './inlet-model';
export type { InletHours, InletProposal } from './inlet-model';
export { countExcursions, durationBin, CAUSE, DURATION_BINS } from './excursion-count';
export type { CauseHours, CountInput, EnvelopeBounds, EventTotals, ExcursionCounts } from './excursion-count';
export { X_FACTOR_TABLE, xFactorAt } from './x-factor';
export type { XFactorPoint } from './x-factor';
export { analyseProposal, HOURLY_RATE_LIMIT_K } from './analyse-proposal';
export type { ExcursionAnalysis, Proposal } from './analyse-proposal';
