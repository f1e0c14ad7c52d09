/**
 * The run summary and the comparison table as rows for the CSV and JSON downloads. Values stay in SI
 * (the unit is a column of its own) and numbers stay numbers; text that people typed (scenario, file
 * and site names) goes through shared/csv.ts, which neutralises cells a spreadsheet would run as formulas.
 */
import { csvRow } from '../csv';
import { celsiusToFahrenheit, kelvinDifferenceToFahrenheit, metreToFoot } from '../units';
import { MONTH_SHORT } from '../calendar';
import { modeLabels } from '../modes';
import type { ModeHours } from '../scenario/results';
import { countsSubsets, hoursOfSpec, modeRowSpecs, notCountedNote, waterPartL, waterParts } from './mode-subsets';
import type { ScenarioResults } from '../scenario/run';
import { METRICS, metricUnit, metricUnitKinds, rounded, YEAR_METRIC_FIGURES, type MetricKey, type MetricUnits } from '../metrics';
import { humidityReadingWords } from './humidity-reading';
import { PARTIAL_YEAR_MARK, WORST_YEAR_TIE_RULE, YEAR_METRICS, YEAR_STATISTIC_ROWS, yearStatistics } from '../scenario/year-statistics';
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

export { rounded };

/** A figure of the metric list as a summary row: its label, SI unit and decimals from shared/metrics.ts. */
function metricRow(section: string, key: MetricKey, value: number | null | undefined, label: string = METRICS[key].label): SummaryRow {
  const metric = METRICS[key];
  return { section, figure: label, unit: metricUnitKinds[metric.kind].si, value: rounded(value, metric.decimals) };
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
    metricRow('hours', 'totalHours', r.hours.total),
    metricRow('hours', 'freeShare', r.hours.total ? (100 * r.hours.free) / r.hours.total : null),
    metricRow('hours', 'longestMechanicalRun', r.longestMechanicalRunHours),
    metricRow('excursions', 'excursions', r.excursions.hours),
    metricRow('excursions', 'tooDry', r.excursions.lowHumidityHours),
    metricRow('excursions', 'longestExcursion', r.excursions.longestRunHours),
    metricRow('energy', 'it', e.itKwh),
    ...fanGroups(e, run.scenario.system).map((g) => metricRow('energy', g.key, g.kwh, g.label)),
    metricRow('energy', 'compressor', e.compressorKwh),
    metricRow('energy', 'pumps', e.pumpKwh),
    metricRow('energy', 'basinHeaters', e.basinHeaterKwh),
    metricRow('energy', 'cooling', e.coolingKwh),
    metricRow('energy', 'coolingPerYear', e.annual?.coolingKwh),
    metricRow('energy', 'ppue', e.partialPue),
    metricRow('energy', 'peak', r.peakMechanicalLoadKw),
    metricRow('energy', 'peakCompressor', r.peakCompressorKw),
    metricRow('water', 'evaporated', w.evaporatedL),
    ...waterParts.map((p) => metricRow('water', p.key, waterPartL(w, p.key), p.ofEvaporated ? `Evaporated: ${p.rowLabel}` : p.figure)),
    metricRow('water', 'blowdown', w.blowdownL),
    metricRow('water', 'waterTotal', w.totalL),
    metricRow('water', 'waterPerYear', w.annualL),
    metricRow('water', 'wue', w.wueLPerKwh),
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
    rows.push(metricRow('by year', 'cooling', y.coolingKwh, `${y.year}: cooling energy`));
    rows.push(metricRow('by year', 'waterTotal', y.waterL, `${y.year}: water`));
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
    rows.push(metricRow(name, 'loopShare', loop.share * 100));
    rows.push(...modeRows(name, '', loop.hours));
    rows.push(metricRow(name, 'cooling', loop.energy.coolingKwh));
    rows.push(metricRow(name, 'compressor', loop.energy.compressorKwh));
    rows.push(metricRow(name, 'waterTotal', loop.water.totalL));
    rows.push(metricRow(name, 'peak', loop.peakMechanicalLoadKw));
  }
  const t = r.loops.liquid.temperatures;
  if (t) {
    rows.push(metricRow('liquid loop', 'facilitySupply', t.facilitySupplyC));
    rows.push(metricRow('liquid loop', 'facilityReturn', t.facilityReturnC));
    rows.push(metricRow('liquid loop', 'coolantSupply', t.coolantSupplyC));
  }
  const reuse = r.heatReuse;
  if (reuse) {
    rows.push(
      metricRow('heat reuse', 'reuseThreshold', reuse.thresholdC),
      metricRow('heat reuse', 'heatHours', reuse.availableHours),
      metricRow('heat reuse', 'heatAvailable', reuse.availableKwh, 'Heat available'),
      ...reuse.availableKwhByMonth.map((kwh, m) => metricRow('heat reuse', 'heatAvailable', kwh, `${MONTH_SHORT[m]}: heat available`)),
      metricRow('heat reuse', 'heatReused', reuse.reusedKwh),
      metricRow('heat reuse', 'heatPump', reuse.heatPumpKwh),
      metricRow('heat reuse', 'erf', reuse.erf),
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
      const figure = METRICS[YEAR_METRIC_FIGURES[metric]];
      const cell = statistic.cell(stats.metrics[metric]);
      rows.push({ section, figure: `${statistic.label}: ${figure.label}`, unit: metricUnit(figure, 'SI'), value: rounded(cell.value, figure.decimals) });
      if ('year' in cell) rows.push({ section, figure: `${statistic.label}: ${figure.label}, year`, unit: '', value: cell.year });
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

/** The units a summary or comparison is written in (shared/metrics.ts). */
export type SummaryUnits = MetricUnits;

/** How an SI unit of the summaries is written in IP; units not listed (h, %, kWh, kW, L/kWh) are the same in both. */
const ipUnits: Record<string, { unit: string; convert: (v: number) => number; decimals: number }> = {
  '°C': { unit: '°F', convert: celsiusToFahrenheit, decimals: 2 },
  K: { unit: '°F difference', convert: kelvinDifferenceToFahrenheit, decimals: 2 },
  m: { unit: 'ft', convert: metreToFoot, decimals: 1 },
  L: { unit: metricUnitKinds.water.ip, convert: metricUnitKinds.water.toIp, decimals: METRICS.waterTotal.decimals },
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
