import { fromDisplay, toDisplay, unitOf, type QuantityKind } from '@/lib/quantity';
import type { UnitSystem } from '@/lib/unit-system';

/**
 * How a scenario input is shown and typed. Physical quantities follow the SI/IP switch through
 * src/lib/quantity; the scenario's own dimensionless inputs have a fixed presentation
 * (fractions of IT load as %, a COP slope per K or per °F). Values in the form stay in SI.
 */
export type FieldUnit = QuantityKind | 'percent' | 'shareAsPercent' | 'ratio' | 'power' | 'perKelvin';

const FAHRENHEIT_PER_KELVIN = 1.8; // °F = 1.8·K for differences (NIST SP 811, §B.9), exact.

interface Local {
  unit: (system: UnitSystem) => string;
  fromSi: (v: number, system: UnitSystem) => number;
  toSi: (v: number, system: UnitSystem) => number;
}

const same = (v: number) => v;

const local: Record<Exclude<FieldUnit, QuantityKind>, Local> = {
  percent: { unit: () => '%', fromSi: same, toSi: same },
  shareAsPercent: { unit: () => '%', fromSi: (v) => v * 100, toSi: (v) => v / 100 },
  ratio: { unit: () => '', fromSi: same, toSi: same },
  // Data-centre loads are quoted in kW in both unit systems.
  power: { unit: () => 'kW', fromSi: same, toSi: same },
  // A change per kelvin is a change per 1.8 °F: divide by 1.8 going to IP.
  perKelvin: {
    unit: (s) => (s === 'IP' ? 'per °F' : 'per K'),
    fromSi: (v, s) => (s === 'IP' ? v / FAHRENHEIT_PER_KELVIN : v),
    toSi: (v, s) => (s === 'IP' ? v * FAHRENHEIT_PER_KELVIN : v),
  },
};

function isLocal(unit: FieldUnit): unit is Exclude<FieldUnit, QuantityKind> {
  return unit in local;
}

export function fieldUnitLabel(unit: FieldUnit, system: UnitSystem): string {
  return isLocal(unit) ? local[unit].unit(system) : unitOf(unit, system);
}

export function fieldToDisplay(unit: FieldUnit, system: UnitSystem, siValue: number): number {
  return isLocal(unit) ? local[unit].fromSi(siValue, system) : toDisplay(unit, system, siValue);
}

export function fieldFromDisplay(unit: FieldUnit, system: UnitSystem, shown: number): number {
  return isLocal(unit) ? local[unit].toSi(shown, system) : fromDisplay(unit, system, shown);
}

/** A value for an input box: at most `digits` decimals, no trailing zeros, no float dust (24.999999 → 25). */
export function inputText(unit: FieldUnit, system: UnitSystem, siValue: number | undefined, digits = 4): string {
  if (siValue === undefined || !Number.isFinite(siValue)) return '';
  const shown = fieldToDisplay(unit, system, siValue);
  return String(Number(shown.toFixed(digits)));
}

/** What a typed text means in SI; NaN for empty or unreadable text, so the schema reports the field. */
export function parseInputText(unit: FieldUnit, system: UnitSystem, text: string): number {
  const trimmed = text.trim().replace(',', '.');
  if (trimmed === '' || !/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(trimmed)) return Number.NaN;
  return fieldFromDisplay(unit, system, Number(trimmed));
}

/** "5 to 45 °C" in the chosen system; the ends rounded to what a person would type. */
export function rangeText(unit: FieldUnit, system: UnitSystem, minSi: number, maxSi: number): string {
  const ends = [minSi, maxSi].map((v) => fieldToDisplay(unit, system, v)).sort((a, b) => a - b);
  const label = fieldUnitLabel(unit, system);
  // Converted ends keep the precision a person would type: whole numbers from 100 up, then 0.1, then 0.001.
  const show = (v: number) => v.toLocaleString('en', { maximumFractionDigits: Math.abs(v) >= 100 ? 0 : Math.abs(v) >= 10 ? 1 : 3 });
  return `${show(ends[0])} to ${show(ends[1])}${label ? ` ${label}` : ''}`;
}
