/** Specific volume and density of moist air (ideal-gas mixture). */
// @ts-nocheck

import { GAS_CONSTANT_DRY_AIR, KELVIN_OFFSET, VOLUME_VAPOUR_FACTOR } from './constants';
import { requireHumidityRatio, requirePressurePa, requireTemperatureC } from './validate';

/**
 * Specific volume of moist air, m³ per kg of dry air: v = R_da·T·(1 + 1.607858·W) / p.
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 26.
 */
export function specificVolumeM3PerKg(tC: number, humidityRatio: number, pressurePa: number): number {
  requireTemperatureC('tC', tC);
  requireHumidityRatio('humidityRatio', humidityRatio);
  requirePressurePa('pressurePa', pressurePa);
  return (GAS_CONSTANT_DRY_AIR * (tC + KELVIN_OFFSET) * (1 + VOLUME_VAPOUR_FACTOR * humidityRatio)) / pressurePa;
}

/**
 * Density of moist air, kg of moist air per m³: ρ = (1 + W) / v.
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 11.
 */
export function moistAirDensityKgPerM3(tC: number, humidityRatio: number, pressurePa: number): number {
  return (1 + humidityRatio) / specificVolumeM3PerKg(tC, humidityRatio, pressurePa);
}
