import { formatQuantity } from '@/lib/quantity';
import type { UnitSystem } from '@/lib/unit-system';
import type { InputRow } from '../../shared/report/inputs';

/** One scenario input as shown beside its field name, in the reader's unit system. */
export function formatInputValue(row: InputRow, system: UnitSystem): string {
  if (typeof row.value !== 'number') return String(row.value);
  switch (row.kind) {
    case 'plain':
      return String(row.value);
    case 'percent':
      return `${row.value} %`;
    case 'power':
      return `${row.value.toLocaleString('en')} kW`;
    default:
      return formatQuantity(row.kind, system, row.value);
  }
}
