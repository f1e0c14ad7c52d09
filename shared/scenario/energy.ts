/**
 * Energy and water per hour from the hour classification: IT load through the year, fans and pumps on the
 * affinity law, compressors on their lift, basin heaters, and the water evaporated (humidification,
 * evaporative stages, wetted dry coolers, cooling towers) and drifted. Power in kW averaged over the hour,
 * so each value is also the kWh of that hour. Equations and their sources: docs/method.md.
 */
import { MODE, type HourClassification } from './classify';
import { CP_AIR_KJ_PER_KG_K, hallAirMassFlowKgPerS, LITRES_PER_KG } from './air';
import { calibrateCompressor, compressorPowerKw, fullLoadCop, type CompressorModel } from './compressor';
import { affinityPowerKw, designFanHeatK, speedFraction } from './fans';
import type { ScenarioEnergy, SingleSystem } from './schema';
import { SaturatedExit, TOWER_AIR_ENTHALPY_RISE_KJ_PER_KG, TOWER_CIRCULATING_KG_PER_H_PER_KW } from './tower';

export { CP_AIR_KJ_PER_KG_K, hallAirMassFlowKgPerS, LATENT_HEAT_TOWER_KJ_PER_KG } from './air';

/**
 * Air temperature rise through an air-cooled condenser, K, which sets its air flow when the air-side plant
 * wets it: 10 K is common practice.
 */
export const CONDENSER_AIR_RISE_K = 10;

export interface HourlyEnergy {
  /** IT power of the hour, kW (design × the load profile's fraction); 0 in no-data hours. */
  itKw: Float64Array;
  /** Cooling load carried by compressors, kW thermal. */
  mechanicalLoadKw: Float64Array;
  compressorKw: Float64Array;
  /** Full-load compressor COP at the hour's lift; 0 in hours without compressor load. */
  cop: Float64Array;
  /** Hall fans plus heat-rejection or scavenger fans, kW. */
  fanKw: Float64Array;
  /**
   * The heat-rejection or scavenger fans' part of fanKw, kW (hall fans = fanKw − rejectionFanKw). This column, basinHeaterKw
   * and driftL may be one shared array of zeros where the system has no such equipment: read them, never write into them.
   */
  rejectionFanKw: Float64Array;
  pumpKw: Float64Array;
  /** Cooling-tower basin heaters, kW (freeze-protection hours only). */
  basinHeaterKw: Float64Array;
  /** Heat leaving through the heat rejection, kW: the cooling load (IT + hall fans) plus the compressors' work. */
  rejectedKw: Float64Array;
  /** Water that only adds moisture (humidified free-cooling hours), litres. */
  humidificationL: Float64Array;
  /** Water evaporated to cool (evaporative stages, wetted condensers and dry coolers, towers), litres. */
  evaporativeCoolingL: Float64Array;
  /** Tower drift, litres. */
  driftL: Float64Array;
}

/** The outdoor state of every hour, as the classifier saw it. */
export interface EnergyOutdoor {
  dryBulbC: Float64Array;
  wetBulbC: Float64Array;
  humidityRatio: Float64Array;
}

/** The compressor model of a system: air-cooled for the air-side kinds, water-cooled behind a tower or dry cooler. */
export function compressorModelFor(system: SingleSystem, energy: ScenarioEnergy): CompressorModel {
  return calibrateCompressor(energy.mechanicalCop, system.kind === 'water-side' ? 'water-cooled' : 'air-cooled', {
    evaporatorApproachK: energy.evaporatorApproachK,
    condenserApproachK: energy.condenserApproachK,
    minTurndown: energy.compressorMinTurndown,
  });
}

/**
 * Energy and water of every hour. No-data hours get 0 everywhere (they are reported as no data, never
 * guessed). `loadFraction` is each hour's IT load as a fraction of design (load-profile.ts);
 * `sitePressurePa` sets the tower's saturated-exit table.
 */
