/**
 * The one list of the figures a run produces: for each, its key, a plain label, its unit in SI and in IP, the decimals
 * a download gives, and which way is better. The compare page, the sweeps, the reports, the summary and comparison CSVs
 * and the run page read their names, units and decimals from here, so a figure is defined once. Values travel in SI
 * (h, kWh, kW, L, L/kWh, °C); a unit kind says how a value is written in IP.
 */
import { celsiusToFahrenheit } from './units';
import type { LoopResults, ScenarioResults } from './scenario/run';
import type { HeatReuseResults } from './scenario/heat-reuse';
import type { YearMetric } from './scenario/year-statistics';
import { modeSubsets, subsetHours, waterPartL, waterParts, type ModeSubsetKey, type WaterPartKey } from './report/mode-subsets';
import { modeLabels } from './modes';

export type MetricUnits = 'SI' | 'IP';

const US_GALLON_L = 3.785411784; // NIST SP 811 (2008), App. B: 1 US gallon = 3.785 411 784 L, exact.

/** How one kind of figure is written: its unit in SI and IP, the IP conversion, and the smallest base a percentage is given for. */
export interface MetricUnitKind {
  si: string;
  ip: string;
  /** SI value to IP; linear through zero for every kind but temperature, so a difference converts by the same factor. */
  toIp: (si: number) => number;
  /**
   * Below this baseline (in SI, by size) a difference is not given as a percentage: a percentage of a near-zero base
   * says nothing ("0.0 MWh → 1.0 MWh, +2356.3 %"). A day of hours, 1 MWh, 1 m³ of water, 10 kW; ratios always.
   */
  percentFloor: number;
}

const same = (v: number) => v;

/** Energy stays in kWh and power in kW in IP (as electricity is billed and as the run page gives them); WUE stays in L/kWh as ISO/IEC 30134-9 defines it. */
export const metricUnitKinds = {
  hours: { si: 'h', ip: 'h', toIp: same, percentFloor: 24 },
  percent: { si: '%', ip: '%', toIp: same, percentFloor: 0 },
  ratio: { si: '', ip: '', toIp: same, percentFloor: 0 },
  energy: { si: 'kWh', ip: 'kWh', toIp: same, percentFloor: 1000 },
  power: { si: 'kW', ip: 'kW', toIp: same, percentFloor: 10 },
  water: { si: 'L', ip: 'US gal', toIp: (l: number) => l / US_GALLON_L, percentFloor: 1000 },
  waterPerEnergy: { si: 'L/kWh', ip: 'L/kWh', toIp: same, percentFloor: 0.01 },
  temperature: { si: '°C', ip: '°F', toIp: celsiusToFahrenheit, percentFloor: Infinity },
} satisfies Record<string, MetricUnitKind>;

export type MetricKind = keyof typeof metricUnitKinds;

export interface MetricDefinition {
  key: string;
  /** The figure's plain name on screens and in downloads. */
  label: string;
  kind: MetricKind;
  /** Decimals a download gives in SI, and in IP where it differs (a US gallon is about a quarter of a litre, so the same). */
  decimals: number;
  ipDecimals?: number;
  /** Which way is better; none for neutral figures. */
  better: 'higher' | 'lower' | 'none';
}

const hours = (key: string, label: string, better: MetricDefinition['better']): MetricDefinition => ({ key, label, kind: 'hours', decimals: 0, better });
const energy = (key: string, label: string): MetricDefinition => ({ key, label, kind: 'energy', decimals: 1, better: 'lower' });
const water = (key: string, label: string): MetricDefinition => ({ key, label, kind: 'water', decimals: 1, better: 'lower' });
const ratio = (key: string, label: string, better: MetricDefinition['better']): MetricDefinition => ({ key, label, kind: 'ratio', decimals: 4, better });
const subsetLabel = (key: ModeSubsetKey) => modeSubsets.find((s) => s.key === key)!.figure;
const waterPartLabel = (key: WaterPartKey) => waterParts.find((p) => p.key === key)!.figure;

