/**
 * One scenario over one hourly climate series: outdoor states, classification, energy, results.
 * Pure and synchronous, so the worker task, the command line and the tests call the same function.
 */
import { bulkStates, hourlyPressurePa, standardPressurePa, type BulkState, type HumidityKind } from '../psychrometrics';
import { classifyHours, moistureTargets, type HourClassification, type InletLimits } from './classify';
import { hourlyEnergy, type HourlyEnergy } from './energy';
import { deratedDryBulbMaxC } from './envelopes';
import { designFanHeatK } from './fans';
import { hourlyLoadFractions } from './load-profile';
import { aggregateResults, type AggregatedResults } from './results';
import type { Scenario } from './schema';
import { ENGINE_VERSION } from './version';

/** The hourly columns a run needs; the climate importer's ClimateSeries has this shape. */
export interface ScenarioSeries {
  timestampsMs: Float64Array;
  dryBulbC: Float64Array;
  humidity: { kind: HumidityKind; values: Float64Array };
  pressurePa: Float64Array | null;
  flags?: Uint8Array | null;
}

export interface RunOptions {
  /** Overrides scenario.elevationM (pressure when the series has none, and altitude derating). */
  elevationM?: number;
  /** Offset of the site's local standard time from UTC, for months and hours of day; default 0. */
  utcOffsetMinutes?: number;
}

export interface ScenarioResults extends AggregatedResults {
  engineVersion: string;
  scenarioName: string;
  systemKind: Scenario['system']['kind'];
  /** Hall fan heat at design, K, derived from energy.fanPowerFraction (ΔT = P_fan / (ṁ·cp)). */
  fanHeatK: number;
  site: {
    elevationM: number;
    /** 'weather' when the series carries station pressure, else the standard atmosphere at elevationM. */
    pressureSource: 'weather' | 'elevation';
    /** Hours with data whose missing station pressure was replaced by the standard atmosphere (hourlyPressurePa). */
    pressureFilledHours: number;
  };
  envelope: {
    /** Maximum dry-bulb after altitude derating, °C. */
    dryBulbMaxC: number;
    dryBulbMinC: number;
    /** Supply-air moisture limits at the site's standard pressure, g/kg. */
    lowHumidityRatioGPerKg: number;
    highHumidityRatioGPerKg: number;
  };
  warnings: string[];
}

export interface ScenarioRun {
  results: ScenarioResults;
  states: BulkState;
  classification: HourClassification;
  energy: HourlyEnergy;
}

export function runScenario(scenario: Scenario, series: ScenarioSeries, options: RunOptions = {}): ScenarioRun {
  const n = series.dryBulbC.length;
  if (series.timestampsMs.length !== n) throw new RangeError(`timestampsMs has ${series.timestampsMs.length} hours, dryBulbC has ${n}`);
  const elevationM = options.elevationM ?? scenario.elevationM;
  if (elevationM === undefined) throw new RangeError('elevationM: give the site\'s elevation (RunOptions.elevationM, or elevationM in a scenario run without a site)');
  const sitePressurePa = standardPressurePa(elevationM);
  const { states, pressurePa, filledHours } = outdoorStates(series, elevationM);
  const { envelope, system } = scenario;
  const limits: InletLimits = { ...envelope, dryBulbMaxC: deratedDryBulbMaxC(envelope.dryBulbMaxC, elevationM, envelope.altitudeDerating) };
  const fanHeatK = designFanHeatK(scenario.energy.fanPowerFraction, system.itDeltaTK);
  const classification = classifyHours(
    system,
    limits,
    { dryBulbC: series.dryBulbC, wetBulbC: states.wetBulbC, humidityRatio: states.humidityRatio, pressurePa, flags: series.flags },
    { fanHeatK },
  );
  const loadFraction = hourlyLoadFractions(scenario.energy.itLoadProfile, series.timestampsMs, options.utcOffsetMinutes);
  const energy = hourlyEnergy(
    system,
    scenario.energy,
    { dryBulbC: series.dryBulbC, wetBulbC: states.wetBulbC, humidityRatio: states.humidityRatio },
    loadFraction,
    classification,
    sitePressurePa,
  );
  const aggregated = aggregateResults({
    timestampsMs: series.timestampsMs,
    classification,
    energy,
    cyclesOfConcentration: scenario.energy.cyclesOfConcentration,
    utcOffsetMinutes: options.utcOffsetMinutes,
  });
  const targets = moistureTargets(limits, system.supplyAirC, sitePressurePa);

  const warnings: string[] = [];
  if (system.supplyAirC > limits.dryBulbMaxC) {
    warnings.push(`supplyAirC ${system.supplyAirC} °C is above the envelope's maximum dry-bulb ${round2(limits.dryBulbMaxC)} °C${limits.dryBulbMaxC < envelope.dryBulbMaxC ? ` (derated for ${elevationM} m)` : ''}: every hour is an excursion.`);
  }
  if (system.supplyAirC < limits.dryBulbMinC) {
    warnings.push(`supplyAirC ${system.supplyAirC} °C is below the envelope's minimum dry-bulb ${limits.dryBulbMinC} °C: every hour is an excursion.`);
  }
  if (system.kind === 'direct-air' && targets.lowW > targets.highW) {
    warnings.push('The envelope\'s lower moisture limit is above its upper limit at the supply temperature: no outdoor hour can meet both.');
  }
  if (aggregated.hours.noData > 0) warnings.push(`${aggregated.hours.noData} hours have no usable data and are counted as no data.`);

  return {
    results: {
      engineVersion: ENGINE_VERSION,
      scenarioName: scenario.name,
      systemKind: system.kind,
      ...aggregated,
      fanHeatK,
      site: { elevationM, pressureSource: series.pressurePa ? 'weather' : 'elevation', pressureFilledHours: filledHours },
      envelope: {
        dryBulbMinC: limits.dryBulbMinC,
        dryBulbMaxC: limits.dryBulbMaxC,
        lowHumidityRatioGPerKg: targets.lowW * 1000,
        highHumidityRatioGPerKg: targets.highW * 1000,
      },
      warnings,
    },
    states,
    classification,
    energy,
  };
}

/**
 * Every hour's outdoor moist-air state at its pressure: the station's where the series has it, the standard
 * atmosphere at the site's elevation where it has none or a hole (hourlyPressurePa). The first step of a run,
 * and all the hourly downloads need to write a run's states again.
 */
export function outdoorStates(series: ScenarioSeries, elevationM: number): { states: BulkState; pressurePa: Float64Array | number; filledHours: number } {
  const { pressurePa, filledHours } = hourlyPressurePa(series, elevationM);
  return { states: bulkStates({ dryBulbC: series.dryBulbC, humidity: series.humidity, pressurePa }), pressurePa, filledHours };
}

const round2 = (x: number): number => Math.round(x * 100) / 100;
