/**
 * The run summary and the comparison table as rows for the CSV and JSON downloads. Values stay in SI
 * (the unit is a column of its own) and numbers stay numbers; text that people typed (scenario, file
 * and site names) goes through shared/csv.ts, which neutralises cells a spreadsheet would run as formulas.
 */
// @ts-nocheck

import { csvRow } from '../csv';
import { celsiusToFahrenheit, kelvinDifferenceToFahrenheit, metreToFoot } from '../units';
import { MONTH_SHORT } from '../calendar';
import { modeLabels } from '../modes';
import type { ModeHours } from '../scenario/results';
import {
  countsSubsets,
  hoursOfSpec,
  modeRowSpecs,
  notCountedNote,
  modeSubsets,
  subsetHours,
  waterPartL,
  waterParts,
  type ModeSubsetKey,
  type WaterPartKey,
} from './mode-subsets';
import type { LoopResults, ScenarioResults } from '../scenario/run';
import type { HeatReuseResults } from '../scenario/heat-reuse';
import { humidityReadingWords } from './humidity-reading';
import { PARTIAL_YEAR_MARK, WORST_YEAR_TIE_RULE, YEAR_METRIC_INFO, YEAR_METRICS, YEAR_STATISTIC_ROWS, yearStatistics } from '../scenario/year-statistics';
import { standardPeriod, utcOffsetLabel } from '../time-zone';
import { inputUnitSi, scenarioInputRows } from './inputs';
import { pressureSourceWords } from './pressure-source';
import { fanGroups } from './fan-groups';
import type { ReportRun } from './report-data';

export interface SummaryRow {
  section: string;
  figure: string;
  unit: string;
  value: number | string | null;
}

/** Fixed decimals as a number (not text), so a spreadsheet still reads it as a number. */
export function rounded(value: number | null | undefined, decimals: number): number | null {
  if (value === null || value === undefined || !Number.isFinite(value)) return null;
  const scale = 10 ** decimals;
  return Math.round(value * scale) / scale;
}

/** Hours per mode, each mode followed by the counts that are part of it ("of which …"); null where the run's engine did not count them. */
function modeRows(section: string, prefix: string, hours: ModeHours): SummaryRow[] {
  return modeRowSpecs.map((spec) => ({
    section,
    figure: `${prefix}${spec.kind === 'mode' ? modeLabels[spec.mode] : `${modeLabels[spec.subset.parent]}: ${spec.subset.rowLabel}`}`,
    unit: 'h',
    value: hoursOfSpec(hours, spec),
  }));
}

