/**
 * The scenario engine: schema, envelope presets, hour classifier, energy and water model, results.
 * Formulas and their sources: README.md, "How it works".
 */
// @ts-nocheck

export * from './schema';
export * from './envelopes';
export { MODE, MODE_NAMES, EXCURSION, classifyHours, moistureTargets } from './classify';
export type { HourClassification, InletLimits, OutdoorHours, ModeCode, ClassifierPlant } from './classify';
export { hourlyEnergy, compressorModelFor, CONDENSER_AIR_RISE_K } from './energy';
export type { HourlyEnergy, EnergyOutdoor } from './energy';
export { CP_AIR_KJ_PER_KG_K, CP_WATER_KJ_PER_KG_K, LATENT_HEAT_TOWER_KJ_PER_KG, hallAirMassFlowKgPerS } from './air';
export {
  calibrateCompressor,
  carnotCop,
  compressorPowerKw,
  fullLoadCop,
  partLoadInputRatio,
  RATING_CONDITIONS,
  MIN_LIFT_K,
  PART_LOAD_CURVE,
} from './compressor';
export type { CompressorModel, CondenserKind } from './compressor';
export { crossFlowUnmixedEffectiveness, crossFlowUnmixedNtu, hallSideEffectiveness } from './exchanger';
export { affinityPowerKw, designFanHeatK, fanHeatK, speedFraction } from './fans';
export { towerEvaporationPerKgAir, SaturatedExit, TOWER_RANGE_K, TOWER_WATER_TO_AIR_RATIO, TOWER_AIR_ENTHALPY_RISE_KJ_PER_KG } from './tower';
export { parseLoadProfileCsv, exampleLoadProfile, hourlyLoadFractions, EXAMPLE_LOAD_PROFILE_NAME } from './load-profile';
export type { ParseLoadProfileResult } from './load-profile';
export { migrateScenario } from './migrate';
export type { MigratedScenario, ScenarioChange } from './migrate';
export { aggregateResults, blowdownL } from './results';
export type { AggregatedResults, ModeHours, EnergyTotals, YearResults } from './results';
export { designAtSite, outdoorStates, runScenario } from './run';
export { REGION, REGION_KEYS, binHours, cellCentre, cellOf, gridStates, hoursPerGridRegion, operatingRegionGrid, regionOfHour } from './operating-regions';
export type { CellHours, DesignForRegions, GridStates, HourColumns, OperatingRegionGrid, RegionCode, RegionKey, StateGrid } from './operating-regions';
export type { ScenarioSeries, RunOptions, ScenarioResults, ScenarioRun, LoopResults } from './run';
export { addLoopEnergy, combineLoopHours, hallAirSystem, isHybrid, liquidLoopSystem, loopScenarios, usesEvaporativeWater } from './hybrid';
export type { HybridScenario, SingleScenario } from './hybrid';
export { energyReuseFactor, heatPumpHeatingCop, heatReuseResults } from './heat-reuse';
export type { HeatReuseResults } from './heat-reuse';
export { FACILITY_WATER_CLASSES, findFacilityWaterClass, supplyFitsClass } from './facility-water';
export type { FacilityWaterClass } from './facility-water';
export { ENGINE_VERSION } from './version';
export { HOURLY_CSV_COLUMNS, HYBRID_HOURLY_CSV_COLUMNS, hybridHourlyColumns, writeHourlyCsv, writeFixed, hourlyCsvInput } from './hourly-csv';
export type { HourlyCsvInput, HybridHourlyColumns } from './hourly-csv';
export { INPUT_LABELS, inputLabel } from './input-labels';
