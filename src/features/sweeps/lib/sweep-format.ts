import { fromDisplay, toDisplay } from '@/lib/quantity';
import { sweepQuantityKind as kindOf } from '@/lib/sweep-value';
import type { UnitSystem } from '@/lib/unit-system';
import { SWEEP_INPUTS, type SweepInputPath } from '../../../../shared/sweep';

/**
 * A typed range (from, to, step in the person's units) back to SI. A temperature's step is a
 * difference, so it converts as one (1 °F step = 5/9 K), not as a temperature.
 */
export function rangeToSi(path: SweepInputPath, system: UnitSystem, shown: { from: number; to: number; step: number }) {
  const q = SWEEP_INPUTS[path].quantity;
  const kind = kindOf[q];
  if (!kind) return shown;
  return {
    from: fromDisplay(kind, system, shown.from),
    to: fromDisplay(kind, system, shown.to),
    step: fromDisplay('temperatureDifference', system, shown.step),
  };
}

/** An SI range in the person's units, rounded for the form's fields. */
export function rangeFromSi(path: SweepInputPath, system: UnitSystem, si: { from: number; to: number; step: number }) {
  const q = SWEEP_INPUTS[path].quantity;
  const kind = kindOf[q];
  if (!kind) return si;
  const round = (v: number) => Math.round(v * 10) / 10;
  return {
    from: round(toDisplay(kind, system, si.from)),
    to: round(toDisplay(kind, system, si.to)),
    step: round(toDisplay('temperatureDifference', system, si.step)),
  };
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
