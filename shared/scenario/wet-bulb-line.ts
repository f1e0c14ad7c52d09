/**
 * Points on a line of constant thermodynamic wet-bulb: the path of air through an adiabatic
 * (evaporative) stage. The scenario engine needs the humidity ratio where that line reaches a
 * given dry-bulb, once per hour, so this is a kernel without checks: NaN in gives NaN out.
 */

/**
 * Humidity ratio, kg/kg, of air at dry-bulb tC on the line of wet-bulb wetBulbC, given the
 * saturation humidity ratio at the wet-bulb, saturatedAtWetBulb (kg/kg, at the hour's pressure).
 * tC ≥ wetBulbC. Wet-bulb at or above 0 °C: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 33;
 * below 0 °C (ice): eq. 35.
 */
export function humidityRatioOnWetBulbLine(tC: number, wetBulbC: number, saturatedAtWetBulb: number): number {
  if (wetBulbC >= 0) {
    return ((2501 - 2.326 * wetBulbC) * saturatedAtWetBulb - 1.006 * (tC - wetBulbC)) / (2501 + 1.86 * tC - 4.186 * wetBulbC);
  }
  return ((2830 - 0.24 * wetBulbC) * saturatedAtWetBulb - 1.006 * (tC - wetBulbC)) / (2830 + 1.86 * tC - 2.1 * wetBulbC);
}

/** Humidity ratio of saturated air, kg/kg, from its vapour pressure (Pa) and total pressure (Pa): ASHRAE 2017 ch. 1 eq. 23. */
export function saturatedHumidityRatio(saturationPressurePa: number, pressurePa: number): number {
  return (0.621945 * saturationPressurePa) / (pressurePa - saturationPressurePa);
}
