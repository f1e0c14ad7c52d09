/**
 * Aggregation of the hourly classification and energy into the run's results: hours per mode
 * (total, per month, per hour of day, per calendar year), excursions, runs, peaks, energy,
 * partial PUE and WUE. One pass over the hours; calendar fields recomputed only when the day changes.
 */
// @ts-nocheck

import { civilFromDays, MS_PER_DAY, MS_PER_HOUR } from '../calendar';
import { EXCURSION, MODE, type HourClassification } from './classify';
import type { HourlyEnergy } from './energy';

export interface ModeHours {
  free: number;
  adiabatic: number;
  mechanical: number;
  noData: number;
  total: number;
  /** Free-cooling hours in which the evaporative stage only adds moisture (a subset of free). Engine 2.0.0 on. */
  humidified: number;
  /** Mechanical hours in which the economiser still carries part of the load, 0 < mechanical fraction < 1 (a subset of mechanical). Engine 2.0.0 on. */
  partialMechanical: number;
}

export interface EnergyTotals {
  itKwh: number;
  fanKwh: number;
  /**
   * The heat-rejection fans' part of fanKwh (scavenger fans of an indirect system, dry-cooler or tower fans); the hall
   * fans are the rest. Absent in runs stored before the split was kept (their fanKwh holds both groups).
   */
  rejectionFanKwh?: number;
  compressorKwh: number;
  pumpKwh: number;
  /** Cooling-tower basin heaters in freeze-protection hours. Engine 2.0.0 on. */
  basinHeaterKwh: number;
  /** Fans + compressors + pumps + basin heaters. */
  coolingKwh: number;
}

export interface YearResults extends ModeHours {
  year: number;
  coolingKwh: number;
  waterL: number;
}

export interface AggregatedResults {
  hours: ModeHours;
  hoursByMonth: (ModeHours & { month: number })[];
  hoursByHourOfDay: (ModeHours & { hour: number })[];
  hoursByYear: YearResults[];
  excursions: {
    hours: number;
    lowHumidityHours: number;
    supplyAboveMaxHours: number;
    supplyBelowMinHours: number;
    longestRunHours: number;
  };
  longestMechanicalRunHours: number;
  peakMechanicalLoadKw: number;
  peakCompressorKw: number;
  /** Sums over the hours with data. */
  energy: EnergyTotals & {
    /** (IT + cooling) / IT energy; null without data or without IT energy. */
    partialPue: number | null;
    /** The same totals scaled to 8760 hours of data; null without data. */
    annual: EnergyTotals | null;
  };
  water: {
    /** humidificationL + evaporativeCoolingL. */
    evaporatedL: number;
    /** Water that only adds moisture, in humidified free-cooling hours. Engine 2.0.0 on. */
    humidificationL: number;
    /** Water evaporated to cool: evaporative stages, wetted dry coolers, cooling towers. Engine 2.0.0 on. */
    evaporativeCoolingL: number;
    /** Cooling-tower drift, a share of the circulating water. Engine 2.0.0 on. */
    driftL: number;
    /** Water drained to hold the cycles of concentration. */
    blowdownL: number;
    /** evaporatedL + driftL + blowdownL. */
    totalL: number;
    /** Total scaled to 8760 hours of data; null without data. */
    annualL: number | null;
    /** Litres per kWh of IT energy (ISO/IEC 30134-9); null without data. */
    wueLPerKwh: number | null;
  };
}

export interface AggregateInput {
  timestampsMs: Float64Array;
  classification: HourClassification;
  energy: HourlyEnergy;
  /** Cycles of concentration of the evaporative water: blowdown = evaporation / (cycles − 1) − drift. */
  cyclesOfConcentration: number;
  /** Offset added to the timestamps before months and hours of day are taken; 0 keeps UTC. */
  utcOffsetMinutes?: number;
}

const emptyModeHours = (): ModeHours => ({ free: 0, adiabatic: 0, mechanical: 0, noData: 0, total: 0, humidified: 0, partialMechanical: 0 });
/** Slots of a count block: the four modes by their MODE code, then the two subsets. */
const SLOT_KEYS = ['free', 'adiabatic', 'mechanical', 'noData', 'humidified', 'partialMechanical'] as const;
const SLOTS = SLOT_KEYS.length;
const HUMIDIFIED_SLOT = 4;
const PARTIAL_SLOT = 5;
const HOURS_PER_YEAR = 8760;

/**
 * Blowdown of one hour, litres: B = E / (C − 1) − D, never below 0 — the mass balance of dissolved solids
 * at C cycles of concentration, where drift D also carries solids away (ASHRAE Handbook—HVAC Systems and
 * Equipment, cooling-tower chapter; recalled from memory).
 */
