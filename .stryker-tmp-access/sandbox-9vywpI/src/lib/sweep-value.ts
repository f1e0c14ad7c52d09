// @ts-nocheck
import { formatQuantity, unitOf, type QuantityKind } from './quantity';
import type { UnitSystem } from './unit-system';
import {
  baseNameOfPoint,
  isSweepInputPath,
  presetLabel,
  SWEEP_INPUTS,
  type SweepInputPath,
  type SweepPointValues,
  type SweepQuantity,
  type SweepValue,
} from '../../shared/sweep';

/** The quantity kind a swept value's number follows on the SI/IP switch; null for plain numbers and presets. */
export const sweepQuantityKind: Record<SweepQuantity, QuantityKind | null> = {
  temperature: 'temperature',
  temperatureDifference: 'temperatureDifference',
  fraction: null,
  powerKw: null,
  preset: null,
};

/** The unit a swept input is typed and shown in ('' for effectiveness and presets). kW stays kW in IP. */
export function sweepUnit(path: SweepInputPath, system: UnitSystem): string {
  const q = SWEEP_INPUTS[path].quantity;
  const kind = sweepQuantityKind[q];
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
  const kind = sweepQuantityKind[q];
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

/** Each swept input of a point with its value, in sweep order (first axis first). Unknown inputs are skipped. */
export function sweepPointParts(point: SweepPointValues, system: UnitSystem): { path: SweepInputPath; label: string; short: string; value: string }[] {
  return Object.entries(point).flatMap(([path, value]) =>
    isSweepInputPath(path) && value !== undefined
      ? [{ path, label: SWEEP_INPUTS[path].label, short: SWEEP_INPUTS[path].short, value: formatSweepValueWithUnit(path, system, value) }]
      : [],
  );
}

/**
 * A run's name as shown: a sweep point's stored name ends with its values in SI ("… · supply air 24 °C"), so that
 * ending is written again in the person's units ("… · supply air 75.2 °F"). Other runs keep their name.
 */
export function runDisplayName(name: string, sweepPoint: SweepPointValues | null, system: UnitSystem): string {
  if (!sweepPoint) return name;
  const parts = sweepPointParts(sweepPoint, system);
  return parts.length ? `${baseNameOfPoint(name, sweepPoint)} · ${parts.map((p) => `${p.short} ${p.value}`).join(', ')}` : name;
}
