// @ts-nocheck
import { formatQuantity, numberFormat, toDisplay, unitOf } from '@/lib/quantity';
import type { UnitSystem } from '@/lib/unit-system';
import { sweepMetricLabels, type SweepMetric } from '../../../../shared/sweep';

/** A metric's unit in the person's system: hours, none for pPUE, m³ or US gal, kW (kW in IP too, as on the run page). */
export function metricUnit(metric: SweepMetric, system: UnitSystem): string {
  if (metric === 'partialPue') return '';
  if (metric === 'waterL') return unitOf('water', system);
  if (metric === 'peakMechanicalLoadKw') return 'kW';
  return 'h';
}

/** "Water use (m³)", "Partial PUE (cooling)". */
export function metricTitle(metric: SweepMetric, system: UnitSystem): string {
  const unit = metricUnit(metric, system);
  return unit ? `${sweepMetricLabels[metric]} (${unit})` : sweepMetricLabels[metric];
}

/** An SI metric value as a number in the person's units. */
export function metricDisplay(metric: SweepMetric, system: UnitSystem, si: number): number {
  return metric === 'waterL' ? toDisplay('water', system, si) : si;
}

/** An SI metric value as text without its unit. */
export function formatMetric(metric: SweepMetric, system: UnitSystem, si: number | null): string {
  if (si === null || !Number.isFinite(si)) return '–';
  if (metric === 'partialPue') return si.toFixed(3);
  if (metric === 'waterL') return formatQuantity('water', system, si, false);
  return numberFormat(0).format(si);
}
