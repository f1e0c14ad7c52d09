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
}

export interface EnergyTotals {
  itKwh: number;
  fanKwh: number;
  compressorKwh: number;
  pumpKwh: number;
  /** Fans + compressors + pumps. */
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
    /** (IT + cooling) / IT energy; null without data. */
    partialPue: number | null;
    /** The same totals scaled to 8760 hours of data; null without data. */
    annual: EnergyTotals | null;
  };
  water: {
    evaporatedL: number;
    blowdownL: number;
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
  itLoadKw: number;
  blowdownRatio: number;
  /** Offset added to the timestamps before months and hours of day are taken; 0 keeps UTC. */
  utcOffsetMinutes?: number;
}

const emptyModeHours = (): ModeHours => ({ free: 0, adiabatic: 0, mechanical: 0, noData: 0, total: 0 });
const MODE_KEYS = ['free', 'adiabatic', 'mechanical', 'noData'] as const;
const HOURS_PER_YEAR = 8760;

export function aggregateResults(input: AggregateInput): AggregatedResults {
  const { timestampsMs, classification, energy, itLoadKw, blowdownRatio } = input;
  const { modes, excursions } = classification;
  const n = modes.length;
  if (timestampsMs.length !== n) throw new RangeError(`timestampsMs has ${timestampsMs.length} hours, the classification has ${n}`);
  const offsetMs = (input.utcOffsetMinutes ?? 0) * 60_000;

  // Counts in flat typed arrays during the loop; shaped into objects at the end.
  const total = new Float64Array(4);
  const byMonth = new Float64Array(12 * 4);
  const byHour = new Float64Array(24 * 4);
  type YearTotals = { counts: Float64Array; coolingKwh: number; waterL: number };
  const yearIndex = new Map<number, YearTotals>();
  let fanKwh = 0;
  let compressorKwh = 0;
  let pumpKwh = 0;
  let evaporatedL = 0;
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
  let year: YearTotals = { counts: new Float64Array(4), coolingKwh: 0, waterL: 0 };
  let previousMs = Number.NaN;

  for (let i = 0; i < n; i++) {
    const localMs = timestampsMs[i] + offsetMs;
    const day = Math.floor(localMs / MS_PER_DAY);
    if (day !== currentDay) {
      currentDay = day;
      civilFromDays(day, civil);
      let entry = yearIndex.get(civil.year);
      if (!entry) {
        entry = { counts: new Float64Array(4), coolingKwh: 0, waterL: 0 };
        yearIndex.set(civil.year, entry);
      }
      year = entry;
    }
    const hourOfDay = Math.floor((localMs - day * MS_PER_DAY) / MS_PER_HOUR);
    const mode = modes[i];
    total[mode]++;
    byMonth[(civil.month - 1) * 4 + mode]++;
    byHour[hourOfDay * 4 + mode]++;
    year.counts[mode]++;

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

    const fan = energy.fanKw[i];
    const compressor = energy.compressorKw[i];
    const pump = energy.pumpKw[i];
    const water = energy.evaporatedL[i];
    fanKwh += fan;
    compressorKwh += compressor;
    pumpKwh += pump;
    evaporatedL += water;
    year.coolingKwh += fan + compressor + pump;
    year.waterL += water * (1 + blowdownRatio);
    if (energy.mechanicalLoadKw[i] > peakMechanicalLoadKw) peakMechanicalLoadKw = energy.mechanicalLoadKw[i];
    if (compressor > peakCompressorKw) peakCompressorKw = compressor;
  }

  const dataHours = n - total[MODE.noData];
  const itKwh = itLoadKw * dataHours;
  const coolingKwh = fanKwh + compressorKwh + pumpKwh;
  const blowdownL = evaporatedL * blowdownRatio;
  const totalL = evaporatedL + blowdownL;
  const scale = dataHours > 0 ? HOURS_PER_YEAR / dataHours : Number.NaN;
  const hasData = dataHours > 0;

  return {
    hours: modeHours(total, 0),
    hoursByMonth: Array.from({ length: 12 }, (_, m) => ({ month: m + 1, ...modeHours(byMonth, m * 4) })),
    hoursByHourOfDay: Array.from({ length: 24 }, (_, h) => ({ hour: h, ...modeHours(byHour, h * 4) })),
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
      compressorKwh,
      pumpKwh,
      coolingKwh,
      // ISO/IEC 30134-2 style ratio restricted to cooling: (IT + cooling) / IT.
      partialPue: hasData ? (itKwh + coolingKwh) / itKwh : null,
      annual: hasData
        ? { itKwh: itKwh * scale, fanKwh: fanKwh * scale, compressorKwh: compressorKwh * scale, pumpKwh: pumpKwh * scale, coolingKwh: coolingKwh * scale }
        : null,
    },
    water: {
      evaporatedL,
      blowdownL,
      totalL,
      annualL: hasData ? totalL * scale : null,
      // ISO/IEC 30134-9: WUE = annual site water use (L) / IT equipment energy (kWh).
      wueLPerKwh: hasData ? totalL / itKwh : null,
    },
  };
}

function modeHours(counts: Float64Array, offset: number): ModeHours {
  const result = emptyModeHours();
  for (let m = 0; m < 4; m++) {
    result[MODE_KEYS[m]] = counts[offset + m];
    result.total += counts[offset + m];
  }
  return result;
}