/** Every figure of a run (the whole-file totals; by-month and by-year tables repeat the same figures per period). */
export const METRICS = {
  // Hours per mode and the counts inside them.
  free: hours('free', modeLabels.free, 'higher'),
  humidified: hours('humidified', subsetLabel('humidified'), 'none'),
  adiabatic: hours('adiabatic', modeLabels.adiabatic, 'none'),
  mechanical: hours('mechanical', modeLabels.mechanical, 'lower'),
  partialMechanical: hours('partialMechanical', subsetLabel('partialMechanical'), 'none'),
  noData: hours('noData', modeLabels.noData, 'none'),
  totalHours: hours('totalHours', 'All hours', 'none'),
  freeShare: { key: 'freeShare', label: 'Free cooling share', kind: 'percent', decimals: 2, better: 'higher' },
  longestMechanicalRun: hours('longestMechanicalRun', 'Longest run of mechanical hours', 'lower'),
  // Excursions outside the inlet envelope.
  excursions: hours('excursions', 'Hours outside the envelope', 'lower'),
  tooDry: hours('tooDry', 'of which too dry', 'lower'),
  supplyAboveMax: hours('supplyAboveMax', 'Supply above the envelope', 'lower'),
  supplyBelowMin: hours('supplyBelowMin', 'Supply below the envelope', 'lower'),
  longestExcursion: hours('longestExcursion', 'Longest excursion', 'lower'),
  // Energy over the file's hours with data; "per 8,760 h" scales it to a year of data.
  it: { key: 'it', label: 'IT energy', kind: 'energy', decimals: 1, better: 'none' },
  hallFans: energy('hallFans', 'Hall fans'),
  rejectionFans: energy('rejectionFans', 'Heat-rejection fans'),
  allFans: energy('allFans', 'Fans (hall and heat rejection together)'),
  compressor: energy('compressor', 'Compressors'),
  pumps: energy('pumps', 'Pumps'),
  basinHeaters: energy('basinHeaters', 'Basin heaters'),
  cooling: energy('cooling', 'Cooling total'),
  coolingPerYear: energy('coolingPerYear', 'Cooling total per 8,760 h'),
  compressorPerYear: energy('compressorPerYear', 'Compressors per 8,760 h'),
  ppue: ratio('ppue', 'Partial PUE (cooling)', 'lower'),
  peak: { key: 'peak', label: 'Peak mechanical load', kind: 'power', decimals: 1, better: 'lower' },
  peakCompressor: { key: 'peakCompressor', label: 'Peak compressor power', kind: 'power', decimals: 1, better: 'lower' },
  // Water.
  evaporated: water('evaporated', 'Evaporated'),
  humidificationL: water('humidificationL', waterPartLabel('humidificationL')),
  evaporativeCoolingL: water('evaporativeCoolingL', waterPartLabel('evaporativeCoolingL')),
  driftL: water('driftL', waterPartLabel('driftL')),
  blowdown: water('blowdown', 'Blowdown'),
  waterTotal: water('waterTotal', 'Water total'),
  waterPerYear: water('waterPerYear', 'Water total per 8,760 h'),
  humidificationPerYear: water('humidificationPerYear', `${waterPartLabel('humidificationL')} per 8,760 h`),
  evaporativeCoolingPerYear: water('evaporativeCoolingPerYear', `${waterPartLabel('evaporativeCoolingL')} per 8,760 h`),
  wue: { key: 'wue', label: 'WUE', kind: 'waterPerEnergy', decimals: 4, better: 'lower' },
  // A hybrid hall's loops (each also has the hours, energy and water figures above, under its name).
  loopShare: { key: 'loopShare', label: 'Share of IT heat', kind: 'percent', decimals: 2, better: 'none' },
  liquidFree: hours('liquidFree', `Liquid loop: ${modeLabels.free.toLowerCase()}`, 'higher'),
  liquidMechanical: hours('liquidMechanical', `Liquid loop: ${modeLabels.mechanical.toLowerCase()}`, 'lower'),
  airFree: hours('airFree', `Air loop: ${modeLabels.free.toLowerCase()}`, 'higher'),
  airMechanical: hours('airMechanical', `Air loop: ${modeLabels.mechanical.toLowerCase()}`, 'lower'),
  facilitySupply: { key: 'facilitySupply', label: 'Facility-water supply', kind: 'temperature', decimals: 2, better: 'none' },
  facilityReturn: { key: 'facilityReturn', label: 'Facility-water return', kind: 'temperature', decimals: 2, better: 'none' },
  coolantSupply: { key: 'coolantSupply', label: 'Coolant supply after the CDU', kind: 'temperature', decimals: 2, better: 'none' },
  // Heat reuse (ISO/IEC 30134-6).
  reuseThreshold: { key: 'reuseThreshold', label: 'Threshold', kind: 'temperature', decimals: 2, better: 'none' },
  heatHours: hours('heatHours', 'Hours available', 'higher'),
  heatAvailable: { key: 'heatAvailable', label: 'Reusable heat available', kind: 'energy', decimals: 1, better: 'higher' },
  heatReused: { key: 'heatReused', label: 'Heat reused', kind: 'energy', decimals: 1, better: 'higher' },
  heatPump: energy('heatPump', 'Heat-pump electricity'),
  erf: ratio('erf', 'ERF (ISO/IEC 30134-6)', 'higher'),
} as const satisfies Record<string, MetricDefinition>;