/** Every figure of one run: what it was, hours, excursions, energy, water, by month, by year, inputs. */
export function runSummaryRows(run: ReportRun): SummaryRow[] {
  const r: ScenarioResults = run.results;
  const e = r.energy;
  const w = r.water;
  const rows: SummaryRow[] = [
    { section: 'run', figure: 'Run', unit: '', value: run.id },
    { section: 'run', figure: 'Scenario', unit: '', value: run.scenario.name },
    { section: 'run', figure: 'System', unit: '', value: run.scenario.system.kind },
    { section: 'run', figure: 'Site', unit: '', value: run.site.name },
    { section: 'run', figure: 'Climate file', unit: '', value: run.climate.name },
    { section: 'run', figure: 'Climate file SHA-256', unit: '', value: run.climate.sha256 },
    { section: 'run', figure: 'Humidity in the file', unit: '', value: humidityReadingWords(run.climate.humidityOverIce) },
    { section: 'run', figure: 'Envelope', unit: '', value: run.envelope.label },
    { section: 'run', figure: 'Engine version', unit: '', value: run.engineVersion },
    {
      section: 'run',
      figure: 'Period (site standard time)',
      unit: '',
      value: standardPeriod(run.climate.firstHourMs, run.climate.lastHourMs, run.site.utcOffsetMinutes),
    },
    { section: 'run', figure: 'Site standard time', unit: '', value: utcOffsetLabel(run.site.utcOffsetMinutes) },
    { section: 'site', figure: 'Site elevation used', unit: 'm', value: r.site.elevationM },
    { section: 'site', figure: 'Air pressure used', unit: '', value: pressureSourceWords(r.site) },
    {
      section: 'site',
      figure: 'Hours with pressure from the standard atmosphere',
      unit: 'h',
      value: r.site.pressureSource === 'weather' ? r.site.pressureFilledHours : r.hours.total - r.hours.noData,
    },
    { section: 'site', figure: 'Envelope maximum dry-bulb after altitude derating', unit: '°C', value: rounded(r.envelope.dryBulbMaxC, 2) },
    ...(countsSubsets(r) ? [] : [{ section: 'run', figure: 'Not counted', unit: '', value: notCountedNote(run.engineVersion) }]),
    ...modeRows('hours', '', r.hours),
    { section: 'hours', figure: 'All hours', unit: 'h', value: r.hours.total },
    { section: 'hours', figure: 'Free cooling share', unit: '%', value: rounded(r.hours.total ? (100 * r.hours.free) / r.hours.total : null, 2) },
    { section: 'hours', figure: 'Longest run of mechanical hours', unit: 'h', value: r.longestMechanicalRunHours },
    { section: 'excursions', figure: 'Hours outside the envelope', unit: 'h', value: r.excursions.hours },
    { section: 'excursions', figure: 'of which too dry', unit: 'h', value: r.excursions.lowHumidityHours },
    { section: 'excursions', figure: 'Longest excursion', unit: 'h', value: r.excursions.longestRunHours },
    { section: 'energy', figure: 'IT energy', unit: 'kWh', value: rounded(e.itKwh, 1) },
    ...fanGroups(e, run.scenario.system).map((g) => ({ section: 'energy', figure: g.label, unit: 'kWh', value: rounded(g.kwh, 1) })),
    { section: 'energy', figure: 'Compressors', unit: 'kWh', value: rounded(e.compressorKwh, 1) },
    { section: 'energy', figure: 'Pumps', unit: 'kWh', value: rounded(e.pumpKwh, 1) },
    { section: 'energy', figure: 'Basin heaters', unit: 'kWh', value: rounded(e.basinHeaterKwh, 1) },
    { section: 'energy', figure: 'Cooling total', unit: 'kWh', value: rounded(e.coolingKwh, 1) },
    { section: 'energy', figure: 'Cooling total per 8,760 h', unit: 'kWh', value: rounded(e.annual?.coolingKwh, 1) },
    { section: 'energy', figure: 'Partial PUE (cooling)', unit: '', value: rounded(e.partialPue, 4) },
    { section: 'energy', figure: 'Peak mechanical load', unit: 'kW', value: rounded(r.peakMechanicalLoadKw, 1) },
    { section: 'energy', figure: 'Peak compressor power', unit: 'kW', value: rounded(r.peakCompressorKw, 1) },
    { section: 'water', figure: 'Evaporated', unit: 'L', value: rounded(w.evaporatedL, 1) },
    ...waterParts.map((p) => ({
      section: 'water',
      figure: p.ofEvaporated ? `Evaporated: ${p.rowLabel}` : p.figure,
      unit: 'L',
      value: rounded(waterPartL(w, p.key), 1),
    })),
    { section: 'water', figure: 'Blowdown', unit: 'L', value: rounded(w.blowdownL, 1) },
    { section: 'water', figure: 'Water total', unit: 'L', value: rounded(w.totalL, 1) },
    { section: 'water', figure: 'Water total per 8,760 h', unit: 'L', value: rounded(w.annualL, 1) },
    { section: 'water', figure: 'WUE', unit: 'L/kWh', value: rounded(w.wueLPerKwh, 4) },
  ];
  rows.push(...loopRows(r));
  for (const m of r.hoursByMonth) rows.push(...modeRows('by month', `${MONTH_SHORT[m.month - 1]}: `, m));
  // Years on the site's standard time (as the run page); a partial year is marked as the run page marks it.
  const partial = new Map(yearStatistics(r.hoursByYear).partialYears.map((p) => [p.year, p]));
  for (const y of r.hoursByYear) {
    const p = partial.get(y.year);
    rows.push({
      section: 'by year',
      figure: `${y.year}: calendar year`,
      unit: '',
      value: p ? `${PARTIAL_YEAR_MARK} (${p.hours} of ${p.calendarHours} h)` : 'full',
    });
    rows.push(...modeRows('by year', `${y.year}: `, y));
    rows.push({ section: 'by year', figure: `${y.year}: cooling energy`, unit: 'kWh', value: rounded(y.coolingKwh, 1) });
    rows.push({ section: 'by year', figure: `${y.year}: water`, unit: 'L', value: rounded(y.waterL, 1) });
  }
  rows.push(...yearStatisticRows(r));
  for (const input of scenarioInputRows(run.scenario)) {
    rows.push({
      section: 'inputs',
      figure: input.path,
      unit: inputUnitSi[input.kind],
      value: typeof input.value === 'boolean' ? String(input.value) : input.value,
    });
  }
  return rows;
}

