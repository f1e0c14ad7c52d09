import { METRICS, metricUnit, type MetricDefinition, type MetricKey } from '../../shared/metrics';
import { energyText, formatQuantity, numberFormat, toDisplay, unitOf } from './quantity';
import type { UnitSystem } from './unit-system';

type Shown = Pick<MetricDefinition, 'kind'>;

/** Decimals a screen gives per kind of figure (downloads give the metric's own decimals). */
const shownDecimals: Partial<Record<MetricDefinition['kind'], number>> = { hours: 0, percent: 1, ratio: 3, power: 0, waterPerEnergy: 3 };

/**
 * The unit a screen writes a figure in: the metric list's unit, except water, which screens give in m³ (SI) or US gal,
 * and energy, which energyText scales (MWh from 1 MWh up, kWh below).
 */
export function shownUnit(metric: Shown, system: UnitSystem): string {
  if (metric.kind === 'water') return unitOf('water', system);
  if (metric.kind === 'temperature') return unitOf('temperature', system);
  return metricUnit(metric, system);
}

/** An SI value as a number in the screen's unit (for charts). */
export function shownNumber(metric: Shown, system: UnitSystem, si: number): number {
  if (metric.kind === 'water') return toDisplay('water', system, si);
  if (metric.kind === 'temperature') return toDisplay('temperature', system, si);
  return si;
}

/** "Water total (m³)", "Partial PUE (cooling)". */
export function metricTitle(metric: Shown & Pick<MetricDefinition, 'label'>, system: UnitSystem): string {
  const unit = shownUnit(metric, system);
  return unit ? `${metric.label} (${unit})` : metric.label;
}

/**
 * A figure as text in the person's unit system, from the metric list: hours whole, ratios to 3 decimals, energy as
 * energyText, water in m³ or US gal. `signed` writes + before a positive difference, and no sign on one that rounds to
 * nothing; `withUnit: false` leaves the unit to a column head (energy always carries its unit, as its scale varies).
 */
export function formatMetric(
  metric: Shown | MetricKey,
  system: UnitSystem,
  value: number | null | undefined,
  options: { signed?: boolean; withUnit?: boolean } = {},
): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '–';
  const m: Shown = typeof metric === 'string' ? METRICS[metric] : metric;
  const { signed = false, withUnit = true } = options;
  // A temperature converts with an offset, so it is written as it is (a compared figure is never one).
  if (m.kind === 'temperature') return formatQuantity('temperature', system, value, withUnit);
  let text: string;
  if (m.kind === 'energy') text = energyText(Math.abs(value));
  else if (m.kind === 'water') text = formatQuantity('water', system, Math.abs(value), withUnit);
  else {
    const unit = shownUnit(m, system);
    const number = numberFormat(shownDecimals[m.kind] ?? 0).format(Math.abs(value));
    text = withUnit && unit ? `${number} ${unit}` : number;
  }
  if (!/[1-9]/.test(/^[\d,.]*/.exec(text)![0])) return text;
  return value < 0 ? `-${text}` : signed ? `+${text}` : text;
}