export type MetricKey = keyof typeof METRICS;

/** Which figure of the list each per-year quantity is (shared/scenario/year-statistics.ts): its label and unit come from there. */
export const YEAR_METRIC_FIGURES: Record<YearMetric, MetricKey> = {
  free: 'free',
  adiabatic: 'adiabatic',
  mechanical: 'mechanical',
  coolingKwh: 'cooling',
  waterL: 'waterTotal',
};

/** A figure's unit in the chosen units ("L" or "US gal"). */
export function metricUnit(metric: Pick<MetricDefinition, 'kind'>, units: MetricUnits): string {
  const kind = metricUnitKinds[metric.kind];
  return units === 'IP' ? kind.ip : kind.si;
}

/** Fixed decimals as a number (not text), so a spreadsheet still reads it as a number; null for a missing or non-finite value. */
export function rounded(value: number | null | undefined, decimals: number): number | null {
  if (value === null || value === undefined || !Number.isFinite(value)) return null;
  const scale = 10 ** decimals;
  return Math.round(value * scale) / scale;
}

/**
 * An SI value as a download gives it: converted to the chosen units and rounded to the figure's decimals. `difference`
 * converts a temperature difference by the scale factor alone (no offset); every other kind is linear through zero.
 */
export function metricValue(
  metric: Pick<MetricDefinition, 'kind' | 'decimals' | 'ipDecimals'>,
  si: number | null | undefined,
  units: MetricUnits,
  difference = false,
): number | null {
  if (si === null || si === undefined || !Number.isFinite(si)) return null;
  if (units === 'SI') return rounded(si, metric.decimals);
  const kind = metricUnitKinds[metric.kind];
  const ip = difference && metric.kind === 'temperature' ? si * 1.8 : kind.toIp(si);
  return rounded(ip, metric.ipDecimals ?? metric.decimals);
}

/** A difference as a percentage of its baseline, or null where the baseline is missing or under the figure's floor. */
export function differencePercent(metric: Pick<MetricDefinition, 'kind'>, difference: number | null, base: number | null): number | null {
  if (difference === null || base === null) return null;
  const floor = metricUnitKinds[metric.kind].percentFloor;
  if (base === 0 || Math.abs(base) < floor) return null;
  return (100 * difference) / Math.abs(base);
}

// ---------------------------------------------------------------------------------------------------------------------
// The figures runs are compared on, and the part of the results they read.

/** What a comparison reads of a run's results: the totals, not the per-month tables (the run list gives these). */
export type ComparableResults = Pick<ScenarioResults, 'hours' | 'energy' | 'water' | 'peakMechanicalLoadKw' | 'excursions'> & {
  /** A hybrid hall's loops, their hours only. */
  loops?: { liquid: Pick<LoopResults, 'hours'>; air: Pick<LoopResults, 'hours'> };
  heatReuse?: Pick<HeatReuseResults, 'availableKwh' | 'erf'>;
};

export interface ComparedMetric extends MetricDefinition {
  /** The name where the figure stands alone (a CSV line) rather than indented under the one before it. */
  standalone: string;
  /** A count older engines did not make: a run without it shows NOT_COUNTED, not a blank. */
  notInOldRuns: boolean;
  /** Shown indented under the figure before it ("of which …"). */
  part: boolean;
  /** A hybrid hall's figure: compared only when a run is a hybrid (– for the single systems beside it). */
  hybridOnly: boolean;
  /** The fields of the results the value reads (dotted paths); the run list sends exactly these. */
  reads: readonly string[];
  value: (r: ComparableResults) => number | null;
}

type ComparedSpec = Partial<Pick<ComparedMetric, 'standalone' | 'notInOldRuns' | 'part' | 'hybridOnly' | 'label'>> &
  Pick<ComparedMetric, 'reads' | 'value'> & { key: MetricKey };

/** Litres over the file scaled to 8,760 hours of data, as the run's own annual total is. */
function perYearL(r: ComparableResults, litres: number | null): number | null {
  const dataHours = r.hours.total - r.hours.noData;
  return litres === null || dataHours <= 0 ? null : (litres * 8760) / dataHours;
}

const subsetSpec = (key: ModeSubsetKey): ComparedSpec => {
  const subset = modeSubsets.find((s) => s.key === key)!;
  return {
    key,
    label: subset.rowLabel,
    standalone: `${subset.figure} (part of ${modeLabels[subset.parent].toLowerCase()})`,
    notInOldRuns: true,
    part: true,
    reads: ['hours'],
    value: (r) => subsetHours(r.hours, key),
  };
};

