import { formatQuantity, type QuantityKind } from './quantity';
import type { UnitSystem } from './unit-system';
import { isSweepInputPath, presetLabel, SWEEP_INPUTS, type SweepInputPath, type SweepPointValues, type SweepQuantity, type SweepValue } from '../../shared/sweep';

/** The quantity kind a swept value's number follows on the SI/IP switch; null for plain numbers and presets. */
const kindOf: Record<SweepQuantity, QuantityKind | null> = {
  temperature: 'temperature',
  temperatureDifference: 'temperatureDifference',
  fraction: null,
  powerKw: null,
  preset: null,
};

/** A swept value as shown with its unit, in the person's units: "24.0 °C", "75.2 °F", "0.85", "1,500 kW", "Allowable A2 (2021)". */
export function sweepValueText(path: SweepInputPath, system: UnitSystem, value: SweepValue): string {
  if (typeof value === 'string') return presetLabel(value);
  const q = SWEEP_INPUTS[path].quantity;
  const kind = kindOf[q];
  if (kind) return formatQuantity(kind, system, value);
  if (q === 'fraction') return value.toLocaleString('en', { minimumFractionDigits: 2, maximumFractionDigits: 3 });
  return `${value.toLocaleString('en', { maximumFractionDigits: 1 })} kW`;
}

/** Each swept input of a point with its value, in sweep order (first axis first). Unknown inputs are skipped. */
export function sweepPointParts(point: SweepPointValues, system: UnitSystem): { path: SweepInputPath; label: string; short: string; value: string }[] {
  return Object.entries(point).flatMap(([path, value]) =>
    isSweepInputPath(path) && value !== undefined
      ? [{ path, label: SWEEP_INPUTS[path].label, short: SWEEP_INPUTS[path].short, value: sweepValueText(path, system, value) }]
      : [],
  );
}
