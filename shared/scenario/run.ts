/**
 * One scenario over one hourly climate series: outdoor states, classification, energy, results.
 * Pure and synchronous, so the worker task, the command line and the tests call the same function.
 */
import { outdoorStates, standardPressurePa, type BulkState, type HumidityKind, type OutdoorStates } from '../psychrometrics';
import { classifyHours, moistureTargets, type ClassifierPlant, type HourClassification, type InletLimits } from './classify';
import { compressorModelFor, hourlyEnergy, type HourlyEnergy } from './energy';
import { deratedDryBulbMaxC } from './envelopes';
import { designFanHeatK } from './fans';
import { heatReuseResults, type HeatReuseResults } from './heat-reuse';
import { addLoopEnergy, combineLoopHours, isHybrid, loopScenarios, type HybridScenario, type SingleScenario } from './hybrid';
import { hourlyLoadFractions } from './load-profile';
import { aggregateResults, type AggregatedResults, type ModeHours } from './results';
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
  /**
   * The outdoor states of this very series at this elevation (outdoorStates), when the caller already holds them: a
   * sweep's points share one file and one site, so a pool thread computes them once for all its points
   * (workers/execute-run.ts). Computed here when absent. Read only, never written.
   */
  outdoor?: OutdoorStates;
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
  /** Hybrid runs only: each loop's hours, energy and water (the top-level figures are the hall's). */
  loops?: { liquid: LoopResults; air: LoopResults };
  /** Hybrid runs with heat reuse set only. */
  heatReuse?: HeatReuseResults;
}

/** One loop of a hybrid hall: its share, its hours (shaped like the top-level hours), energy and water. */
export interface LoopResults {
  /** Share of the IT heat the loop carries, 0–1. */
  share: number;
  systemKind: 'direct-air' | 'indirect-air' | 'water-side';
  hours: ModeHours;
  hoursByMonth: (ModeHours & { month: number })[];
  energy: AggregatedResults['energy'];
  water: AggregatedResults['water'];
  peakMechanicalLoadKw: number;
  peakCompressorKw: number;
  longestMechanicalRunHours: number;
  /** Liquid loop only: facility-water supply and return, and the coolant supply after the CDU's approach, °C. */
  temperatures?: { facilitySupplyC: number; facilityReturnC: number; coolantSupplyC: number; facilityWaterClassId: string | null };
}

export interface ScenarioRun {
  results: ScenarioResults;
  states: BulkState;
  classification: HourClassification;
  energy: HourlyEnergy;
  /** Hybrid runs only: each loop's classification and energy. */
  loops?: { liquid: { classification: HourClassification; energy: HourlyEnergy }; air: { classification: HourClassification; energy: HourlyEnergy } };
}

type Outdoor = OutdoorStates;

/** Run options once the site's elevation is known (from the options or the scenario). */
type SiteRunOptions = RunOptions & { elevationM: number };

/** Runs a scenario of any kind; a hybrid runs its two loops over the same outdoor states and joins them. */
export function runScenario(scenario: Scenario, series: ScenarioSeries, options: RunOptions = {}): ScenarioRun {
  const n = series.dryBulbC.length;
  if (series.timestampsMs.length !== n) throw new RangeError(`timestampsMs has ${series.timestampsMs.length} hours, dryBulbC has ${n}`);
  const elevationM = options.elevationM ?? scenario.elevationM;
  if (elevationM === undefined)
    throw new RangeError("elevationM: give the site's elevation (RunOptions.elevationM, or elevationM in a scenario run without a site)");
  const outdoor = options.outdoor ?? outdoorStates(series, elevationM);
  if (outdoor.states.humidityRatio.length !== n) throw new RangeError(`options.outdoor has ${outdoor.states.humidityRatio.length} hours, the series has ${n}`);
  const atSite: SiteRunOptions = { ...options, elevationM };
  if (isHybrid(scenario)) return runHybrid(scenario, series, atSite, outdoor);
  return runSingle(scenario as SingleScenario, series, atSite, outdoor);
}

