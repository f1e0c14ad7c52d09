/**
 * Argument guards for the scalar API: each throws a RangeError that names the argument, its
 * unit, the accepted range and the value received, so a caller can tell which input was wrong.
 */
// @ts-nocheck

import { MAX_PRESSURE_PA, MAX_TEMPERATURE_C, MIN_PRESSURE_PA, MIN_TEMPERATURE_C } from './constants';

/** Returns value if it is a finite number; otherwise throws a RangeError naming it. */
export function requireFinite(name: string, value: number): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new RangeError(`${name} must be a finite number (got ${String(value)})`);
  }
  return value;
}

/** Returns value if it lies in [min, max] (unit for the message); otherwise throws a RangeError naming it. */
export function requireInRange(name: string, value: number, min: number, max: number, unit: string): number {
  requireFinite(name, value);
  if (value < min || value > max) {
    throw new RangeError(`${name} must be between ${min} and ${max} ${unit} (got ${value})`);
  }
  return value;
}

/** A temperature, °C, within the −100…200 °C range of the Hyland–Wexler equations. */
export function requireTemperatureC(name: string, value: number): number {
  return requireInRange(name, value, MIN_TEMPERATURE_C, MAX_TEMPERATURE_C, '°C');
}

/** A barometric pressure, Pa, within 10…120 kPa. */
export function requirePressurePa(name: string, value: number): number {
  return requireInRange(name, value, MIN_PRESSURE_PA, MAX_PRESSURE_PA, 'Pa');
}

/** A relative humidity, %, within 0…100. */
export function requireRhPct(name: string, value: number): number {
  return requireInRange(name, value, 0, 100, '%');
}

/** A finite number ≥ 0 (unit for the message). */
export function requireNonNegative(name: string, value: number, unit = ''): number {
  requireFinite(name, value);
  if (value < 0) throw new RangeError(`${name} must be ≥ 0${unit ? ` ${unit}` : ''} (got ${value})`);
  return value;
}

/** A humidity ratio, kg/kg, finite and ≥ 0. */
export function requireHumidityRatio(name: string, value: number): number {
  return requireNonNegative(name, value, 'kg/kg');
}

/** True when a bulk element lies in the engine's pressure range (NaN fails). */
export function isPressureOk(pressurePa: number): boolean {
  return pressurePa >= MIN_PRESSURE_PA && pressurePa <= MAX_PRESSURE_PA;
}

/** True when a bulk element lies in the engine's temperature range (NaN fails). */
export function isTemperatureOk(tC: number): boolean {
  return tC >= MIN_TEMPERATURE_C && tC <= MAX_TEMPERATURE_C;
}

/**
 * Relative slack allowed above saturation before a state counts as supersaturated: round-off
 * from a round trip (for example dew point → W → RH) must not turn 100 % into an error.
 */
export const SATURATION_SLACK = 1e-9;

/** RangeError for a request whose vapour content exceeds saturation (fog or condensate, not moist air). */
export function supersaturatedError(name: string, value: number, detail: string): RangeError {
  return new RangeError(`${name} = ${value} is supersaturated: ${detail}`);
}
