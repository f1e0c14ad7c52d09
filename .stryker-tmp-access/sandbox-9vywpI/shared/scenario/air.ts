/** Air and water constants of the energy model, with their sources. */
// @ts-nocheck


/** Specific heat of dry air, kJ/(kg·K): ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 32. */
export const CP_AIR_KJ_PER_KG_K = 1.006;

/** Specific heat of liquid water, kJ/(kg·K): ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 32 (the 4.186 of hf). */
export const CP_WATER_KJ_PER_KG_K = 4.186;

/**
 * Latent heat of vaporisation of water at 30 °C, kJ/kg: hg − hf of the steam tables, ≈ 2430
 * (ASHRAE Handbook—Fundamentals (2017) ch. 1 Table 3 — recalled from memory; the Handbook's
 * enthalpy terms 2501 + 1.86·t − 4.186·t give 2431 at 30 °C). 30 °C is typical of tower water.
 */
export const LATENT_HEAT_TOWER_KJ_PER_KG = 2430;

/** Litres per kg of water; 1 within 0.5 % from 0 to 40 °C. */
export const LITRES_PER_KG = 1;

/**
 * Hall air mass flow, kg dry air per second, that carries itLoadKw across a rise of itDeltaTK:
 * ṁ = P / (cp · ΔT) (sensible heat balance; cp of dry air, ASHRAE 2017 ch. 1 eq. 32).
 */
export function hallAirMassFlowKgPerS(itLoadKw: number, itDeltaTK: number): number {
  if (!(itLoadKw > 0)) throw new RangeError(`itLoadKw must be above 0, got ${itLoadKw}`);
  if (!(itDeltaTK > 0)) throw new RangeError(`itDeltaTK must be above 0, got ${itDeltaTK}`);
  return itLoadKw / (CP_AIR_KJ_PER_KG_K * itDeltaTK);
}