const waterPartSpec = (key: 'humidificationPerYear' | 'evaporativeCoolingPerYear', part: WaterPartKey): ComparedSpec => ({
  key,
  label: waterParts.find((p) => p.key === part)!.rowLabel,
  notInOldRuns: true,
  part: true,
  reads: ['hours', 'water'],
  value: (r) => perYearL(r, waterPartL(r.water, part)),
});

const comparedSpecs: ComparedSpec[] = [
  { key: 'free', reads: ['hours'], value: (r) => r.hours.free },
  subsetSpec('humidified'),
  { key: 'adiabatic', reads: ['hours'], value: (r) => r.hours.adiabatic },
  { key: 'mechanical', reads: ['hours'], value: (r) => r.hours.mechanical },
  subsetSpec('partialMechanical'),
  { key: 'noData', reads: ['hours'], value: (r) => r.hours.noData },
  { key: 'excursions', reads: ['excursions'], value: (r) => r.excursions.hours },
  { key: 'ppue', reads: ['energy'], value: (r) => r.energy.partialPue },
  { key: 'coolingPerYear', reads: ['energy'], value: (r) => r.energy.annual?.coolingKwh ?? null },
  { key: 'compressorPerYear', reads: ['energy'], value: (r) => r.energy.annual?.compressorKwh ?? null },
  { key: 'peak', reads: ['peakMechanicalLoadKw'], value: (r) => r.peakMechanicalLoadKw },
  { key: 'waterPerYear', reads: ['water'], value: (r) => r.water.annualL },
  waterPartSpec('humidificationPerYear', 'humidificationL'),
  waterPartSpec('evaporativeCoolingPerYear', 'evaporativeCoolingL'),
  { key: 'wue', reads: ['water'], value: (r) => r.water.wueLPerKwh },
  { key: 'liquidFree', hybridOnly: true, reads: ['loops.liquid.hours'], value: (r) => r.loops?.liquid.hours.free ?? null },
  { key: 'liquidMechanical', hybridOnly: true, reads: ['loops.liquid.hours'], value: (r) => r.loops?.liquid.hours.mechanical ?? null },
  { key: 'airFree', hybridOnly: true, reads: ['loops.air.hours'], value: (r) => r.loops?.air.hours.free ?? null },
  { key: 'airMechanical', hybridOnly: true, reads: ['loops.air.hours'], value: (r) => r.loops?.air.hours.mechanical ?? null },
  { key: 'heatAvailable', hybridOnly: true, reads: ['heatReuse.availableKwh'], value: (r) => r.heatReuse?.availableKwh ?? null },
  { key: 'erf', hybridOnly: true, reads: ['heatReuse.erf'], value: (r) => r.heatReuse?.erf ?? null },
];

/**
 * The figures runs are compared on, in order (the compare page, its CSV, the comparison report and its CSV); energy
 * and water per 8,760 h so files of different lengths compare.
 */
export const comparedMetrics: readonly ComparedMetric[] = comparedSpecs.map(({ key, ...spec }) => {
  const definition: MetricDefinition = METRICS[key];
  const label = spec.label ?? definition.label;
  return {
    ...definition,
    label,
    standalone: spec.standalone ?? definition.label,
    notInOldRuns: spec.notInOldRuns ?? false,
    part: spec.part ?? false,
    hybridOnly: spec.hybridOnly ?? false,
    reads: spec.reads,
    value: spec.value,
  };
});

/**
 * The fields of a run's results a comparison reads, as dotted paths, none inside another ("hours", "loops.liquid.hours"):
 * what the run list sends, taken from the compared figures so the list and the comparison cannot drift apart.
 */
export const listedResultPaths: readonly string[] = (() => {
  const all = [...new Set(comparedMetrics.flatMap((m) => m.reads))];
  return all.filter((path) => !all.some((other) => path.startsWith(`${other}.`)));
})();

/** The part of a run's results a comparison reads (the run list sends only this): each listed path copied where present. */
export function comparableResults(r: ScenarioResults): ComparableResults {
  const out: Record<string, unknown> = {};
  for (const path of listedResultPaths) {
    const steps = path.split('.');
    let from: unknown = r;
    for (const step of steps) from = from === null || from === undefined ? undefined : (from as Record<string, unknown>)[step];
    if (from === undefined) continue;
    let to = out;
    for (const step of steps.slice(0, -1)) to = (to[step] ??= {}) as Record<string, unknown>;
    to[steps[steps.length - 1]] = from;
  }
  return out as ComparableResults;
}
