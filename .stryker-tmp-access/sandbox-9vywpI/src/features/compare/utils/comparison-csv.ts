// @ts-nocheck
import { toDisplay, unitOf } from '@/lib/quantity';
import type { UnitSystem } from '@/lib/unit-system';
import { csvRow } from '../../../../shared/csv';
import type { ComparedRow, Metric } from './compare-runs';

/** Unit of a compared figure in the CSV, and the number in that unit. */
function csvUnit(format: Metric['format'], system: UnitSystem): { unit: string; value: (v: number) => number } {
  switch (format) {
    case 'hours':
      return { unit: 'h', value: (v) => v };
    case 'ratio':
      return { unit: '', value: (v) => Number(v.toFixed(4)) };
    case 'mwh':
      return { unit: 'MWh', value: (v) => Number((v / 1000).toFixed(3)) };
    case 'kw':
      return { unit: 'kW', value: (v) => Number(v.toFixed(1)) };
    case 'wue':
      return { unit: 'L/kWh', value: (v) => Number(v.toFixed(4)) };
    case 'water':
      return { unit: unitOf('water', system), value: (v) => Number(toDisplay('water', system, v).toFixed(2)) };
  }
}

/** The comparison as CSV: one line per figure, each run's value then its difference from the baseline. */
export function comparisonCsv(rows: ComparedRow[], runLabels: Map<number, string>, system: UnitSystem, engineVersions?: Map<number, string>): string {
  if (rows.length === 0) return '';
  const runs = rows[0].cells.map((c) => c.runId);
  const header = ['figure', 'unit', ...runs.flatMap((id) => [`${runLabels.get(id) ?? `run ${id}`}`, `${runLabels.get(id) ?? `run ${id}`} difference`])];
  const lines = [csvRow(header)];
  if (engineVersions) lines.push(csvRow(['Engine version', '', ...runs.flatMap((id) => [engineVersions.get(id) ?? null, null])]));
  for (const { metric, cells } of rows) {
    const { unit, value } = csvUnit(metric.format, system);
    const shown = (v: number | null) => (v === null || !Number.isFinite(v) ? null : value(v));
    lines.push(csvRow([metric.standalone ?? metric.label, unit, ...cells.flatMap((c) => [shown(c.value), shown(c.difference)])]));
  }
  return `${lines.join('\n')}\n`;
}
