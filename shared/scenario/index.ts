/**
 * The scenario engine: schema, envelope presets, hour classifier, energy and water model, results.
 * Formulas and their sources: README.md, "How it works".
 */
export * from './schema';
export * from './envelopes';
export { MODE, MODE_NAMES, EXCURSION, classifyHours, moistureTargets } from './classify';
export type { HourClassification, InletLimits, OutdoorHours, ModeCode } from './classify';
export { hourlyEnergy, hallAirMassFlowKgPerS, copAt, CP_AIR_KJ_PER_KG_K, LATENT_HEAT_TOWER_KJ_PER_KG } from './energy';
export type { HourlyEnergy } from './energy';
export { aggregateResults } from './results';
export type { AggregatedResults, ModeHours, EnergyTotals, YearResults } from './results';
export { outdoorStates, runScenario } from './run';
export type { ScenarioSeries, RunOptions, ScenarioResults, ScenarioRun } from './run';
export { ENGINE_VERSION } from './version';
export { HOURLY_CSV_COLUMNS, writeHourlyCsv, writeFixed, hourlyCsvInput } from './hourly-csv';
export type { HourlyCsvInput } from './hourly-csv';
export { INPUT_LABELS, inputLabel } from './input-labels';