/** A hybrid run's loops (hours, energy, water, facility-water temperatures) and heat reuse; none for a single system. */
function loopRows(r: ScenarioResults): SummaryRow[] {
  if (!r.loops) return [];
  const rows: SummaryRow[] = [];
  for (const [name, loop] of [
    ['liquid loop', r.loops.liquid],
    ['air loop', r.loops.air],
  ] as const) {
    rows.push({ section: name, figure: 'Share of IT heat', unit: '%', value: rounded(loop.share * 100, 2) });
    rows.push(...modeRows(name, '', loop.hours));
    rows.push({ section: name, figure: 'Cooling energy', unit: 'kWh', value: rounded(loop.energy.coolingKwh, 1) });
    rows.push({ section: name, figure: 'Compressors', unit: 'kWh', value: rounded(loop.energy.compressorKwh, 1) });
    rows.push({ section: name, figure: 'Water total', unit: 'L', value: rounded(loop.water.totalL, 1) });
    rows.push({ section: name, figure: 'Peak mechanical load', unit: 'kW', value: rounded(loop.peakMechanicalLoadKw, 1) });
  }
  const t = r.loops.liquid.temperatures;
  if (t) {
    rows.push({ section: 'liquid loop', figure: 'Facility-water supply', unit: '°C', value: t.facilitySupplyC });
    rows.push({ section: 'liquid loop', figure: 'Facility-water return', unit: '°C', value: t.facilityReturnC });
    rows.push({ section: 'liquid loop', figure: 'Coolant supply after the CDU', unit: '°C', value: t.coolantSupplyC });
  }
  const reuse = r.heatReuse;
  if (reuse) {
    rows.push(
      { section: 'heat reuse', figure: 'Threshold', unit: '°C', value: reuse.thresholdC },
      { section: 'heat reuse', figure: 'Hours available', unit: 'h', value: reuse.availableHours },
      { section: 'heat reuse', figure: 'Heat available', unit: 'kWh', value: rounded(reuse.availableKwh, 1) },
      ...reuse.availableKwhByMonth.map((kwh, m) => ({
        section: 'heat reuse',
        figure: `${MONTH_SHORT[m]}: heat available`,
        unit: 'kWh',
        value: rounded(kwh, 1),
      })),
      { section: 'heat reuse', figure: 'Heat reused', unit: 'kWh', value: rounded(reuse.reusedKwh, 1) },
      { section: 'heat reuse', figure: 'Heat-pump electricity', unit: 'kWh', value: rounded(reuse.heatPumpKwh, 1) },
      { section: 'heat reuse', figure: 'ERF (ISO/IEC 30134-6)', unit: '', value: rounded(reuse.erf, 4) },
      { section: 'heat reuse', figure: 'Note', unit: '', value: 'Heat available at the return, not a contract with a heat customer.' },
    );
  }
  return rows;
}

/** The year-to-year statistics the run page shows under its year table: each statistic of each quantity, its year, the worst year. */
function yearStatisticRows(r: ScenarioResults): SummaryRow[] {
  const stats = yearStatistics(r.hoursByYear);
  const section = 'year statistics';
  if (!stats.metrics) return [{ section, figure: 'Full calendar years', unit: '', value: 0 }];
  const rows: SummaryRow[] = [{ section, figure: 'Full calendar years', unit: '', value: stats.fullYears.length }];
  for (const statistic of YEAR_STATISTIC_ROWS) {
    for (const metric of YEAR_METRICS) {
      const info = YEAR_METRIC_INFO[metric];
      const cell = statistic.cell(stats.metrics[metric]);
      rows.push({ section, figure: `${statistic.label}: ${info.label}`, unit: info.unit, value: rounded(cell.value, info.unit === 'h' ? 0 : 1) });
      if ('year' in cell) rows.push({ section, figure: `${statistic.label}: ${info.label}, year`, unit: '', value: cell.year });
    }
  }
  if (stats.worst) {
    rows.push({ section, figure: 'Worst year', unit: '', value: stats.worst.year });
    rows.push({ section, figure: 'Worst year: mechanical', unit: 'h', value: stats.worst.mechanical });
    if (stats.worst.tiedWith.length)
      rows.push({ section, figure: 'Worst year: tied with', unit: '', value: `${stats.worst.tiedWith.join(' ')} (${WORST_YEAR_TIE_RULE})` });
  }
  return rows;
}

