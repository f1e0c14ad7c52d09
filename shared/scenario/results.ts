/**
 * Aggregation of the hourly classification and energy into the run's results: hours per mode
 * (total, per month, per hour of day, per calendar year), excursions, runs, peaks, energy,
 * partial PUE and WUE. One pass over the hours; calendar fields recomputed only when the day changes.
 */
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
  const n = classification.modes.length;
  if (timestampsMs.length !== n) throw new RangeError(`timestampsMs has ${timestampsMs.length} hours, the classification has ${n}`);
  if (!(cyclesOfConcentration > 1)) throw new RangeError(`cyclesOfConcentration must be above 1, got ${cyclesOfConcentration}`);
  const offsetMs = (input.utcOffsetMinutes ?? 0) * 60_000;
  const t = tallyHours(timestampsMs, offsetMs, classification, energy, 1 / (cyclesOfConcentration - 1), localYearSpan(timestampsMs, offsetMs));
  const { total, byMonth, byHour, byYear, firstYear, itKwh, fanKwh, rejectionFanKwh, compressorKwh, pumpKwh, basinHeaterKwh } = t;
  const { humidificationL, evaporativeCoolingL, driftL, blowdownL: blowdownTotalL } = t;

  const dataHours = n - total[MODE.noData];
  const coolingKwh = fanKwh + compressorKwh + pumpKwh + basinHeaterKwh;
  const evaporatedL = humidificationL + evaporativeCoolingL;
  const totalL = evaporatedL + driftL + blowdownTotalL;
  const scale = dataHours > 0 ? HOURS_PER_YEAR / dataHours : Number.NaN;
  const hasData = dataHours > 0;
  const hasIt = hasData && itKwh > 0;
  const hoursByYear: YearResults[] = [];
  for (let base = 0; base < byYear.length; base += YEAR_SLOTS) {
    const hours = modeHours(byYear, base);
    // a calendar year between the first and the last without any hour is no year of the run
    if (hours.total > 0) {
      hoursByYear.push({ year: firstYear + base / YEAR_SLOTS, ...hours, coolingKwh: byYear[base + YEAR_COOLING_KWH], waterL: byYear[base + YEAR_WATER_L] });
    }
  }

  return {
    hours: modeHours(total, 0),
    hoursByMonth: Array.from({ length: 12 }, (_, m) => ({ month: m + 1, ...modeHours(byMonth, m * SLOTS) })),
    hoursByHourOfDay: Array.from({ length: 24 }, (_, h) => ({ hour: h, ...modeHours(byHour, h * SLOTS) })),
    hoursByYear,
    excursions: {
      hours: t.excursionHours,
      lowHumidityHours: t.lowHumidityHours,
      supplyAboveMaxHours: t.supplyAboveMaxHours,
      supplyBelowMinHours: t.supplyBelowMinHours,
      longestRunHours: t.longestExcursionRun,
    },
    longestMechanicalRunHours: t.longestMechanicalRun,
    peakMechanicalLoadKw: t.peakMechanicalLoadKw,
    peakCompressorKw: t.peakCompressorKw,
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

/** Slots of a year's block in the tallies: the mode slots, then the year's cooling energy and water. */
const YEAR_COOLING_KWH = SLOTS;
const YEAR_WATER_L = SLOTS + 1;
const YEAR_SLOTS = SLOTS + 2;

/** First and last calendar year of the hours on the clock `offsetMs` ahead of UTC (timestamps in any order). */
function localYearSpan(timestampsMs: Float64Array, offsetMs: number): { first: number; last: number } {
  let earliest = Number.POSITIVE_INFINITY;
  let latest = Number.NEGATIVE_INFINITY;
  for (let i = 0; i < timestampsMs.length; i++) {
    const ms = timestampsMs[i];
    if (ms < earliest) earliest = ms;
    if (ms > latest) latest = ms;
  }
  if (!(earliest <= latest)) return { first: 0, last: -1 };
  const civil = { year: 0, month: 0, day: 0 };
  civilFromDays(Math.floor((earliest + offsetMs) / MS_PER_DAY), civil);
  const first = civil.year;
  civilFromDays(Math.floor((latest + offsetMs) / MS_PER_DAY), civil);
  return { first, last: civil.year };
}

/**
 * The one pass over the hours: mode counts in flat blocks of SLOTS (in all, per month, per local hour of day, per
 * calendar year from `years.first`), runs, excursions, energy and water sums and peaks. Nothing is allocated per
 * hour or per year inside the loop, so the loop's optimised code never meets a new case halfway through the series.
 */
function tallyHours(
  timestampsMs: Float64Array,
  offsetMs: number,
  classification: HourClassification,
  energy: HourlyEnergy,
  blowdownPerEvaporated: number,
  years: { first: number; last: number },
) {
  const { modes, excursions, humidified, mechanicalFraction } = classification;
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
  const n = modes.length;
  const total = new Float64Array(SLOTS);
  const byMonth = new Float64Array(12 * SLOTS);
  const byHour = new Float64Array(24 * SLOTS);
  const byYear = new Float64Array(Math.max(0, years.last - years.first + 1) * YEAR_SLOTS);
  let itKwh = 0;
  let fanKwh = 0;
  let rejectionFanKwh = 0;
  let compressorKwh = 0;
  let pumpKwh = 0;
  let basinHeaterKwh = 0;
  let humidificationL = 0;
  let evaporativeCoolingL = 0;
  let driftL = 0;
  let blowdownL = 0;
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
  let monthBase = 0;
  let yearBase = 0;
  let previousMs = Number.NaN;
  for (let i = 0; i < n; i++) {
    const localMs = timestampsMs[i] + offsetMs;
    const day = Math.floor(localMs / MS_PER_DAY);
    if (day !== currentDay) {
      currentDay = day;
      civilFromDays(day, civil);
      monthBase = (civil.month - 1) * SLOTS;
      yearBase = (civil.year - years.first) * YEAR_SLOTS;
    }
    const hourBase = Math.floor((localMs - day * MS_PER_DAY) / MS_PER_HOUR) * SLOTS;
    const mode = modes[i];
    total[mode]++;
    byMonth[monthBase + mode]++;
    byHour[hourBase + mode]++;
    byYear[yearBase + mode]++;
    let subset = -1;
    if (humidified[i] === 1 && mode === MODE.free) subset = HUMIDIFIED_SLOT;
    else if (mode === MODE.mechanical && mechanicalFraction[i] > 0 && mechanicalFraction[i] < 1) subset = PARTIAL_SLOT;
    if (subset >= 0) {
      total[subset]++;
      byMonth[monthBase + subset]++;
      byHour[hourBase + subset]++;
      byYear[yearBase + subset]++;
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
    blowdownL += blowdown;
    byYear[yearBase + YEAR_COOLING_KWH] += fan + compressor + pump + heater;
    byYear[yearBase + YEAR_WATER_L] += humidifying + cooling + drift + blowdown;
    if (mechanicalLoadKw[i] > peakMechanicalLoadKw) peakMechanicalLoadKw = mechanicalLoadKw[i];
    if (compressor > peakCompressorKw) peakCompressorKw = compressor;
  }
  return {
    total,
    byMonth,
    byHour,
    byYear,
    firstYear: years.first,
    itKwh,
    fanKwh,
    rejectionFanKwh,
    compressorKwh,
    pumpKwh,
    basinHeaterKwh,
    humidificationL,
    evaporativeCoolingL,
    driftL,
    blowdownL,
    peakMechanicalLoadKw,
    peakCompressorKw,
    lowHumidityHours,
    supplyAboveMaxHours,
    supplyBelowMinHours,
    excursionHours,
    longestMechanicalRun,
    longestExcursionRun,
  };
}

/** Mode counts of one block; total is the four modes (the subsets are inside them). */
function modeHours(counts: Float64Array, offset: number): ModeHours {
  const result = emptyModeHours();
  for (let k = 0; k < SLOTS; k++) result[SLOT_KEYS[k]] = counts[offset + k];
  result.total = counts[offset] + counts[offset + 1] + counts[offset + 2] + counts[offset + 3];
  return result;
}
