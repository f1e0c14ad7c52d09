/**
 * Energy and water per hour from the hour classification: fans, compressors, pumps, and the water
 * evaporated (evaporative stages, cooling towers). Power in kW averaged over the hour, so each value
 * is also the kWh of that hour. Equations and their sources: README.md, "How it works".
 */
import { MODE, type HourClassification } from './classify';
import type { ScenarioEnergy, ScenarioSystem } from './schema';

/** Specific heat of dry air, kJ/(kg·K): ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 32. */
export const CP_AIR_KJ_PER_KG_K = 1.006;

/**
 * Latent heat of vaporisation of water at 30 °C, kJ/kg: hg − hf of the steam tables, ≈ 2430
 * (ASHRAE Handbook—Fundamentals (2017) ch. 1 Table 3 — recalled from memory; the Handbook's
 * enthalpy terms 2501 + 1.86·t − 4.186·t give 2431 at 30 °C). 30 °C is typical of tower water.
 */
export const LATENT_HEAT_TOWER_KJ_PER_KG = 2430;

/** Litres per kg of water; 1 within 0.5 % from 0 to 40 °C. */
const LITRES_PER_KG = 1;

/**
 * Hall air mass flow, kg dry air per second, that carries itLoadKw across a rise of itDeltaTK:
 * ṁ = P / (cp · ΔT) (sensible heat balance; cp of dry air, ASHRAE 2017 ch. 1 eq. 32).
 */
export function hallAirMassFlowKgPerS(itLoadKw: number, itDeltaTK: number): number {
  if (!(itLoadKw > 0)) throw new RangeError(`itLoadKw must be above 0, got ${itLoadKw}`);
  if (!(itDeltaTK > 0)) throw new RangeError(`itDeltaTK must be above 0, got ${itDeltaTK}`);
  return itLoadKw / (CP_AIR_KJ_PER_KG_K * itDeltaTK);
}

/**
 * Compressor COP at an outdoor dry-bulb: COP_ref + slope · (T − T_ref), never below copMin.
 * A linear dependence is common practice for a screening estimate, not a chiller curve.
 */
export function copAt(outdoorC: number, energy: Pick<ScenarioEnergy, 'mechanicalCop' | 'copSlopePerK' | 'copReferenceC' | 'copMin'>): number {
  return Math.max(energy.copMin, energy.mechanicalCop + energy.copSlopePerK * (outdoorC - energy.copReferenceC));
}

export interface HourlyEnergy {
  /** Cooling load carried by compressors, kW thermal. */
  mechanicalLoadKw: Float64Array;
  compressorKw: Float64Array;
  /** Hall fans plus heat-rejection or scavenger fans, kW. */
  fanKw: Float64Array;
  pumpKw: Float64Array;
  /** Water evaporated in the hour, litres (blowdown is added in the results). */
  evaporatedL: Float64Array;
}

/**
 * Energy and evaporated water of every hour. No-data hours get 0 everywhere (they are reported as
 * no-data, never guessed). The cooling load is IT plus hall fan power (fan heat ends in the air).
 */
export function hourlyEnergy(system: ScenarioSystem, energy: ScenarioEnergy, outdoorC: Float64Array, hours: HourClassification): HourlyEnergy {
  const n = hours.modes.length;
  if (outdoorC.length !== n) throw new RangeError(`outdoorC has ${outdoorC.length} hours, the classification has ${n}`);
  const out: HourlyEnergy = {
    mechanicalLoadKw: new Float64Array(n),
    compressorKw: new Float64Array(n),
    fanKw: new Float64Array(n),
    pumpKw: new Float64Array(n),
    evaporatedL: new Float64Array(n),
  };
  const itKw = energy.itLoadKw;
  const hallFanKw = energy.fanPowerFraction * itKw;
  const coolingLoadKw = itKw + hallFanKw;
  const rejectionFanKw = system.kind === 'direct-air' ? 0 : energy.heatRejectionFanFraction * itKw;
  const pumpKw = energy.pumpPowerFraction * itKw;
  const waterSide = system.kind === 'water-side';
  const tower = waterSide && system.heatRejection === 'cooling-tower';
  const hallAirKgPerH = hallAirMassFlowKgPerS(itKw, system.itDeltaTK) * 3600;
  // kg of heat-rejection air per hour per kW rejected: ṁ = Q / (cp · ΔT_air).
  const rejectionAirKgPerHPerKw = waterSide ? 3600 / (CP_AIR_KJ_PER_KG_K * system.dryCoolerAirRiseK) : 0;
  const towerKgPerHPerKw = (energy.towerEvaporationShare * 3600) / LATENT_HEAT_TOWER_KJ_PER_KG;

  for (let i = 0; i < n; i++) {
    if (hours.modes[i] === MODE.noData) continue;
    const mechanicalKw = hours.mechanicalFraction[i] * coolingLoadKw;
    const compressorKw = mechanicalKw > 0 ? mechanicalKw / copAt(outdoorC[i], energy) : 0;
    const evaporation = hours.evaporationKgPerKgAir[i];
    out.mechanicalLoadKw[i] = mechanicalKw;
    out.compressorKw[i] = compressorKw;
    out.fanKw[i] = hallFanKw + rejectionFanKw;
    out.pumpKw[i] = waterSide || evaporation > 0 ? pumpKw : 0;
    // Heat leaving through the heat rejection: the cooling load plus the compressors' work.
    const rejectedKw = coolingLoadKw + compressorKw;
    let evaporatedKg: number;
    if (tower) evaporatedKg = rejectedKw * towerKgPerHPerKw;
    else if (waterSide) evaporatedKg = evaporation * rejectedKw * rejectionAirKgPerHPerKw;
    else evaporatedKg = evaporation * hallAirKgPerH;
    out.evaporatedL[i] = Math.max(0, evaporatedKg) * LITRES_PER_KG;
  }
  return out;
}
