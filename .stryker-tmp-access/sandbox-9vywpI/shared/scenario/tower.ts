/**
 * Cooling-tower water: evaporation that follows the weather, drift, and the freeze-protection hours.
 *
 * Evaporation: the air leaves the tower saturated (Merkel's assumption, ASHRAE Handbook—HVAC Systems and
 * Equipment, cooling-tower chapter — recalled from memory). With a water-to-air mass-flow ratio L/G and a range
 * R the air gains Δh = (L/G)·c_w·R per kg (energy balance on the water); it leaves at the saturated state of
 * enthalpy h_in + Δh, and the water evaporated per kg of air is W_s(t_out) − W_in. So the evaporated share of
 * the heat rejected varies with the air's state: high in warm, humid hours, low in cold, dry ones.
 */
// @ts-nocheck

import { enthalpyKJPerKg, saturationHumidityRatio } from '../psychrometrics';
import { saturationTemperatureFromEnthalpy } from '../psychrometrics/saturated-enthalpy';
import { CP_WATER_KJ_PER_KG_K } from './air';

/** Tower range, K (10 °F), the condenser-water temperature drop across the tower at design: common practice. */
export const TOWER_RANGE_K = 5.6;
/** Water-to-air mass-flow ratio L/G of the tower: 1.2 is common practice for counter-flow towers (recalled from memory). */
export const TOWER_WATER_TO_AIR_RATIO = 1.2;
/** Enthalpy gained per kg of tower air, kJ/kg: (L/G) · c_w · R. */
export const TOWER_AIR_ENTHALPY_RISE_KJ_PER_KG = TOWER_WATER_TO_AIR_RATIO * CP_WATER_KJ_PER_KG_K * TOWER_RANGE_K;

/** Circulating water per kW rejected, kg/h: 3600 / (c_w · R). */
export const TOWER_CIRCULATING_KG_PER_H_PER_KW = 3600 / (CP_WATER_KJ_PER_KG_K * TOWER_RANGE_K);

/**
 * Water evaporated per kg of tower air, kg/kg, for air entering at (tC, humidityRatio) and gaining
 * enthalpyRiseKJPerKg, leaving saturated: W_s(t_s(h_in + Δh)) − W_in, never below 0. Exact (Newton on the
 * saturation curve); the run uses SaturatedExit's table of the same relation.
 */
export function towerEvaporationPerKgAir(
  tC: number,
  humidityRatio: number,
  pressurePa: number,
  enthalpyRiseKJPerKg = TOWER_AIR_ENTHALPY_RISE_KJ_PER_KG,
): number {
  const hOut = enthalpyKJPerKg(tC, humidityRatio) + enthalpyRiseKJPerKg;
  const tOut = saturationTemperatureFromEnthalpy(hOut, pressurePa);
  const gain = saturationHumidityRatio(tOut, pressurePa) - humidityRatio;
  return gain > 0 ? gain : 0;
}

/** Enthalpy step of the lookup table, kJ/kg; linear interpolation over it is within 0.1 % of the exact W_s. */
const TABLE_STEP_KJ_PER_KG = 0.25;
const TABLE_MIN_KJ_PER_KG = -40;
const TABLE_MAX_KJ_PER_KG = 400;

/**
 * Saturated humidity ratio as a function of saturated enthalpy at one pressure, as a table, for the hourly loop
 * (no root finding per hour). Outside −40…400 kJ/kg the end values hold.
 */
export class SaturatedExit {
  private readonly table: Float64Array;
  constructor(pressurePa: number) {
    const size = Math.round((TABLE_MAX_KJ_PER_KG - TABLE_MIN_KJ_PER_KG) / TABLE_STEP_KJ_PER_KG) + 1;
    this.table = new Float64Array(size);
    for (let k = 0; k < size; k++) {
      const h = TABLE_MIN_KJ_PER_KG + k * TABLE_STEP_KJ_PER_KG;
      const t = saturationTemperatureFromEnthalpy(h, pressurePa);
      this.table[k] = t === t ? saturationHumidityRatio(t, pressurePa) : Number.NaN;
    }
  }

  /** W_s, kg/kg, of saturated air of enthalpy h, kJ/kg. */
  humidityRatioAt(h: number): number {
    const x = (h - TABLE_MIN_KJ_PER_KG) / TABLE_STEP_KJ_PER_KG;
    const last = this.table.length - 1;
    if (!(x > 0)) return this.table[0];
    if (x >= last) return this.table[last];
    const k = Math.floor(x);
    const f = x - k;
    return this.table[k] + f * (this.table[k + 1] - this.table[k]);
  }
}
