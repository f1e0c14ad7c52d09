/**
 * Specific enthalpy of moist air, kJ per kg of dry air, referenced to dry air at 0 °C and liquid
 * water at 0 °C: h = 1.006·t + W·(2501 + 1.86·t). Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 32.
 */
// @ts-nocheck

import { CP_DRY_AIR, CP_VAPOUR, LATENT_HEAT_0C } from './constants';
import { requireFinite, requireHumidityRatio, requireTemperatureC } from './validate';

/**
 * Specific enthalpy of moist air, kJ/kg dry air.
 * @param tC dry-bulb, °C; @param humidityRatio kg/kg
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 32.
 */
export function enthalpyKJPerKg(tC: number, humidityRatio: number): number {
  requireTemperatureC('tC', tC);
  requireHumidityRatio('humidityRatio', humidityRatio);
  return CP_DRY_AIR * tC + humidityRatio * (LATENT_HEAT_0C + CP_VAPOUR * tC);
}

/**
 * Dry-bulb, °C, of moist air with specific enthalpy enthalpyKJPerKg (kJ/kg dry air) and humidityRatio kg/kg.
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 32 solved for t.
 */
export function dryBulbFromEnthalpy(enthalpyKJPerKg: number, humidityRatio: number): number {
  requireFinite('enthalpyKJPerKg', enthalpyKJPerKg);
  requireHumidityRatio('humidityRatio', humidityRatio);
  return (enthalpyKJPerKg - LATENT_HEAT_0C * humidityRatio) / (CP_DRY_AIR + CP_VAPOUR * humidityRatio);
}

/**
 * Humidity ratio, kg/kg, of moist air at dry-bulb tC with specific enthalpy enthalpyKJPerKg (kJ/kg dry air).
 * Throws a RangeError when the enthalpy is below that of dry air at tC (negative moisture).
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 32 solved for W.
 */
export function humidityRatioFromEnthalpy(tC: number, enthalpyKJPerKg: number): number {
  requireTemperatureC('tC', tC);
  requireFinite('enthalpyKJPerKg', enthalpyKJPerKg);
  const w = (enthalpyKJPerKg - CP_DRY_AIR * tC) / (LATENT_HEAT_0C + CP_VAPOUR * tC);
  if (w < 0) {
    throw new RangeError(`enthalpyKJPerKg = ${enthalpyKJPerKg} kJ/kg is below the enthalpy of dry air at ${tC} °C`);
  }
  return w;
}
