/** Barometric pressure of the standard atmosphere. */
// @ts-nocheck

import { STANDARD_SEA_LEVEL_PRESSURE_PA } from './constants';
import { requireInRange } from './validate';

/**
 * Barometric pressure, Pa, of the standard atmosphere at an elevation.
 * p = 101.325 kPa · (1 − 2.25577e−5 · Z)^5.2559
 * @param elevationM elevation above sea level, m, −500…11 000 (the troposphere the equation covers)
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 3.
 */
export function standardPressurePa(elevationM: number): number {
  requireInRange('elevationM', elevationM, -500, 11_000, 'm');
  return STANDARD_SEA_LEVEL_PRESSURE_PA * Math.pow(1 - 2.25577e-5 * elevationM, 5.2559);
}

/**
 * Elevation, m, at which the standard atmosphere has pressure pressurePa: the inverse of
 * {@link standardPressurePa}. Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 3, solved for Z.
 */
export function standardElevationM(pressurePa: number): number {
  requireInRange('pressurePa', pressurePa, 22_000, 108_000, 'Pa');
  return (1 - Math.pow(pressurePa / STANDARD_SEA_LEVEL_PRESSURE_PA, 1 / 5.2559)) / 2.25577e-5;
}
