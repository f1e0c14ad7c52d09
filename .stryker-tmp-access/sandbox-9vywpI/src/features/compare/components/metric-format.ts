// @ts-nocheck
import { energyText, formatQuantity } from '@/lib/quantity';
import type { UnitSystem } from '@/lib/unit-system';
import type { Metric } from '../utils/compare-runs';

/** A compared figure as text, in the person's unit system; `signed` adds + to positive differences. */
export function formatMetric(format: Metric['format'], system: UnitSystem, value: number | null, signed = false): string {
  if (value === null || !Number.isFinite(value)) return '–';
  const sign = signed && value > 0 ? '+' : '';
  const n = (v: number, digits: number) => `${sign}${v.toLocaleString('en', { minimumFractionDigits: digits, maximumFractionDigits: digits })}`;
  switch (format) {
    case 'hours':
      return `${n(value, 0)} h`;
    case 'ratio':
      return n(value, 3);
    case 'mwh':
      return energyText(value, signed);
    case 'kw':
      return `${n(value, 0)} kW`;
    case 'wue':
      return `${n(value, 3)} L/kWh`;
    case 'water':
      return `${sign}${formatQuantity('water', system, value)}`;
  }
}