export type SummaryUnits = 'SI' | 'IP';

const US_GALLON_L = 3.785411784; // NIST SP 811 (2008), App. B: 1 US gallon = 3.785 411 784 L, exact.

/** How an SI unit of the summaries is written in IP; units not listed (h, %, kWh, kW, L/kWh) are the same in both. */
const ipUnits: Record<string, { unit: string; convert: (v: number) => number; decimals: number }> = {
  '°C': { unit: '°F', convert: celsiusToFahrenheit, decimals: 2 },
  K: { unit: '°F difference', convert: kelvinDifferenceToFahrenheit, decimals: 2 },
  m: { unit: 'ft', convert: metreToFoot, decimals: 1 },
  L: { unit: 'US gal', convert: (l) => l / US_GALLON_L, decimals: 1 },
};

/** A figure in the chosen units: SI as computed, or IP (°F, ft, US gal); WUE stays in L/kWh as ISO/IEC 30134-9 defines it. */
export function inUnits(unit: string, value: number | null, units: SummaryUnits): { unit: string; value: number | null } {
  const ip = units === 'IP' ? ipUnits[unit] : undefined;
  if (!ip) return { unit, value };
  return { unit: ip.unit, value: value === null ? null : rounded(ip.convert(value), ip.decimals) };
}

export function summaryRowsIn(rows: SummaryRow[], units: SummaryUnits): SummaryRow[] {
  if (units === 'SI') return rows;
  return rows.map((row) =>
    typeof row.value === 'string' ? { ...row, unit: inUnits(row.unit, null, units).unit } : { ...row, ...inUnits(row.unit, row.value, units) },
  );
}

export function summaryCsv(rows: SummaryRow[]): string {
  return `${[csvRow(['section', 'figure', 'unit', 'value']), ...rows.map((r) => csvRow([r.section, r.figure, r.unit, r.value]))].join('\n')}\n`;
}

/** What a comparison reads of a run's results: the totals, not the per-month tables (the run list gives these). */
export type ComparableResults = Pick<ScenarioResults, 'hours' | 'energy' | 'water' | 'peakMechanicalLoadKw' | 'excursions'> & {
  /** A hybrid hall's loops, their hours only. */
  loops?: { liquid: Pick<LoopResults, 'hours'>; air: Pick<LoopResults, 'hours'> };
  heatReuse?: Pick<HeatReuseResults, 'availableKwh' | 'erf'>;
};

/** The part of a run's results a comparison reads (the run list sends only this). */
export function comparableResults(r: ScenarioResults): ComparableResults {
  return {
    hours: r.hours,
    energy: r.energy,
    water: r.water,
    peakMechanicalLoadKw: r.peakMechanicalLoadKw,
    excursions: r.excursions,
    ...(r.loops ? { loops: { liquid: { hours: r.loops.liquid.hours }, air: { hours: r.loops.air.hours } } } : {}),
    ...(r.heatReuse ? { heatReuse: { availableKwh: r.heatReuse.availableKwh, erf: r.heatReuse.erf } } : {}),
  };
}

export interface ComparedFigure {
  key: string;
  label: string;
  unit: string;
  /** Which way is better; none for neutral figures. */
  better: 'higher' | 'lower' | 'none';
  decimals: number;
  /** A count older engines did not make: a run without it shows NOT_COUNTED, not a blank. */
  notInOldRuns?: boolean;
  /**
   * Below this baseline (in the figure's unit, by size) a difference is not given as a percentage: a percentage of a
   * near-zero base says nothing ("0.0 MWh → 1.0 MWh, +2356.3 %"). Defaults by unit: PERCENT_FLOOR.
   */
  percentFloor?: number;
  /** Shown indented under the figure before it ("of which …"); `standalone` names it where rows stand alone (CSV). */
  part?: boolean;
  /** A hybrid hall's figure: compared only when a run is a hybrid (– for the single systems beside it). */
  hybridOnly?: boolean;
  standalone?: string;
  value: (r: ComparableResults) => number | null;
}

