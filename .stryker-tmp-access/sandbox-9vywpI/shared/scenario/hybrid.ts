/**
 * The hybrid hall: a share of the IT heat goes to a liquid loop (cold plates, CDUs, facility water cooled like a
 * water-side system), the rest to the hall air (any single system). Each loop is one single-system run of its own
 * kind with the IT load scaled by its share; the hour's overall mode is the more demanding of the loops that carry
 * load (mechanical > adiabatic assist > free cooling); energy and water add up. What the model leaves out:
 * docs/hybrid.md.
 */
// @ts-nocheck

import { MODE, type HourClassification } from './classify';
import type { HourlyEnergy } from './energy';
import type { HybridSystem, Scenario, SingleSystem } from './schema';

/** A scenario whose system is a single system (every kind but hybrid). */
export type SingleScenario = Omit<Scenario, 'system'> & { system: SingleSystem };
export type HybridScenario = Omit<Scenario, 'system'> & { system: HybridSystem };

export const isHybrid = (scenario: Scenario): scenario is HybridScenario => scenario.system.kind === 'hybrid';

/** The system that conditions the hall air: the system itself, or a hybrid's air loop. */
export function hallAirSystem(system: Scenario['system']): SingleSystem {
  return system.kind === 'hybrid' ? system.air : system;
}

/**
 * The liquid loop as the water-side system it is classified and costed as: the facility-water fields of the
 * loop, and the hall's supply air and rise from the air loop (the hall air is still there; they only set the
 * envelope's supply flags, since the water-side rule does not read them).
 */
export function liquidLoopSystem(system: HybridSystem): Extract<SingleSystem, { kind: 'water-side' }> {
  const { liquid, air } = system;
  return {
    kind: 'water-side',
    supplyAirC: air.supplyAirC,
    itDeltaTK: air.itDeltaTK,
    evaporativeEffectiveness: liquid.evaporativeEffectiveness,
    chilledWaterSupplyC: liquid.chilledWaterSupplyC,
    chilledWaterDeltaTK: liquid.chilledWaterDeltaTK,
    approachK: liquid.approachK,
    heatRejection: liquid.heatRejection,
    dryCoolerAirRiseK: liquid.dryCoolerAirRiseK,
    freezeProtectionWetBulbC: liquid.freezeProtectionWetBulbC,
  };
}

/**
 * The two loops as single-system scenarios. Each loop's design IT load is its share of energy.itLoadKw, so every
 * power given as a fraction of design IT load (pumps, heat-rejection fans) is a fraction of that loop's share. The
 * liquid loop has no hall fans (cold plates move no air): its fanPowerFraction is 0.
 */
export function loopScenarios(scenario: HybridScenario): { liquid: SingleScenario; air: SingleScenario } {
  const { system, energy } = scenario;
  const share = system.liquidShare;
  return {
    liquid: {
      ...scenario,
      name: `${scenario.name} · liquid loop`,
      system: liquidLoopSystem(system),
      energy: { ...energy, itLoadKw: energy.itLoadKw * share, fanPowerFraction: 0 },
    },
    air: {
      ...scenario,
      name: `${scenario.name} · air loop`,
      system: system.air,
      energy: { ...energy, itLoadKw: energy.itLoadKw * (1 - share) },
    },
  };
}

/**
 * The hall's hour-by-hour outcome from its two loops. Only a loop with load counts: at share 0 the air loop's
 * classification is returned as it is, at share 1 the liquid loop's. Otherwise the mode is the more demanding
 * (MODE codes rise free < adiabatic < mechanical < no data); humidified comes from the air loop in hours both
 * loops run free; excursions of either loop; the mechanical fraction is the compressors' share of the hall's
 * design cooling load, each loop's fraction weighted by its design cooling load (IT share, plus hall fan heat for
 * the air loop, `airFanPowerFraction` of its IT).
 */
export function combineLoopHours(liquidShare: number, liquid: HourClassification, air: HourClassification, airFanPowerFraction: number): HourClassification {
  if (liquidShare === 0) return air;
  if (liquidShare === 1) return liquid;
  const n = air.modes.length;
  if (liquid.modes.length !== n) throw new RangeError(`the liquid loop has ${liquid.modes.length} hours, the air loop ${n}`);
  const liquidWeight = liquidShare;
  const airWeight = (1 - liquidShare) * (1 + airFanPowerFraction);
  const out: HourClassification = {
    modes: new Uint8Array(n),
    humidified: new Uint8Array(n),
    mechanicalFraction: new Float64Array(n),
    excursions: new Uint8Array(n),
    // Per kg of each loop's own air; the combined hour keeps the air loop's (nothing downstream reads it).
    evaporationKgPerKgAir: air.evaporationKgPerKgAir,
  };
  for (let i = 0; i < n; i++) {
    const mode = liquid.modes[i] > air.modes[i] ? liquid.modes[i] : air.modes[i];
    out.modes[i] = mode;
    out.excursions[i] = liquid.excursions[i] | air.excursions[i];
    if (mode === MODE.noData) continue;
    if (mode === MODE.free && air.humidified[i] === 1) out.humidified[i] = 1;
    out.mechanicalFraction[i] = (liquidWeight * liquid.mechanicalFraction[i] + airWeight * air.mechanicalFraction[i]) / (liquidWeight + airWeight);
  }
  return out;
}

/**
 * The hall's hourly energy and water: the loops' columns added hour by hour. COP is a loop's own (the air loop's
 * where its compressors run, else the liquid loop's), since two machines' COPs do not add.
 */
export function addLoopEnergy(liquid: HourlyEnergy, air: HourlyEnergy): HourlyEnergy {
  const n = air.itKw.length;
  const sum = (a: Float64Array, b: Float64Array): Float64Array => {
    const out = new Float64Array(n);
    for (let i = 0; i < n; i++) out[i] = a[i] + b[i];
    return out;
  };
  const cop = new Float64Array(n);
  for (let i = 0; i < n; i++) cop[i] = air.compressorKw[i] > 0 ? air.cop[i] : liquid.cop[i];
  return {
    itKw: sum(liquid.itKw, air.itKw),
    mechanicalLoadKw: sum(liquid.mechanicalLoadKw, air.mechanicalLoadKw),
    compressorKw: sum(liquid.compressorKw, air.compressorKw),
    cop,
    fanKw: sum(liquid.fanKw, air.fanKw),
    rejectionFanKw: sum(liquid.rejectionFanKw, air.rejectionFanKw),
    pumpKw: sum(liquid.pumpKw, air.pumpKw),
    basinHeaterKw: sum(liquid.basinHeaterKw, air.basinHeaterKw),
    rejectedKw: sum(liquid.rejectedKw, air.rejectedKw),
    humidificationL: sum(liquid.humidificationL, air.humidificationL),
    evaporativeCoolingL: sum(liquid.evaporativeCoolingL, air.evaporativeCoolingL),
    driftL: sum(liquid.driftL, air.driftL),
  };
}

/**
 * Whether a system evaporates water anywhere (an evaporative stage, a wetted dry cooler or a cooling tower, in
 * either loop of a hybrid): the results then carry the water-treatment caution.
 */
export function usesEvaporativeWater(system: Scenario['system']): boolean {
  if (system.kind === 'hybrid') {
    const { liquid } = system;
    return liquid.evaporativeEffectiveness > 0 || liquid.heatRejection === 'cooling-tower' || usesEvaporativeWater(system.air);
  }
  return system.evaporativeEffectiveness > 0 || (system.kind === 'water-side' && system.heatRejection === 'cooling-tower');
}
