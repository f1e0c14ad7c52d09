/**
 * Argument guards for the scalar API: each throws a RangeError that names the argument, its
 * unit, the accepted range and the value received, so a caller can tell which input was wrong.
 */
import { MAX_PRESSURE_PA, MAX_TEMPERATURE_C, MIN_PRESSURE_PA, MIN_TEMPERATURE_C } from './constants';

export function requireFinite(name: string, value: number): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new RangeError(`${name} must be a finite number (got ${String(value)})`);
  }
  return value;
}

export function requireInRange(name: string, value: number, min: number, max: number, unit: string): number {
  requireFinite(name, value);
  if (value < min || value > max) {
    throw new RangeError(`${name} must be between ${min} and ${max} ${unit} (got ${value})`);
  }
  return value;
}

export function requireTemperatureC(name: string, value: number): number {
  return requireInRange(name, value, MIN_TEMPERATURE_C, MAX_TEMPERATURE_C, '°C');
}

export function requirePressurePa(name: string, value: number): number {
  return requireInRange(name, value, MIN_PRESSURE_PA, MAX_PRESSURE_PA, 'Pa');
}

export function requireRhPct(name: string, value: number): number {
  return requireInRange(name, value, 0, 100, '%');
}

export function requireHumidityRatio(name: string, value: number): number {
  requireFinite(name, value);
  if (value < 0) throw new RangeError(`${name} must be ≥ 0 kg/kg (got ${value})`);
  return value;
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