/** Smallest baseline a percentage is given for, per unit: a day of hours, 1 MWh, 1 m³ of water, 10 kW; ratios always. */
export const PERCENT_FLOOR: Record<string, number> = { h: 24, kWh: 1000, L: 1000, kW: 10, '': 0, 'L/kWh': 0.01 };

/** A difference as a percentage of its baseline, or null where the baseline is missing or under the figure's floor. */
export function differencePercent(figure: Pick<ComparedFigure, 'unit' | 'percentFloor'>, difference: number | null, base: number | null): number | null {
  if (difference === null || base === null) return null;
  const floor = figure.percentFloor ?? PERCENT_FLOOR[figure.unit] ?? 0;
  if (base === 0 || Math.abs(base) < floor) return null;
  return (100 * difference) / Math.abs(base);
}

/** Litres over the file scaled to 8,760 hours of data, as the run's own annual total is. */
function perYearL(r: ComparableResults, litres: number | null): number | null {
  const dataHours = r.hours.total - r.hours.noData;
  return litres === null || dataHours <= 0 ? null : (litres * 8760) / dataHours;
}

const subsetFigure = (key: ModeSubsetKey, better: ComparedFigure['better']): ComparedFigure => {
  const subset = modeSubsets.find((s) => s.key === key)!;
  return {
    key,
    label: subset.rowLabel,
    standalone: `${subset.figure} (part of ${modeLabels[subset.parent].toLowerCase()})`,
    unit: 'h',
    better,
    decimals: 0,
    notInOldRuns: true,
    part: true,
    value: (r) => subsetHours(r.hours, key),
  };
};

const waterPartFigure = (key: WaterPartKey): ComparedFigure => {
  const part = waterParts.find((p) => p.key === key)!;
  return {
    key,
    label: part.rowLabel,
    standalone: `${part.figure} per 8,760 h`,
    unit: 'L',
    better: 'lower',
    decimals: 1,
    notInOldRuns: true,
    part: true,
    value: (r) => perYearL(r, waterPartL(r.water, key)),
  };
};

/** The figures runs are compared on (the compare page, its CSV and the comparison report); energy and water per 8,760 h so files of different lengths compare. */
export const comparedFigures: ComparedFigure[] = [
  { key: 'free', label: 'Free cooling', unit: 'h', better: 'higher', decimals: 0, value: (r) => r.hours.free },
  subsetFigure('humidified', 'none'),
  { key: 'adiabatic', label: 'Adiabatic assist', unit: 'h', better: 'none', decimals: 0, value: (r) => r.hours.adiabatic },
  { key: 'mechanical', label: 'Mechanical', unit: 'h', better: 'lower', decimals: 0, value: (r) => r.hours.mechanical },
  subsetFigure('partialMechanical', 'none'),
  { key: 'noData', label: 'No data', unit: 'h', better: 'none', decimals: 0, value: (r) => r.hours.noData },
  { key: 'excursions', label: 'Hours outside the envelope', unit: 'h', better: 'lower', decimals: 0, value: (r) => r.excursions.hours },
  { key: 'ppue', label: 'Partial PUE (cooling)', unit: '', better: 'lower', decimals: 4, value: (r) => r.energy.partialPue },
  { key: 'cooling', label: 'Cooling energy per 8,760 h', unit: 'kWh', better: 'lower', decimals: 1, value: (r) => r.energy.annual?.coolingKwh ?? null },
  {
    key: 'compressor',
    label: 'Compressor energy per 8,760 h',
    unit: 'kWh',
    better: 'lower',
    decimals: 1,
    value: (r) => r.energy.annual?.compressorKwh ?? null,
  },
  { key: 'peak', label: 'Peak mechanical load', unit: 'kW', better: 'lower', decimals: 1, value: (r) => r.peakMechanicalLoadKw },
  { key: 'water', label: 'Water per 8,760 h', unit: 'L', better: 'lower', decimals: 1, value: (r) => r.water.annualL },
  waterPartFigure('humidificationL'),
  waterPartFigure('evaporativeCoolingL'),
  { key: 'wue', label: 'WUE', unit: 'L/kWh', better: 'lower', decimals: 4, value: (r) => r.water.wueLPerKwh },
  {
    key: 'liquidFree',
    label: 'Liquid loop: free cooling',
    unit: 'h',
    better: 'higher',
    decimals: 0,
    hybridOnly: true,
    value: (r) => r.loops?.liquid.hours.free ?? null,
  },
  {
    key: 'liquidMechanical',
    label: 'Liquid loop: mechanical',
    unit: 'h',
    better: 'lower',
    decimals: 0,
    hybridOnly: true,
    value: (r) => r.loops?.liquid.hours.mechanical ?? null,
  },
  {
    key: 'airFree',
    label: 'Air loop: free cooling',
    unit: 'h',
    better: 'higher',
    decimals: 0,
    hybridOnly: true,
    value: (r) => r.loops?.air.hours.free ?? null,
  },
  {
    key: 'airMechanical',
    label: 'Air loop: mechanical',
    unit: 'h',
    better: 'lower',
    decimals: 0,
    hybridOnly: true,
    value: (r) => r.loops?.air.hours.mechanical ?? null,
  },
  {
    key: 'heatAvailable',
    label: 'Reusable heat available',
    unit: 'kWh',
    better: 'higher',
    decimals: 1,
    hybridOnly: true,
    value: (r) => r.heatReuse?.availableKwh ?? null,
  },
  { key: 'erf', label: 'ERF (ISO/IEC 30134-6)', unit: '', better: 'higher', decimals: 4, hybridOnly: true, value: (r) => r.heatReuse?.erf ?? null },
];

