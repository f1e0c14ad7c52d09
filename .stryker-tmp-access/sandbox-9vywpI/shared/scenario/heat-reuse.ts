/**
 * Heat reuse from a hybrid hall's liquid loop. This is heat available at the loop's return, not heat a customer has
 * contracted to take: the reused share is the user's assumption of how much of it a heating network takes.
 *
 * The loop's controls hold the facility-water supply and its rise, so the return water is supply + ΔT in every hour
 * with load. It is worth reusing when that return is at least the threshold; below it, an optional heat pump lifts it,
 * with a heating COP from the same lift model as the compressors (shared/scenario/compressor.ts):
 *   COP_heating = COP_cooling + 1 (energy balance of the machine: Q_hot = Q_cold + W),
 * evaporating below the water leaving it (the loop's supply, the heat pump taking the loop's whole heat) and
 * condensing above the threshold. ERF = reused energy / total data-centre energy (ISO/IEC 30134-6, recalled from
 * memory), with the heat pump's electricity counted in the data centre's energy (it is assumed to be on its side).
 */
// @ts-nocheck

import { civilFromDays, MS_PER_DAY } from '../calendar';
import { fullLoadCop, type CompressorModel } from './compressor';
import type { HeatReuseInput } from './schema';

export interface HeatReuseResults {
  thresholdC: number;
  /** Facility-water return, °C: supply + ΔT. */
  returnWaterC: number;
  /** 'direct' when the return reaches the threshold; 'heat-pump' when lifted; 'none' when neither. */
  source: 'direct' | 'heat-pump' | 'none';
  /** Heating COP of the heat pump at its lift; null without one. */
  heatPumpCop: number | null;
  /** Hours in which heat is available at the threshold. */
  availableHours: number;
  /** Heat available at the threshold, kWh (the heat pump's output where it lifts). */
  availableKwh: number;
  /** Local-standard-time months, January first. */
  availableKwhByMonth: number[];
  availableHoursByMonth: number[];
  reusedShare: number;
  /** reusedShare × available, kWh. */
  reusedKwh: number;
  /** Heat-pump electricity for the reused heat, kWh. */
  heatPumpKwh: number;
  /** Total data-centre energy the ERF is over: IT + cooling + heat pump, kWh. */
  dataCentreKwh: number;
  /** Energy Reuse Factor, reused / data-centre energy (ISO/IEC 30134-6); null without energy. */
  erf: number | null;
}

export interface HeatReuseInputs {
  reuse: HeatReuseInput;
  supplyC: number;
  deltaTK: number;
  /** Heat carried by the liquid loop each hour, kW (its IT power); 0 in no-data hours. */
  loopHeatKw: Float64Array;
  timestampsMs: Float64Array;
  utcOffsetMinutes?: number;
  /** The lift model calibrated to the scenario's rated COP (water-cooled). */
  model: CompressorModel;
  /** IT + cooling energy of the hall over the same hours, kWh. */
  facilityKwh: number;
}

/**
 * Heating COP of a heat pump taking heat from water leaving it at sourceLeavingC and delivering it at
 * deliveredC, both °C: the lift model's cooling COP there, plus 1.
 */
export function heatPumpHeatingCop(model: CompressorModel, sourceLeavingC: number, deliveredC: number): number {
  return fullLoadCop(model, sourceLeavingC, deliveredC) + 1;
}

/**
 * ERF of ISO/IEC 30134-6: energy reused outside the data centre over the data centre's total energy, both kWh.
 * RangeError for a negative or non-finite argument; null when the total is 0.
 */
export function energyReuseFactor(reusedKwh: number, dataCentreKwh: number): number | null {
  if (!(reusedKwh >= 0) || !Number.isFinite(reusedKwh)) throw new RangeError(`reusedKwh must be 0 or above, got ${reusedKwh}`);
  if (!(dataCentreKwh >= 0) || !Number.isFinite(dataCentreKwh)) throw new RangeError(`dataCentreKwh must be 0 or above, got ${dataCentreKwh}`);
  return dataCentreKwh > 0 ? reusedKwh / dataCentreKwh : null;
}

export function heatReuseResults(input: HeatReuseInputs): HeatReuseResults {
  const { reuse, supplyC, deltaTK, loopHeatKw, timestampsMs, model, facilityKwh } = input;
  const n = loopHeatKw.length;
  if (timestampsMs.length !== n) throw new RangeError(`timestampsMs has ${timestampsMs.length} hours, loopHeatKw has ${n}`);
  const returnWaterC = supplyC + deltaTK;
  const source = returnWaterC >= reuse.thresholdC ? 'direct' : reuse.heatPump ? 'heat-pump' : 'none';
  const heatPumpCop = source === 'heat-pump' ? heatPumpHeatingCop(model, supplyC, reuse.thresholdC) : null;
  // Heat delivered per kW taken from the loop: 1 direct; COP/(COP − 1) through the heat pump.
  const deliveredPerLoopKw = source === 'none' ? 0 : heatPumpCop === null ? 1 : heatPumpCop / (heatPumpCop - 1);
  const offsetMs = (input.utcOffsetMinutes ?? 0) * 60_000;
  const kwhByMonth = new Array<number>(12).fill(0);
  const hoursByMonth = new Array<number>(12).fill(0);
  const civil = { year: 0, month: 0, day: 0 };
  let availableKwh = 0;
  let availableHours = 0;
  if (deliveredPerLoopKw > 0) {
    for (let i = 0; i < n; i++) {
      const heat = loopHeatKw[i];
      if (!(heat > 0)) continue;
      civilFromDays(Math.floor((timestampsMs[i] + offsetMs) / MS_PER_DAY), civil);
      const delivered = heat * deliveredPerLoopKw;
      kwhByMonth[civil.month - 1] += delivered;
      hoursByMonth[civil.month - 1]++;
      availableKwh += delivered;
      availableHours++;
    }
  }
  const reusedKwh = reuse.reusedShare * availableKwh;
  const heatPumpKwh = heatPumpCop === null ? 0 : reusedKwh / heatPumpCop;
  const dataCentreKwh = facilityKwh + heatPumpKwh;
  return {
    thresholdC: reuse.thresholdC,
    returnWaterC,
    source,
    heatPumpCop,
    availableHours,
    availableKwh,
    availableKwhByMonth: kwhByMonth,
    availableHoursByMonth: hoursByMonth,
    reusedShare: reuse.reusedShare,
    reusedKwh,
    heatPumpKwh,
    dataCentreKwh,
    erf: energyReuseFactor(reusedKwh, dataCentreKwh),
  };
}
