import { formatQuantity, fromDisplay, toDisplay, unitOf, type QuantityKind } from '@/lib/quantity';
import type { UnitSystem } from '@/lib/unit-system';
import { presetLabel, SWEEP_INPUTS, type SweepInputPath, type SweepQuantity, type SweepValue } from '../../../../shared/sweep';

/** The quantity kind a swept value's number follows on the SI/IP switch; null for plain numbers and presets. */
const kindOf: Record<SweepQuantity, QuantityKind | null> = {
  temperature: 'temperature',
  temperatureDifference: 'temperatureDifference',
  fraction: null,
  powerKw: null,
  preset: null,
};

/** The unit a swept input is typed and shown in ('' for effectiveness and presets). kW stays kW in IP. */
export function sweepUnit(path: SweepInputPath, system: UnitSystem): string {
  const q = SWEEP_INPUTS[path].quantity;
  const kind = kindOf[q];
  return kind ? unitOf(kind, system) : q === 'powerKw' ? 'kW' : '';
}

/** "Supply air setpoint (°F)": an axis or column title. */
export function sweepAxisTitle(path: SweepInputPath, system: UnitSystem): string {
  const unit = sweepUnit(path, system);
  return unit ? `${SWEEP_INPUTS[path].label} (${unit})` : SWEEP_INPUTS[path].label;
}

/** A swept value as shown, without its unit: "75.2", "0.85", "1,500", "Allowable A2 (2021)". */
export function formatSweepValue(path: SweepInputPath, system: UnitSystem, value: SweepValue): string {
  if (typeof value === 'string') return presetLabel(value);
  const q = SWEEP_INPUTS[path].quantity;
  const kind = kindOf[q];
  if (kind) return formatQuantity(kind, system, value, false);
  if (q === 'fraction') return value.toLocaleString('en', { minimumFractionDigits: 2, maximumFractionDigits: 3 });
  return value.toLocaleString('en', { maximumFractionDigits: 1 });
}

/** The same with its unit: "24.0 °C". */
export function formatSweepValueWithUnit(path: SweepInputPath, system: UnitSystem, value: SweepValue): string {
  const unit = sweepUnit(path, system);
  const text = formatSweepValue(path, system, value);
  return unit && typeof value === 'number' ? `${text} ${unit}` : text;
}

/**
 * A typed range (from, to, step in the person's units) back to SI. A temperature's step is a
 * difference, so it converts as one (1 °F step = 5/9 K), not as a temperature.
 */
export function rangeToSi(path: SweepInputPath, system: UnitSystem, shown: { from: number; to: number; step: number }) {
  const q = SWEEP_INPUTS[path].quantity;
  const kind = kindOf[q];
  if (!kind) return shown;
  return { from: fromDisplay(kind, system, shown.from), to: fromDisplay(kind, system, shown.to), step: fromDisplay('temperatureDifference', system, shown.step) };
}

/** An SI range in the person's units, rounded for the form's fields. */
export function rangeFromSi(path: SweepInputPath, system: UnitSystem, si: { from: number; to: number; step: number }) {
  const q = SWEEP_INPUTS[path].quantity;
  const kind = kindOf[q];
  if (!kind) return si;
  const round = (v: number) => Math.round(v * 10) / 10;
  return { from: round(toDisplay(kind, system, si.from)), to: round(toDisplay(kind, system, si.to)), step: round(toDisplay('temperatureDifference', system, si.step)) };
}

/** A numeric swept value as a number in the person's units, for a chart's linear axis. */
export function displayNumber(path: SweepInputPath, system: UnitSystem, value: number): number {
  const kind = kindOf[SWEEP_INPUTS[path].quantity];
  return kind ? toDisplay(kind, system, value) : value;
}

/**
 * A preset's label short enough for a chart tick: "Allowable A2 (2021)" → "A2 ’21",
 * "Recommended, 50 % RH (2021)" → "Rec. 50 % RH ’21". Tables keep the full label.
 */
export function compactPresetLabel(label: string): string {
  return label
    .replace(/^Allowable /, '')
    .replace(/^Recommended,? ?/, 'Rec. ')
    .replace(/, high-density/, '')
    .replace(/\s*\((\d{2})(\d{2})\)$/, ' ’$2')
    .replace(/\s+/g, ' ')
    .trim();
}