function runSingle(scenario: SingleScenario, series: ScenarioSeries, options: SiteRunOptions, outdoor: Outdoor, withEnergy = true): ScenarioRun {
  const n = series.dryBulbC.length;
  const { elevationM } = options;
  const sitePressurePa = standardPressurePa(elevationM);
  const { states, pressurePa, filledHours } = outdoor;
  const { envelope, system } = scenario;
  const { limits, plant } = designAtSite(scenario, elevationM);
  const { fanHeatK } = plant;
  const classification = classifyHours(
    system,
    limits,
    { dryBulbC: series.dryBulbC, wetBulbC: states.wetBulbC, humidityRatio: states.humidityRatio, pressurePa, flags: series.flags },
    plant,
  );
  const energy = withEnergy
    ? hourlyEnergy(
        system,
        scenario.energy,
        { dryBulbC: series.dryBulbC, wetBulbC: states.wetBulbC, humidityRatio: states.humidityRatio },
        hourlyLoadFractions(scenario.energy.itLoadProfile, series.timestampsMs, options.utcOffsetMinutes),
        classification,
        sitePressurePa,
      )
    : noEnergy(n);
  const aggregated = aggregate(scenario, series, options, classification, energy);
  const targets = moistureTargets(limits, system.supplyAirC, sitePressurePa);

  const warnings: string[] = [];
  if (system.supplyAirC > limits.dryBulbMaxC) {
    warnings.push(
      `supplyAirC ${system.supplyAirC} °C is above the envelope's maximum dry-bulb ${round2(limits.dryBulbMaxC)} °C${limits.dryBulbMaxC < envelope.dryBulbMaxC ? ` (derated for ${elevationM} m)` : ''}: every hour is an excursion.`,
    );
  }
  if (system.supplyAirC < limits.dryBulbMinC) {
    warnings.push(`supplyAirC ${system.supplyAirC} °C is below the envelope's minimum dry-bulb ${limits.dryBulbMinC} °C: every hour is an excursion.`);
  }
  if (system.kind === 'direct-air' && targets.lowW > targets.highW) {
    warnings.push("The envelope's lower moisture limit is above its upper limit at the supply temperature: no outdoor hour can meet both.");
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
 * What the classifier needs of a scenario at a site: its system, the envelope with the dry-bulb maximum derated
 * for the site's elevation, and the design fan heat. The one derivation for runs and the operating-region chart.
 */
export function designAtSite(scenario: Scenario, elevationM: number): { system: SingleScenario['system']; limits: InletLimits; plant: ClassifierPlant } {
  // A hybrid hall's air is its air loop, as the run classified it.
  const single = isHybrid(scenario) ? loopScenarios(scenario).air : (scenario as SingleScenario);
  const { envelope, system, energy } = single;
  const limits: InletLimits = { ...envelope, dryBulbMaxC: deratedDryBulbMaxC(envelope.dryBulbMaxC, elevationM, envelope.altitudeDerating) };
  return { system, limits, plant: { fanHeatK: designFanHeatK(energy.fanPowerFraction, system.itDeltaTK) } };
}

const round2 = (x: number): number => Math.round(x * 100) / 100;

/** The run's hours, energy and water summed from its hourly classification and energy. */
function aggregate(
  scenario: Pick<Scenario, 'energy'>,
  series: ScenarioSeries,
  options: RunOptions,
  classification: HourClassification,
  energy: HourlyEnergy,
): AggregatedResults {
  return aggregateResults({
    timestampsMs: series.timestampsMs,
    classification,
    energy,
    cyclesOfConcentration: scenario.energy.cyclesOfConcentration,
    utcOffsetMinutes: options.utcOffsetMinutes,
  });
}

/** The hourly energy of a loop that carries no load: every column 0. */
function noEnergy(n: number): HourlyEnergy {
  const zeros = () => new Float64Array(n);
  return {
    itKw: zeros(),
    mechanicalLoadKw: zeros(),
    compressorKw: zeros(),
    cop: zeros(),
    fanKw: zeros(),
    rejectionFanKw: zeros(),
    pumpKw: zeros(),
    basinHeaterKw: zeros(),
    rejectedKw: zeros(),
    humidificationL: zeros(),
    evaporativeCoolingL: zeros(),
    driftL: zeros(),
  };
}

/**
 * A hybrid hall: each loop run as its single system with its share of the load (hybrid.ts), the overall hours from
 * the joined classification, energy and water as the loops' sums, pPUE and WUE over the whole, heat reuse from the
 * liquid loop. A loop with share 0 is classified (its hours are shown) but carries no energy.
 */
function runHybrid(scenario: HybridScenario, series: ScenarioSeries, options: SiteRunOptions, outdoor: Outdoor): ScenarioRun {
  const { system } = scenario;
  const share = system.liquidShare;
  const loops = loopScenarios(scenario);
  const liquid = runSingle(loops.liquid, series, options, outdoor, share > 0);
  const air = runSingle(loops.air, series, options, outdoor, share < 1);
  const classification = combineLoopHours(share, liquid.classification, air.classification, scenario.energy.fanPowerFraction);
  const energy = share === 0 ? air.energy : share === 1 ? liquid.energy : addLoopEnergy(liquid.energy, air.energy);
  const aggregated = aggregate(scenario, series, options, classification, energy);
  // Energy and water as the loops' sums, so the loops add up to the whole exactly (blowdown is clamped per hour
  // and loop, so adding the loops' hourly water first could differ).
  const l = liquid.results;
  const a = air.results;
  const energyTotals = addEnergyTotals(l.energy, a.energy);
  const water = addWater(l.water, a.water, energyTotals.itKwh, aggregated.hours.total - aggregated.hours.noData);
  const base = share === 1 ? liquid.results : air.results;
  const results: ScenarioResults = {
    ...base,
    ...aggregated,
    energy: energyTotals,
    water,
    scenarioName: scenario.name,
    systemKind: 'hybrid',
    warnings: [...new Set([...a.warnings, ...l.warnings])],
    loops: {
      liquid: {
        ...loopResults(l, share),
        temperatures: {
          facilitySupplyC: system.liquid.chilledWaterSupplyC,
          facilityReturnC: system.liquid.chilledWaterSupplyC + system.liquid.chilledWaterDeltaTK,
          coolantSupplyC: system.liquid.chilledWaterSupplyC + system.liquid.cduApproachK,
          facilityWaterClassId: system.liquid.facilityWaterClassId ?? null,
        },
      },
      air: loopResults(a, 1 - share),
    },
  };
  if (system.heatReuse) {
    results.heatReuse = heatReuseResults({
      reuse: system.heatReuse,
      supplyC: system.liquid.chilledWaterSupplyC,
      deltaTK: system.liquid.chilledWaterDeltaTK,
      loopHeatKw: liquid.energy.itKw,
      timestampsMs: series.timestampsMs,
      utcOffsetMinutes: options.utcOffsetMinutes,
      model: compressorModelFor(loops.liquid.system, scenario.energy),
      facilityKwh: energyTotals.itKwh + energyTotals.coolingKwh,
    });
  }
  return {
    results,
    states: outdoor.states,
    classification,
    energy,
    loops: { liquid: { classification: liquid.classification, energy: liquid.energy }, air: { classification: air.classification, energy: air.energy } },
  };
}

function loopResults(r: ScenarioResults, share: number): LoopResults {
  return {
    share,
    systemKind: r.systemKind as LoopResults['systemKind'],
    hours: r.hours,
    hoursByMonth: r.hoursByMonth,
    energy: r.energy,
    water: r.water,
    peakMechanicalLoadKw: r.peakMechanicalLoadKw,
    peakCompressorKw: r.peakCompressorKw,
    longestMechanicalRunHours: r.longestMechanicalRunHours,
  };
}

type EnergyResults = AggregatedResults['energy'];
type WaterResults = AggregatedResults['water'];
const HOURS_PER_YEAR = 8760;

/** Two loops' energy totals added; pPUE over the whole, (IT + cooling) / IT. */
function addEnergyTotals(x: EnergyResults, y: EnergyResults): EnergyResults {
  const keys = ['itKwh', 'fanKwh', 'compressorKwh', 'pumpKwh', 'basinHeaterKwh', 'coolingKwh'] as const;
  const sum = Object.fromEntries(keys.map((k) => [k, x[k] + y[k]])) as Record<(typeof keys)[number], number>;
  // The heat-rejection fans' part of fanKwh (absent only in results stored before the split).
  const rejectionFanKwh = (x.rejectionFanKwh ?? 0) + (y.rejectionFanKwh ?? 0);
  const annual =
    x.annual && y.annual
      ? {
          ...(Object.fromEntries(keys.map((k) => [k, x.annual![k] + y.annual![k]])) as Record<(typeof keys)[number], number>),
          rejectionFanKwh: (x.annual.rejectionFanKwh ?? 0) + (y.annual.rejectionFanKwh ?? 0),
        }
      : null;
  return { ...sum, rejectionFanKwh, partialPue: sum.itKwh > 0 ? (sum.itKwh + sum.coolingKwh) / sum.itKwh : null, annual };
}

/** Two loops' water added; WUE over the whole, total litres / IT kWh (ISO/IEC 30134-9). */
function addWater(x: WaterResults, y: WaterResults, itKwh: number, dataHours: number): WaterResults {
  const totalL = x.totalL + y.totalL;
  return {
    evaporatedL: x.evaporatedL + y.evaporatedL,
    humidificationL: x.humidificationL + y.humidificationL,
    evaporativeCoolingL: x.evaporativeCoolingL + y.evaporativeCoolingL,
    driftL: x.driftL + y.driftL,
    blowdownL: x.blowdownL + y.blowdownL,
    totalL,
    annualL: dataHours > 0 ? totalL * (HOURS_PER_YEAR / dataHours) : null,
    wueLPerKwh: dataHours > 0 && itKwh > 0 ? totalL / itKwh : null,
  };
}
