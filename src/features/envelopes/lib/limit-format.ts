import { formatQuantity } from '@/lib/quantity';
import type { UnitSystem } from '@/lib/unit-system';

/** A temperature limit in the person's units, or an RH limit as is, without the unit. */
export function formatLimit(kind: 'temperature' | 'percent', system: UnitSystem, value: number): string {
  return kind === 'temperature' ? formatQuantity('temperature', system, value, false) : String(value);
}
