/**
 * Unit conversion of climate-file columns to the SI units the series holds
 * (°C, %, kg/kg, Pa). Every conversion used here is affine, so a bulk loop applies
 * `si = value * scale + offset` with no call per element.
 */
// @ts-nocheck

import { FAHRENHEIT_AT_0C, FAHRENHEIT_PER_KELVIN, GRAINS_PER_POUND, KELVIN_AT_0C, PASCALS_PER_IN_HG, PASCALS_PER_PSI } from '../units';
import type { HumidityKind, PressureUnit, QuantityColumn, TemperatureUnit } from './types';

export interface AffineConversion {
  scale: number;
  offset: number;
}

const IDENTITY: AffineConversion = { scale: 1, offset: 0 };

/**
 * Temperature in the given unit to °C. °F: (t − 32) / 1.8, exact by definition (NIST SP 811 §B.9);
 * K: t − 273.15, exact. Factors from the shared units module.
 */
export function temperatureToCelsius(unit: TemperatureUnit): AffineConversion {
  if (unit === 'F') return { scale: 1 / FAHRENHEIT_PER_KELVIN, offset: -FAHRENHEIT_AT_0C / FAHRENHEIT_PER_KELVIN };
  if (unit === 'K') return { scale: 1, offset: -KELVIN_AT_0C };
  return IDENTITY;
}

/** Station pressure in the given unit to Pa (shared units module: conventional inHg, psi from lbf/in²; hPa = mbar = 100 Pa). */
export function pressureToPascal(unit: PressureUnit): AffineConversion {
  switch (unit) {
    case 'hPa':
      return { scale: 100, offset: 0 };
    case 'kPa':
      return { scale: 1000, offset: 0 };
    case 'inHg':
      return { scale: PASCALS_PER_IN_HG, offset: 0 };
    case 'psi':
      return { scale: PASCALS_PER_PSI, offset: 0 };
    default:
      return IDENTITY;
  }
}

/** The affine conversion from a column's unit to the SI unit the series stores for its quantity. */
export function conversionToSi(column: QuantityColumn): AffineConversion {
  switch (column.quantity) {
    case 'dry-bulb':
    case 'dew-point':
    case 'wet-bulb':
      return temperatureToCelsius(column.unit);
    case 'relative-humidity':
      return column.unit === 'fraction' ? { scale: 100, offset: 0 } : IDENTITY;
    case 'humidity-ratio':
      if (column.unit === 'g/kg') return { scale: 1e-3, offset: 0 };
      if (column.unit === 'gr/lb') return { scale: 1 / GRAINS_PER_POUND, offset: 0 };
      return IDENTITY;
    case 'pressure':
      return pressureToPascal(column.unit);
  }
}

/** The HumidityKind a humidity column becomes once converted to SI. */
export function humidityKindOf(quantity: 'relative-humidity' | 'dew-point' | 'wet-bulb' | 'humidity-ratio'): HumidityKind {
  switch (quantity) {
    case 'relative-humidity':
      return 'relative-humidity-pct';
    case 'dew-point':
      return 'dew-point-c';
    case 'wet-bulb':
      return 'wet-bulb-c';
    case 'humidity-ratio':
      return 'humidity-ratio-kgkg';
  }
}