export function blowdownL(evaporatedL: number, driftL: number, cyclesOfConcentration: number): number {
  if (!(cyclesOfConcentration > 1)) throw new RangeError(`cyclesOfConcentration must be above 1, got ${cyclesOfConcentration}`);
  const b = evaporatedL / (cyclesOfConcentration - 1) - driftL;
  return b > 0 ? b : 0;
}

export function aggregateResults(input: AggregateInput): AggregatedResults {
  const { timestampsMs, classification, energy, cyclesOfConcentration } = input;
  const { modes, excursions, humidified, mechanicalFraction } = classification;
  const n = modes.length;
  if (timestampsMs.length !== n) throw new RangeError(`timestampsMs has ${timestampsMs.length} hours, the classification has ${n}`);
  if (!(cyclesOfConcentration > 1)) throw new RangeError(`cyclesOfConcentration must be above 1, got ${cyclesOfConcentration}`);
  const offsetMs = (input.utcOffsetMinutes ?? 0) * 60_000;
  const blowdownPerEvaporated = 1 / (cyclesOfConcentration - 1);

  // Counts in flat typed arrays during the loop; shaped into objects at the end.
  const total = new Float64Array(SLOTS);
  const byMonth = new Float64Array(12 * SLOTS);
  const byHour = new Float64Array(24 * SLOTS);
  type YearTotals = { counts: Float64Array; coolingKwh: number; waterL: number };
  const yearIndex = new Map<number, YearTotals>();
  let itKwh = 0;
  let fanKwh = 0;
  let rejectionFanKwh = 0;
  let compressorKwh = 0;
  let pumpKwh = 0;
  let basinHeaterKwh = 0;
  let humidificationL = 0;
  let evaporativeCoolingL = 0;
  let driftL = 0;
  let blowdownTotalL = 0;
  let peakMechanicalLoadKw = 0;
  let peakCompressorKw = 0;
  let lowHumidityHours = 0;
  let supplyAboveMaxHours = 0;
  let supplyBelowMinHours = 0;
  let excursionHours = 0;
  let mechanicalRun = 0;
  let longestMechanicalRun = 0;
  let excursionRun = 0;
  let longestExcursionRun = 0;

  const civil = { year: 0, month: 0, day: 0 };
  let currentDay = Number.NaN;
  let year: YearTotals = { counts: new Float64Array(SLOTS), coolingKwh: 0, waterL: 0 };
  let previousMs = Number.NaN;
  // The hourly columns as locals: the loop reads them without going through the energy object each time.
  const {
    itKw,
    fanKw,
    rejectionFanKw,
    compressorKw,
    pumpKw,
    basinHeaterKw,
    humidificationL: humidifyingL,
    evaporativeCoolingL: coolingL,
    driftL: driftHourL,
    mechanicalLoadKw,
  } = energy;
  let yearCounts = year.counts;

  for (let i = 0; i < n; i++) {
    const localMs = timestampsMs[i] + offsetMs;
    const day = Math.floor(localMs / MS_PER_DAY);
    if (day !== currentDay) {
      currentDay = day;
      civilFromDays(day, civil);
      let entry = yearIndex.get(civil.year);
      if (!entry) {
        entry = { counts: new Float64Array(SLOTS), coolingKwh: 0, waterL: 0 };
        yearIndex.set(civil.year, entry);
      }
      year = entry;
      yearCounts = entry.counts;
    }
    const hourOfDay = Math.floor((localMs - day * MS_PER_DAY) / MS_PER_HOUR);
    const mode = modes[i];
    const monthBase = (civil.month - 1) * SLOTS;
    const hourBase = hourOfDay * SLOTS;
    total[mode]++;
    byMonth[monthBase + mode]++;
    byHour[hourBase + mode]++;
    yearCounts[mode]++;
    let subset = -1;
    if (humidified[i] === 1 && mode === MODE.free) subset = HUMIDIFIED_SLOT;
    else if (mode === MODE.mechanical && mechanicalFraction[i] > 0 && mechanicalFraction[i] < 1) subset = PARTIAL_SLOT;
    if (subset >= 0) {
      total[subset]++;
      byMonth[monthBase + subset]++;
      byHour[hourBase + subset]++;
      yearCounts[subset]++;
    }

    // A run is broken by a no-data hour or by a step that is not one hour.
    const contiguous = timestampsMs[i] - previousMs === MS_PER_HOUR;
    previousMs = timestampsMs[i];
    if (mode === MODE.noData) {
      mechanicalRun = 0;
      excursionRun = 0;
      continue;
    }
    mechanicalRun = mode === MODE.mechanical ? (contiguous ? mechanicalRun + 1 : 1) : 0;
    if (mechanicalRun > longestMechanicalRun) longestMechanicalRun = mechanicalRun;
    const excursion = excursions[i];
    excursionRun = excursion !== 0 ? (contiguous ? excursionRun + 1 : 1) : 0;
    if (excursionRun > longestExcursionRun) longestExcursionRun = excursionRun;
    if (excursion !== 0) excursionHours++;
    if (excursion & EXCURSION.lowHumidity) lowHumidityHours++;
    if (excursion & EXCURSION.supplyAboveMax) supplyAboveMaxHours++;
    if (excursion & EXCURSION.supplyBelowMin) supplyBelowMinHours++;

    const fan = fanKw[i];
    const compressor = compressorKw[i];
    const pump = pumpKw[i];
    const heater = basinHeaterKw[i];
    const humidifying = humidifyingL[i];
    const cooling = coolingL[i];
    const drift = driftHourL[i];
    // B = E / (C − 1) − D, never below 0 (see blowdownL).
    const blowdownHour = (humidifying + cooling) * blowdownPerEvaporated - drift;
    const blowdown = blowdownHour > 0 ? blowdownHour : 0;
    itKwh += itKw[i];
    fanKwh += fan;
    rejectionFanKwh += rejectionFanKw[i];
    compressorKwh += compressor;
    pumpKwh += pump;
    basinHeaterKwh += heater;
    humidificationL += humidifying;
    evaporativeCoolingL += cooling;
    driftL += drift;
    blowdownTotalL += blowdown;
    year.coolingKwh += fan + compressor + pump + heater;
    year.waterL += humidifying + cooling + drift + blowdown;
    if (mechanicalLoadKw[i] > peakMechanicalLoadKw) peakMechanicalLoadKw = mechanicalLoadKw[i];
    if (compressor > peakCompressorKw) peakCompressorKw = compressor;
  }

  const dataHours = n - total[MODE.noData];
  const coolingKwh = fanKwh + compressorKwh + pumpKwh + basinHeaterKwh;
  const evaporatedL = humidificationL + evaporativeCoolingL;
  const totalL = evaporatedL + driftL + blowdownTotalL;
  const scale = dataHours > 0 ? HOURS_PER_YEAR / dataHours : Number.NaN;
  const hasData = dataHours > 0;
  const hasIt = hasData && itKwh > 0;

  return {
    hours: modeHours(total, 0),
    hoursByMonth: Array.from({ length: 12 }, (_, m) => ({ month: m + 1, ...modeHours(byMonth, m * SLOTS) })),
    hoursByHourOfDay: Array.from({ length: 24 }, (_, h) => ({ hour: h, ...modeHours(byHour, h * SLOTS) })),
    hoursByYear: [...yearIndex.entries()]
      .sort(([a], [b]) => a - b)
      .map(([y, entry]) => ({ year: y, ...modeHours(entry.counts, 0), coolingKwh: entry.coolingKwh, waterL: entry.waterL })),
    excursions: {
      hours: excursionHours,
      lowHumidityHours,
      supplyAboveMaxHours,
      supplyBelowMinHours,
      longestRunHours: longestExcursionRun,
    },
    longestMechanicalRunHours: longestMechanicalRun,
    peakMechanicalLoadKw,
    peakCompressorKw,
    energy: {
      itKwh,
      fanKwh,
      rejectionFanKwh,
      compressorKwh,
      pumpKwh,
      basinHeaterKwh,
      coolingKwh,
      // ISO/IEC 30134-2 style ratio restricted to cooling: (IT + cooling) / IT.
      partialPue: hasIt ? (itKwh + coolingKwh) / itKwh : null,
      annual: hasData
        ? {
            itKwh: itKwh * scale,
            fanKwh: fanKwh * scale,
            rejectionFanKwh: rejectionFanKwh * scale,
            compressorKwh: compressorKwh * scale,
            pumpKwh: pumpKwh * scale,
            basinHeaterKwh: basinHeaterKwh * scale,
            coolingKwh: coolingKwh * scale,
          }
        : null,
    },
    water: {
      evaporatedL,
      humidificationL,
      evaporativeCoolingL,
      driftL,
      blowdownL: blowdownTotalL,
      totalL,
      annualL: hasData ? totalL * scale : null,
      // ISO/IEC 30134-9: WUE = annual site water use (L) / IT equipment energy (kWh).
      wueLPerKwh: hasIt ? totalL / itKwh : null,
    },
  };
}

/** Mode counts of one block; total is the four modes (the subsets are inside them). */
function modeHours(counts: Float64Array, offset: number): ModeHours {
  const result = emptyModeHours();
  for (let k = 0; k < SLOTS; k++) result[SLOT_KEYS[k]] = counts[offset + k];
  result.total = counts[offset] + counts[offset + 1] + counts[offset + 2] + counts[offset + 3];
  return result;
}