export interface ComparisonCell {
  runId: number;
  value: number | null;
  /** value − baseline; null for the baseline itself or when either is missing. */
  difference: number | null;
}

export interface ComparisonRow {
  key: string;
  figure: string;
  unit: string;
  better: ComparedFigure['better'];
  notInOldRuns: boolean;
  part: boolean;
  /** The figure's name where it stands alone (a CSV line). */
  standaloneFigure: string;
  cells: ComparisonCell[];
}

/** Each figure for each run (baseline first), with its difference from the baseline, rounded as downloaded. */
export function comparisonRows(runs: ReportRun[], baselineId: number, units: SummaryUnits = 'SI'): ComparisonRow[] {
  const baseline = runs.find((r) => r.id === baselineId) ?? runs[0];
  if (!baseline) return [];
  const anyHybrid = runs.some((r) => r.results.loops !== undefined);
  return comparedFigures
    .filter((f) => anyHybrid || !f.hybridOnly)
    .map((f) => {
      const base = f.value(baseline.results);
      // Differences of a linear unit convert by the same factor (water in L or US gal; no temperatures here).
      const shown = (v: number | null) => (inUnits(f.unit, v, units).unit === f.unit ? rounded(v, f.decimals) : inUnits(f.unit, v, units).value);
      return {
        key: f.key,
        figure: f.label,
        unit: inUnits(f.unit, null, units).unit,
        better: f.better,
        notInOldRuns: f.notInOldRuns ?? false,
        part: f.part ?? false,
        standaloneFigure: f.standalone ?? f.label,
        cells: runs.map((run) => {
          const value = f.value(run.results);
          const difference = run.id !== baseline.id && value !== null && base !== null ? value - base : null;
          return { runId: run.id, value: shown(value), difference: shown(difference) };
        }),
      };
    });
}

/** The comparison as CSV: one line per figure; each run's value, then its difference from the baseline. */
export function comparisonCsv(runs: ReportRun[], baselineId: number, units: SummaryUnits = 'SI'): string {
  const label = (run: ReportRun) => `run ${run.id}${run.id === baselineId ? ' (baseline)' : ''}: ${run.scenario.name} / ${run.climate.name}`;
  const header = ['figure', 'unit', ...runs.flatMap((run) => [label(run), `run ${run.id} difference`])];
  const lines = [csvRow(header), csvRow(['Engine version', '', ...runs.flatMap((run) => [run.engineVersion, ''])])];
  for (const row of comparisonRows(runs, baselineId, units)) {
    lines.push(csvRow([row.standaloneFigure, row.unit, ...row.cells.flatMap((c) => [c.value, c.difference])]));
  }
  return `${lines.join('\n')}\n`;
}