export function hourlyEnergy(
  system: SingleSystem,
  energy: ScenarioEnergy,
  outdoor: EnergyOutdoor,
  loadFraction: Float64Array,
  hours: HourClassification,
  sitePressurePa: number,
): HourlyEnergy {
  const n = hours.modes.length;
  for (const [name, array] of [
    ['dryBulbC', outdoor.dryBulbC],
    ['wetBulbC', outdoor.wetBulbC],
    ['humidityRatio', outdoor.humidityRatio],
    ['loadFraction', loadFraction],
  ] as const) {
    if (array.length !== n) throw new RangeError(`${name} has ${array.length} hours, the classification has ${n}`);
  }
  const waterSide = system.kind === 'water-side';
  const indirect = system.kind === 'indirect-air';
  const tower = waterSide && system.heatRejection === 'cooling-tower';
  // The columns this kind never writes are one array of zeros: whoever sums them reads its memory once, not once per
  // column (fresh memory costs a page fault per 4 KiB on first touch, more than the additions).
  const unused = new Float64Array(n);
  const out: HourlyEnergy = {
    itKw: new Float64Array(n),
    mechanicalLoadKw: new Float64Array(n),
    compressorKw: new Float64Array(n),
    cop: new Float64Array(n),
    fanKw: new Float64Array(n),
    rejectionFanKw: indirect || waterSide ? new Float64Array(n) : unused,
    pumpKw: new Float64Array(n),
    basinHeaterKw: tower ? new Float64Array(n) : unused,
    rejectedKw: new Float64Array(n),
    humidificationL: new Float64Array(n),
    evaporativeCoolingL: new Float64Array(n),
    driftL: tower ? new Float64Array(n) : unused,
  };
  const designItKw = energy.itLoadKw;
  const designHallFanKw = energy.fanPowerFraction * designItKw;
  const designCoolingKw = designItKw + designHallFanKw;
  const designPumpKw = energy.pumpPowerFraction * designItKw;
  const designRejectionFanKw = system.kind === 'direct-air' ? 0 : energy.heatRejectionFanFraction * designItKw;
  const { fanMinSpeedFraction, pumpMinSpeedFraction } = energy;
  const eps = system.evaporativeEffectiveness;
  const fanHeatK = designFanHeatK(energy.fanPowerFraction, system.itDeltaTK);
  // Scavenger fans move scavengerAirRatio × the hall flow; their power at ratio 1 is the input (affinity law).
  const scavengerRatio = indirect ? system.scavengerAirRatio : 1;
  const designHallAirKgPerH = hallAirMassFlowKgPerS(designItKw, system.itDeltaTK) * 3600;

  const model = compressorModelFor(system, energy);
  const leavingC = waterSide ? system.chilledWaterSupplyC : system.supplyAirC - fanHeatK;
  const approachK = waterSide ? system.approachK : 0;
  const freezeWetBulbC = tower ? system.freezeProtectionWetBulbC : Number.NEGATIVE_INFINITY;
  // A wetted dry cooler's water follows its design air flow: the design heat rejected over cp·(air rise).
  const dryCoolerAirKgPerH = waterSide ? (designCoolingKw * (1 + 1 / energy.mechanicalCop) * 3600) / (CP_AIR_KJ_PER_KG_K * system.dryCoolerAirRiseK) : 0;
  // Air-cooled condenser air per kW rejected, kg/h, for the water a wetted condenser takes up.
  const condenserAirKgPerHPerKw = 3600 / (CP_AIR_KJ_PER_KG_K * CONDENSER_AIR_RISE_K);
  const basinHeaterKw = tower ? energy.basinHeaterFraction * designItKw : 0;
  const exit = tower ? new SaturatedExit(sitePressurePa) : null;
  const towerAirKgPerHPerKw = 3600 / TOWER_AIR_ENTHALPY_RISE_KJ_PER_KG;
  const driftKgPerHPerKw = energy.towerDriftFraction * TOWER_CIRCULATING_KG_PER_H_PER_KW;
  const { dryBulbC, wetBulbC, humidityRatio } = outdoor;
  const { modes, mechanicalFraction, evaporationKgPerKgAir, humidified } = hours;

  // The output columns as locals: the loop writes them without going through the out object each time.
  const {
    itKw: outItKw,
    mechanicalLoadKw: outMechanicalLoadKw,
    compressorKw: outCompressorKw,
    cop: outCop,
    fanKw: outFanKw,
    pumpKw: outPumpKw,
    basinHeaterKw: outBasinHeaterKw,
    rejectedKw: outRejectedKw,
    humidificationL: outHumidificationL,
    evaporativeCoolingL: outEvaporativeCoolingL,
    driftL: outDriftL,
  } = out;
  for (let i = 0; i < n; i++) {
    if (modes[i] === MODE.noData) continue;
    const load = loadFraction[i];
    const itKw = designItKw * load;
    const fanSpeed = speedFraction(load, fanMinSpeedFraction);
    const hallFanKw = affinityPowerKw(designHallFanKw, fanSpeed);
    const coolingLoadKw = itKw + hallFanKw;
    const fraction = mechanicalFraction[i];
    const mechanicalKw = fraction * coolingLoadKw;
    const t = dryBulbC[i];
    const twb = wetBulbC[i];
    const evaporation = evaporationKgPerKgAir[i];

    let compressorKw = 0;
    if (mechanicalKw > 0) {
      // The condensing medium: outdoor air (pre-cooled where the evaporative stage wets the condenser) for the
      // air-side kinds; the water from the tower (wet-bulb, dry-bulb in freeze hours) or dry cooler + approach.
      let mediumC: number;
      if (!waterSide) mediumC = eps > 0 ? t - eps * (t - twb) : t;
      else if (tower) mediumC = (twb >= freezeWetBulbC ? twb : t) + approachK;
      else mediumC = (eps > 0 ? t - eps * (t - twb) : t) + approachK;
      const cop = fullLoadCop(model, leavingC, mediumC);
      outCop[i] = cop;
      compressorKw = compressorPowerKw(mechanicalKw, designCoolingKw, cop, model.minTurndown);
    }
    const rejectedKw = coolingLoadKw + compressorKw;

    // Scavenger fans stop when the exchanger is bypassed (full mechanical); heat-rejection fans always run.
    let rejectionFanKw = 0;
    if (indirect) rejectionFanKw = fraction < 1 ? affinityPowerKw(designRejectionFanKw, scavengerRatio * fanSpeed) : 0;
    else if (waterSide) rejectionFanKw = affinityPowerKw(designRejectionFanKw, fanSpeed);

    // The arrays start at 0: only the values that can be non-zero are written.
    outItKw[i] = itKw;
    if (mechanicalKw > 0) {
      outMechanicalLoadKw[i] = mechanicalKw;
      outCompressorKw[i] = compressorKw;
    }
    outFanKw[i] = hallFanKw + rejectionFanKw;
    if (rejectionFanKw > 0) out.rejectionFanKw[i] = rejectionFanKw;
    const pumpKw = affinityPowerKw(designPumpKw, speedFraction(load, pumpMinSpeedFraction));
    if (waterSide) outPumpKw[i] = pumpKw;
    outRejectedKw[i] = rejectedKw;

    if (tower) {
      if (twb < freezeWetBulbC) {
        // Dry (bypass) operation: no spray, no evaporation or drift; the basin heaters keep the water from freezing.
        outBasinHeaterKw[i] = basinHeaterKw;
      } else {
        const w = humidityRatio[i];
        const hIn = 1.006 * t + w * (2501 + 1.86 * t);
        const gain = exit!.humidityRatioAt(hIn + TOWER_AIR_ENTHALPY_RISE_KJ_PER_KG) - w;
        outEvaporativeCoolingL[i] = (gain > 0 ? gain * rejectedKw * towerAirKgPerHPerKw : 0) * LITRES_PER_KG;
        outDriftL[i] = rejectedKw * driftKgPerHPerKw * LITRES_PER_KG;
      }
      continue;
    }
    let waterKg = 0;
    if (waterSide) waterKg = evaporation * dryCoolerAirKgPerH;
    else if (evaporation > 0) waterKg = evaporation * designHallAirKgPerH * fanSpeed;
    if (!waterSide && eps > 0 && compressorKw > 0) {
      // The wetted condenser: its air (rejected heat over cp·ΔT) takes up water at nearly constant enthalpy,
      // ΔW ≈ cp·(t − t_pre) / 2501 (ASHRAE 2017 ch. 1 eq. 32 with the vapour terms dropped).
      waterKg += (rejectedKw * condenserAirKgPerHPerKw * CP_AIR_KJ_PER_KG_K * eps * (t - twb)) / 2501;
    }
    if (waterKg > 0) {
      // Air-side pumps run only while the evaporative stage (or the wetted condenser) takes water.
      outPumpKw[i] = pumpKw;
      if (humidified[i] === 1) outHumidificationL[i] = waterKg * LITRES_PER_KG;
      else outEvaporativeCoolingL[i] = waterKg * LITRES_PER_KG;
    }
  }
  return out;
}
